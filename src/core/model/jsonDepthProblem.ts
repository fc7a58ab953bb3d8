import { LIMITS } from './limits';

// How deeply a JSON text nests arrays and objects, read before parsing: a file nested thousands of
// levels deep parses, but every later walk over it (a schema, a copy, writing it back out) can run out
// of stack. Foldroot's files nest a few levels (a project file about eight), so the limit is generous.

/** Returns the deepest nesting of arrays and objects in the JSON text (strings skipped, escapes honoured); 0 for a bare value. */
export function jsonDepth(text: string): number {
  let depth = 0, deepest = 0, inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92) i++; // backslash: the next character is escaped
      else if (c === 34) inString = false;
    } else if (c === 34) inString = true;
    else if (c === 91 || c === 123) {
      depth++;
      if (depth > deepest) deepest = depth;
    } else if (c === 93 || c === 125) depth--;
  }
  return deepest;
}

/** Returns the message for a JSON text nested deeper than the limit ("the file is nested too deeply (100,000 levels …; the limit is 64)"), or null. */
export function jsonDepthProblem(text: string): string | null {
  const d = jsonDepth(text);
  if (d <= LIMITS.jsonDepth) return null;
  const count = d.toString().replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `the file is nested too deeply (${count} levels of arrays and objects inside each other; the limit is ${LIMITS.jsonDepth})`;
}
