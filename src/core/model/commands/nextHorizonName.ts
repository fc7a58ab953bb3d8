import type { ProjectDoc } from '../projectDoc';
import { horizonNameTaken } from './horizonNameTaken';

// Horizon names key the results (horizonNameTaken), and a renamed or imported horizon may already be
// called "Horizon 3": a new horizon's default name must skip every name in use, not trust its id.

/** Returns "Horizon N" for a new horizon: N is the number of its id ("h7" → 7; the count + 1 for another id), raised until no horizon has that name. */
export function nextHorizonName(doc: ProjectDoc, id: string): string {
  const m = /^h(\d+)$/.exec(id);
  let n = m ? Number(m[1]) : doc.horizons.length + 1;
  while (horizonNameTaken(doc, id, `Horizon ${n}`)) n++;
  return `Horizon ${n}`;
}
