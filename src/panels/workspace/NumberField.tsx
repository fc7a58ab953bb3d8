// A number field that commits on Enter or when it loses focus (one undo entry per value typed).
import { useEffect, useRef, useState } from 'react';

interface Props {
  value: number | null;
  onCommit: (v: number) => void;
  label: string;
  testId?: string;
  focusKey?: number;
  width?: number;
}

/** Parses "1 234,5" or "1234.5" or "−12" to a number; NaN when not a number. */
export function parseNumber(text: string): number {
  const t = text.trim().replace(/\u2212/g, '-').replace(/\s+/g, '');
  const normal = /^-?\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
  return normal === '' ? Number.NaN : Number(normal);
}

export function NumberField({ value, onCommit, label, testId, focusKey, width = 84 }: Props) {
  const [text, setText] = useState(value === null ? '' : String(value));
  const [shown, setShown] = useState(value);
  const ref = useRef<HTMLInputElement>(null);
  if (shown !== value) {
    setShown(value);
    setText(value === null ? '' : String(value));
  }
  useEffect(() => {
    if (focusKey === undefined || focusKey <= 0) return;
    // After the press that asked for it has finished moving focus (a canvas press focuses the page).
    const t = window.setTimeout(() => {
      ref.current?.focus();
      ref.current?.select();
    }, 0);
    return () => window.clearTimeout(t);
  }, [focusKey]);
  const discard = useRef(false);
  const commit = () => {
    const v = discard.current ? Number.NaN : parseNumber(text);
    discard.current = false;
    if (Number.isFinite(v) && v !== value) onCommit(v);
    else setText(value === null ? '' : String(value));
  };
  return (
    <input ref={ref} className="number-field" style={{ width }} aria-label={label} data-testid={testId} inputMode="decimal" value={text}
      onChange={(e) => setText(e.currentTarget.value)} onBlur={commit}
      onKeyDown={(e) => {
        // Leaving the field commits (once), so Enter only leaves it.
        if (e.key === 'Enter') e.currentTarget.blur();
        if (e.key === 'Escape') {
          discard.current = true;
          e.currentTarget.blur();
        }
      }} />
  );
}
