// A number field that commits on Enter or when it loses focus (one undo entry per value typed). Text that
// is not a usable number keeps the value shown and says so (readNumberInput); Esc drops the typing quietly.
import { useEffect, useLayoutEffect, useRef, useState } from 'react';
import { useSessionStore } from '../../state/sessionStore';
import { useLiveValue, type LiveRead } from '../liveText';
import { readNumberInput } from './readNumberInput';

export { parseNumber } from './readNumberInput';

interface Props {
  value: number | null;
  onCommit: (v: number) => void;
  label: string;
  testId?: string;
  focusKey?: number;
  width?: number;
  /** Why a finite value is refused (shown as a message), or null to accept it. */
  check?: (v: number) => string | null;
  /**
   * The value's text in a document (the text `value` shows): with it the field follows a gesture without a render
   * (panels/liveText.tsx) while `value` is read from the shown document.
   */
  live?: LiveRead;
}

const textOf = (v: number | null) => (v === null ? '' : String(v));

/** A field's text for a value: what `live` readers give too. */
export const numberFieldText = textOf;

export function NumberField({ value, onCommit, label, testId, focusKey, width = 84, check, live }: Props) {
  const [text, setText] = useState(textOf(value));
  const [shown, setShown] = useState(value);
  const ref = useRef<HTMLInputElement>(null);
  // Only typing commits: leaving the field untouched keeps the stored value, however it is rounded on screen.
  const edited = useRef(false);
  if (shown !== value) {
    setShown(value);
    setText(textOf(value));
    edited.current = false;
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
  useLiveValue(ref, live ?? null);
  useLayoutEffect(() => {
    // A gesture may have written the value in place: the render's text is put back even where React sees no change.
    if (ref.current && ref.current.value !== text) ref.current.value = text;
  });
  const discard = useRef(false);
  const commit = () => {
    const dropped = discard.current || !edited.current;
    discard.current = false;
    edited.current = false;
    const read = dropped ? { kind: 'keep' as const, message: null } : readNumberInput(text, value, check);
    // The field then shows the value as stored (a new value arrives through `value` and replaces this).
    setText(textOf(value));
    if (read.kind === 'commit') {
      onCommit(read.value);
      return;
    }
    if (read.message) useSessionStore.getState().showMessage('error', `${label}: ${read.message}.`);
  };
  return (
    <input ref={ref} className="number-field" style={{ width }} aria-label={label} data-testid={testId} inputMode="decimal" value={text}
      onChange={(e) => {
        edited.current = true;
        setText(e.currentTarget.value);
      }} onBlur={commit}
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
