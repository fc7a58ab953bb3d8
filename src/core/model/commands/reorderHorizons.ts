import type { ProjectDoc } from '../projectDoc';

/** Returns the document with the horizon at `from` moved to position `to` in the stratigraphic order (youngest first); unchanged when out of range. */
export function reorderHorizons(doc: ProjectDoc, from: number, to: number): ProjectDoc {
  const n = doc.horizons.length;
  if (from === to || from < 0 || to < 0 || from >= n || to >= n) return doc;
  const horizons = doc.horizons.slice();
  const [moved] = horizons.splice(from, 1);
  horizons.splice(to, 0, moved);
  return { ...doc, horizons };
}
