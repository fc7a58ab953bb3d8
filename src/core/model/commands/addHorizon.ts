import { nameWithSuffix } from '../limits';
import type { DocHorizon, ImagePx, ProjectDoc } from '../projectDoc';
import { horizonNameTaken } from './horizonNameTaken';
import { nextHorizonName } from './nextHorizonName';

/**
 * Returns `count` new horizon ids ("h1", "h2", …) after the highest numbered one in the document: the one id
 * rule for drawn, imported and opened horizons. Ids of other forms that older documents hold ("horizon-2")
 * are kept as they are and never clash with these.
 */
export function freshHorizonIds(doc: ProjectDoc, count: number): string[] {
  let max = 0;
  for (const h of doc.horizons) {
    const m = /^h(\d+)$/.exec(h.id);
    if (m) max = Math.max(max, Number(m[1]));
  }
  const ids: string[] = [];
  for (let k = 1; k <= count; k++) ids.push(`h${max + k}`);
  return ids;
}

/** Returns the next free horizon id ("h1", "h2", …), from the highest numbered id in the document. */
export function nextHorizonId(doc: ProjectDoc): string {
  return freshHorizonIds(doc, 1)[0];
}

/** Returns `name` trimmed, or with " (2)", " (3)" … when another horizon has it: no two horizons share a name. */
function freeName(doc: ProjectDoc, id: string, name: string): string {
  const base = name.trim();
  if (!horizonNameTaken(doc, id, base)) return base;
  let k = 2;
  while (horizonNameTaken(doc, id, nameWithSuffix(base, ` (${k})`))) k++;
  return nameWithSuffix(base, ` (${k})`);
}

/**
 * Returns the document with a new horizon (image-pixel vertices) inserted at `index` (default: the end, i.e. oldest);
 * unchanged if the id exists. Without a name (or a blank one) it is called nextHorizonName; a name another horizon has gets " (2)" ….
 */
export function addHorizon(
  doc: ProjectDoc,
  horizon: { id: string; name?: string; colour: string; pointsPx: ImagePx[] } & Partial<Omit<DocHorizon, 'name'>>,
  index = doc.horizons.length,
): ProjectDoc {
  if (doc.horizons.some((h) => h.id === horizon.id)) return doc;
  const name = horizon.name?.trim() ? freeName(doc, horizon.id, horizon.name) : nextHorizonName(doc, horizon.id);
  const h: DocHorizon = {
    visible: true, locked: false, projected: [], joins: [], ...horizon, name,
    pointsPx: horizon.pointsPx.map(([u, v]) => [u, v]),
  };
  const horizons = doc.horizons.slice();
  horizons.splice(Math.max(0, Math.min(index, horizons.length)), 0, h);
  return { ...doc, horizons };
}
