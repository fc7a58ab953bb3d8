// Text from a file (horizon and scenario names, messages that quote them) shown on a terminal: control
// characters are written as escapes, so a name cannot recolour the terminal, clear the screen or break the
// table's columns (ECMA-48 control functions start with C0/C1 characters such as ESC, U+001B).

/** Returns `s` with C0 and C1 control characters and DEL shown as `\xNN` (tab and newline too). */
export function terminalText(s: string): string {
  // eslint-disable-next-line no-control-regex
  return s.replace(/[\u0000-\u001f\u007f-\u009f]/g, (c) => `\\x${c.charCodeAt(0).toString(16).padStart(2, '0')}`);
}
