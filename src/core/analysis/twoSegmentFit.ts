import { fitAreaDepth, type AreaDepthFit } from './fitAreaDepth';

// Upper detachment (Epard & Groshong 1993; Groshong 2006 ch. 11): horizons above an upper
// detachment carry the displacement of both detachments, those between carry only the lower
// one, so the area–depth graph has two straight segments. Fitting each separately, the
// difference in slopes (lower minus upper) is the upper detachment's displacement, and the two
// lines meet at the upper detachment's depth (our derivation from A = Σ Dₖ (zₖ − h)).

export interface TwoSegmentFit {
  /** Horizons shallower than the split (h < splitDepth) and the rest (h ≥ splitDepth). */
  upper: AreaDepthFit;
  lower: AreaDepthFit;
  /** slope(lower) − slope(upper) (units); null unless both lines exist. */
  upperDisplacement: number | null;
  /** Depth (units below the reference) where the two lines meet, and its elevation; null when parallel or a line is missing. */
  upperDetachmentDepth: number | null;
  upperDetachmentElevation: number | null;
  notes: string[];
}

/** Separate area–depth lines above and below splitDepth (units) with the upper detachment's displacement and depth; nulls with notes when a side has < 2 depths. */
export function twoSegmentFit(depths: ArrayLike<number>, areas: ArrayLike<number>, splitDepth: number, referenceElevation: number): TwoSegmentFit {
  const up: [number[], number[]] = [[], []];
  const low: [number[], number[]] = [[], []];
  for (let i = 0; i < depths.length; i++) {
    const side = depths[i] < splitDepth ? up : low;
    side[0].push(depths[i]);
    side[1].push(areas[i]);
  }
  const upper = fitAreaDepth(up[0], up[1], referenceElevation, 'the part above the split');
  const lower = fitAreaDepth(low[0], low[1], referenceElevation, 'the part below the split');
  const notes = [...upper.notes, ...lower.notes];
  if (!upper.result || !lower.result) {
    return { upper, lower, upperDisplacement: null, upperDetachmentDepth: null, upperDetachmentElevation: null, notes };
  }
  const a = upper.result;
  const b = lower.result;
  const upperDisplacement = b.slope - a.slope;
  const meet = a.slope === b.slope ? null : (b.intercept - a.intercept) / (a.slope - b.slope);
  if (upperDisplacement <= 0) notes.push('The upper segment is not steeper than the lower one: no upper detachment is indicated at this split.');
  return {
    upper, lower, upperDisplacement,
    upperDetachmentDepth: meet,
    upperDetachmentElevation: meet === null ? null : referenceElevation - meet,
    notes,
  };
}
