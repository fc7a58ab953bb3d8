import { fiellerInterval, type FiellerResult } from '../stats/fiellerInterval';
import { leastSquares, type LineFit } from '../stats/leastSquares';
import { slopeInterval } from '../stats/slopeInterval';
import type { LengthUnit } from '../model/section';
import { detachmentOfLine, type Regime } from './detachmentOfLine';
import { formatNumber } from '../model/numberText';

// The area–depth line of Epard & Groshong (1993): least squares A = a + b·h over the included
// horizons; D = −b, zd = −a/b, detachment elevation zref − zd; 95% interval on D from the
// slope's t interval and on zd by Fieller's theorem (docs/method.md §Area-depth line, §Fieller interval). Shortening
// (D > 0) and extension (D < 0, Groshong 1994) alike: the zero crossing is the detachment when it
// lies below the deepest horizon in the fit (detachmentOfLine); otherwise, or for a zero slope,
// "no detachment below these horizons", never a depth.

export interface AreaDepthResult {
  n: number; df: number; slope: number; intercept: number; slopeSE: number; interceptSE: number;
  r2: number; s: number; displacement: number; noDetachment: boolean;
  /** Shortening (D > 0) or extension (D < 0) when there is a detachment; null when there is none. */
  regime: Regime | null;
  detachmentDepth: number | null; detachmentElevation: number | null;
  displacementCI95: [number, number] | null; detachmentDepthCI95: [number, number] | null;
  detachmentDepthInterval: FiellerResult;
}

export interface AreaDepthFit {
  /** Null when fewer than 2 horizons or all at one depth (the reason is in notes). */
  result: AreaDepthResult | null;
  /** The underlying least-squares fit (residuals in input order of the given points). */
  fit: LineFit | null;
  /** The notes in words; an unbounded Fieller interval's g is data on the result, written by src/format/analysisNotes.ts (fitNotes). */
  notes: string[];
}

/** The note (and Fieller reason) given when the area–depth line has no zero crossing below the deepest horizon in the fit. */
export const NO_DETACHMENT_NOTE = 'no detachment below these horizons: the area–depth line does not reach zero area below the deepest horizon in the fit (or its slope is 0).';

/** Area–depth line through (depth h, area A) pairs (units, units²) with intervals and notes (depths labelled with `units` when given); result null with the reason when no line is possible. */
export function fitAreaDepth(depths: ArrayLike<number>, areas: ArrayLike<number>, referenceElevation: number, label = 'the fit', units?: LengthUnit): AreaDepthFit {
  const notes: string[] = [];
  const fit = leastSquares(depths, areas);
  if (!fit) {
    if (depths.length < 2) {
      notes.push(`Fewer than two usable horizons in ${label} (n = ${depths.length}): no area–depth line; include at least two horizons at different depths.`);
    } else {
      const depth = `${formatNumber(depths[0], 6)}${units ? ` ${units}` : ''}`;
      notes.push(`All regionals in ${label} lie at one depth (${depth}): no area–depth line; it needs horizons at two or more depths.`);
    }
    return { result: null, fit: null, notes };
  }
  const found = detachmentOfLine(fit.slope, fit.intercept, maxOf(depths));
  const noDetachment = found.depth === null;
  const slopeCI = slopeInterval(fit, 0.95);
  const displacementCI95: [number, number] | null = slopeCI ? [-slopeCI[1], -slopeCI[0]] : null;
  let interval: FiellerResult;
  if (noDetachment) {
    interval = { kind: 'none', estimate: null, reason: NO_DETACHMENT_NOTE };
    notes.push(NO_DETACHMENT_NOTE);
  } else {
    interval = fiellerInterval(fit, 0, 0.95);
  }
  const zd = found.depth;
  if (fit.n === 2) {
    notes.push('Only two horizons in the fit: the line passes through both exactly, so there are no intervals (0 degrees of freedom).');
  } else if (!noDetachment && interval.kind === 'none') {
    notes.push(`No interval on the detachment depth: ${interval.reason}`);
  }
  if (found.regime === 'extension') {
    notes.push('Extension: the excess areas lie below the regionals (lost area) and the displacement D is negative (extension −D).');
  }
  return {
    fit,
    notes,
    result: {
      n: fit.n, df: fit.df, slope: fit.slope, intercept: fit.intercept, slopeSE: fit.slopeSE, interceptSE: fit.interceptSE,
      r2: fit.r2, s: fit.s, displacement: -fit.slope, noDetachment, regime: found.regime,
      detachmentDepth: zd, detachmentElevation: zd === null ? null : referenceElevation - zd,
      displacementCI95,
      detachmentDepthCI95: interval.kind === 'bounded' ? [interval.lo, interval.hi] : null,
      detachmentDepthInterval: interval,
    },
  };
}

function maxOf(a: ArrayLike<number>): number {
  let m = -Infinity;
  for (let i = 0; i < a.length; i++) m = Math.max(m, a[i]);
  return m;
}
