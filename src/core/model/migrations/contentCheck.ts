// A check value over a project file's content, so a file damaged after saving (a flipped byte that
// still parses) is refused instead of opened with silently wrong numbers. FNV-1a, 32 bits
// (Fowler–Noll–Vo; public-domain hash, recalled from its published definition): not a security
// measure, only damage detection. A file edited by hand on purpose opens once "check" is removed.

/** Returns "fnv1a32:" and eight hex digits for the text (UTF-16 code units hashed low byte then high byte). */
export function contentCheck(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    h = Math.imul(h ^ (c & 0xff), 0x01000193);
    h = Math.imul(h ^ (c >>> 8), 0x01000193);
  }
  return `fnv1a32:${(h >>> 0).toString(16).padStart(8, '0')}`;
}

/** Returns the text the check covers: the document as JSON, a line break, the scan's base64 (or nothing). */
export function checkedText(doc: unknown, scanBase64: string | null): string {
  return `${JSON.stringify(doc)}\n${scanBase64 ?? ''}`;
}
