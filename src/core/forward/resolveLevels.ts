// Regional elevations, reference elevation and detachment elevation of a forward spec.
import type { ForwardSpec } from './forwardSpec';
import { maxOf } from '../stats/minMax';

export interface ForwardLevels {
  regionalElevations: number[];
  referenceElevation: number;
  detachmentElevation: number;
}

/** Returns the horizons' regional elevations and the reference and detachment elevations; throws on an inconsistent spec. */
export function resolveLevels(spec: ForwardSpec): ForwardLevels {
  const usesDepth = spec.horizons.some((h) => h.regionalElevation === undefined);
  if (usesDepth && spec.referenceElevation === undefined) {
    throw new Error('forward model: horizons given by depth need referenceElevation');
  }
  const regionalElevations = spec.horizons.map((h) => {
    const r = h.regionalElevation ?? (h.depth === undefined ? NaN : spec.referenceElevation! - h.depth);
    if (!Number.isFinite(r)) throw new Error(`forward model: horizon "${h.name}" needs a regionalElevation or a depth`);
    return r;
  });
  // The default reference is the highest regional elevation, as the analysis assumes (docs/method.md §Area-depth line).
  const referenceElevation = spec.referenceElevation ?? maxOf(regionalElevations);
  const hasElevation = spec.detachmentElevation !== undefined;
  if (hasElevation === (spec.detachmentDepth !== undefined)) {
    throw new Error('forward model: give exactly one of detachmentElevation and detachmentDepth');
  }
  const detachmentElevation = hasElevation ? spec.detachmentElevation! : referenceElevation - spec.detachmentDepth!;
  spec.horizons.forEach((h, i) => {
    if (!(regionalElevations[i] > detachmentElevation)) {
      throw new Error(`forward model: horizon "${h.name}" must lie above the detachment`);
    }
  });
  return { regionalElevations, referenceElevation, detachmentElevation };
}
