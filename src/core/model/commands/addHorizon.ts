import type { DocHorizon, ImagePx, ProjectDoc } from '../projectDoc';

/** Returns the next free horizon id ("h1", "h2", …), from the highest numbered id in the document. */
export function nextHorizonId(doc: ProjectDoc): string {
  let max = 0;
  for (const h of doc.horizons) {
    const m = /^h(\d+)$/.exec(h.id);
    if (m) max = Math.max(max, Number(m[1]));
  }
  return `h${max + 1}`;
}

/** Returns the document with a new horizon (image-pixel vertices) inserted at `index` (default: the end, i.e. oldest); unchanged if the id exists. */
export function addHorizon(
  doc: ProjectDoc,
  horizon: { id: string; name: string; colour: string; pointsPx: ImagePx[] } & Partial<DocHorizon>,
  index = doc.horizons.length,
): ProjectDoc {
  if (doc.horizons.some((h) => h.id === horizon.id)) return doc;
  const h: DocHorizon = {
    visible: true, locked: false, projected: [], ...horizon,
    pointsPx: horizon.pointsPx.map(([u, v]) => [u, v]),
  };
  const horizons = doc.horizons.slice();
  horizons.splice(Math.max(0, Math.min(index, horizons.length)), 0, h);
  return { ...doc, horizons };
}
