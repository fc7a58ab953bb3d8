import type { DocHorizon, ProjectDoc } from '../projectDoc';

/** Returns the document with one horizon replaced by `change(horizon)`; the same document when the id is unknown or nothing changed. */
export function updateHorizon(doc: ProjectDoc, horizonId: string, change: (h: DocHorizon) => DocHorizon): ProjectDoc {
  const i = doc.horizons.findIndex((h) => h.id === horizonId);
  if (i < 0) return doc;
  const next = change(doc.horizons[i]);
  if (next === doc.horizons[i]) return doc;
  const horizons = doc.horizons.slice();
  horizons[i] = next;
  return { ...doc, horizons };
}
