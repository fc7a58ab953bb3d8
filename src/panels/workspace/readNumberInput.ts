// What a number field does with the text typed into it: commit a number, or keep the value shown
// and say why (a field that silently puts the old value back looks like it accepted the new one).

/** Parses "1 234,5" or "1234.5" or "−12" to a number; NaN when not a number. */
export function parseNumber(text: string): number {
  const t = text.trim().replace(/\u2212/g, '-').replace(/\s+/g, '');
  const normal = /^-?\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
  return normal === '' ? Number.NaN : Number(normal);
}

export type NumberInput = { kind: 'commit'; value: number } | { kind: 'keep'; message: string | null };

/**
 * Returns the number to commit for edited `text`, or `keep` with a message saying what was kept (null message
 * when an empty field stays empty). A number equal to the shown one is committed too: the field may show a
 * rounded value, and typing it means exactly that value. `check` may refuse a finite value with a reason;
 * `shown` formats the kept value.
 */
export function readNumberInput(text: string, current: number | null, check?: (v: number) => string | null, shown: (v: number) => string = String): NumberInput {
  const typed = text.trim();
  const kept = current === null ? 'the field is left empty' : `kept ${shown(current)}`;
  if (typed === '') return { kind: 'keep', message: current === null ? null : `a number is needed — ${kept}` };
  const v = parseNumber(typed);
  if (Number.isNaN(v)) return { kind: 'keep', message: `“${typed}” is not a number — ${kept}` };
  if (!Number.isFinite(v)) return { kind: 'keep', message: `“${typed}” is too large to use — ${kept}` };
  const problem = check?.(v) ?? null;
  if (problem) return { kind: 'keep', message: `${problem} — ${kept}` };
  return { kind: 'commit', value: v };
}

/** Returns v rounded to `decimals` places for showing in a field (no float noise, no −0); non-finite v unchanged. */
export function roundForField(v: number, decimals = 2): number {
  if (!Number.isFinite(v)) return v;
  const r = Number(v.toFixed(decimals));
  return r === 0 ? 0 : r;
}
