// The words shown when the pointer rests on a cutoff: the fault, and the separation of the two cutoffs
// along it (slip), across (heave, |Δx|) and up (throw, |Δz|), written by the one formatter.
import type { Cutoff } from '../core/model/joinPieces';
import { formatLength } from '../format/formatQuantity';

/** Returns e.g. "Fault 1 — slip 1250 m · heave 1180 m · throw 412 m" for a cutoff pair in section units. */
export function cutoffText(cutoff: Cutoff, faultName: string, units: string): string {
  return `${faultName} — slip ${formatLength(cutoff.slip, units)} · heave ${formatLength(cutoff.heave, units)} · throw ${formatLength(cutoff.throw, units)}`;
}
