// The one rule for text that goes to a spreadsheet, by CSV file or by the clipboard: text that a spreadsheet
// would take for a formula (it starts with = + - @, a tab or a carriage return) gets a leading apostrophe,
// the mark spreadsheets read as "this is text" (OWASP, CSV injection: common practice). Text that already
// starts with an apostrophe gets one too, so that reading strips exactly one and every name comes back
// as it was written. Numbers are not text and are never marked.

/** Returns the text as a spreadsheet should receive it: with a leading ' when it starts like a formula or with '. */
export function spreadsheetText(text: string): string {
  return /^[=+\-@\t\r']/.test(text) ? `'${text}` : text;
}

/** Returns the text as it was before spreadsheetText: one leading apostrophe removed, if there is one. */
export function fromSpreadsheetText(text: string): string {
  return text.startsWith("'") ? text.slice(1) : text;
}
