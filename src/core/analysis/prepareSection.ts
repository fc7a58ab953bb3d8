import { digitisingResolution } from '../model/digitisingResolution';
import type { AnySection, LengthUnit } from '../model/section';
import { validateSectionArrays, type Allocate, type SectionProblem } from '../model/validateSection';
import { prepareHorizon, type PreparedHorizon } from './prepareHorizon';
import type { PreparationBuffer } from './preparationBuffer';
import { projectedSegmentFlags } from './projectedSegmentFlags';

// The fast path's starting point: validate once, clip every horizon and regional to the pins
// once, and keep typed arrays plus the base measures. Live dragging, sensitivity sweeps and
// Monte Carlo then re-evaluate from this (shiftRegionals, evaluateShifted) without re-clipping;
// a run that perturbs vertices re-clips one horizon with prepareHorizon.

export interface PreparedSection {
  units: LengthUnit;
  pins: [number, number];
  /** W0 = pR − pL (units). */
  pinWidth: number;
  /** zref (units): the option, else the section's value, else the highest regional elevation of all horizons. */
  referenceElevation: number;
  /** In input order. */
  horizons: PreparedHorizon[];
  /** Per horizon, in input order: A (units²), r (units), 1 if included in the fit. */
  areas: Float64Array;
  regionalElevations: Float64Array;
  included: Uint8Array;
  /** The smallest length the digitising resolves (units): digitisingResolution of the section's stated one and W₀. */
  resolution: number;
}

// The validated input points only live until each horizon is clipped (the clipped lines are new
// arrays), so a caller that prepares many times hands in its own buffer for them
// (createPreparationBuffer); without one they are fresh arrays. A one-off analysis (analyseSection)
// keeps nothing of the prepared section, so its clipped lines may live in the caller's buffer too
// (prepareSectionScratch). The engine holds no memory of its own between calls, so it is
// re-entrant: two preparations with two buffers may be interleaved, in one thread or in two workers.

export interface PrepareOptions {
  referenceElevation?: number;
}

export type SectionPreparation = { ok: true; prepared: PreparedSection } | { ok: false; problems: SectionProblem[] };

/** The section validated, clipped and measured once; every problem found (structure, pins, self-crossing) instead of throwing. */
export function prepareSection(section: AnySection, options: PrepareOptions = {}, buffer?: PreparationBuffer): SectionPreparation {
  return prepare(section, options, buffer, false);
}

/** As prepareSection, but the clipped lines live in the caller's buffer: read the result before that buffer's next use, keep none of its arrays. */
export function prepareSectionScratch(section: AnySection, options: PrepareOptions, buffer: PreparationBuffer): SectionPreparation {
  return prepare(section, options, buffer, true);
}

function prepare(section: AnySection, options: PrepareOptions, buffer: PreparationBuffer | undefined, scratch: boolean): SectionPreparation {
  // Validation copies the points straight into typed arrays, so every vertex is read from the input once.
  buffer?.reset();
  const v = validateSectionArrays(section, buffer?.allocate);
  const clipAllocate: Allocate | undefined = scratch ? buffer?.allocate : undefined;
  if (!v.ok) return { ok: false, problems: v.problems };
  const s = v.section;
  const option = options.referenceElevation;
  if (option !== undefined && !Number.isFinite(option)) {
    return { ok: false, problems: [{ code: 'not-finite', message: 'The reference elevation option is not a finite number; pass a real elevation or leave it out.' }] };
  }
  if (s.horizons.length === 0) {
    return { ok: false, problems: [{ code: 'empty-section', message: 'The section has no horizons; add at least one horizon with its line and regional.' }] };
  }
  const problems: SectionProblem[] = [];
  const horizons: PreparedHorizon[] = [];
  for (const h of s.horizons) {
    // No flags at all when nothing is projected: the same result, without a pass over empty flags.
    const flags = h.projected && h.projected.length > 0 ? projectedSegmentFlags(h.projected, h.lineX.length) : undefined;
    const join = h.faultSegments ? { faultSegments: h.faultSegments, pieces: h.pieceCount, cutoffs: h.cutoffs } : undefined;
    const p = prepareHorizon(h.name, h.lineX, h.lineZ, h.regionalX, h.regionalZ, s.pins, h.include !== false, flags, s.units, clipAllocate, join);
    if (p.ok) horizons.push(p.horizon);
    else for (const q of p.problems) problems.push(q);
  }
  if (problems.length > 0) return { ok: false, problems };
  const n = horizons.length;
  const areas = new Float64Array(n);
  const regionalElevations = new Float64Array(n);
  const included = new Uint8Array(n);
  let highest = -Infinity;
  horizons.forEach((h, i) => {
    areas[i] = h.excessArea;
    regionalElevations[i] = h.regionalElevation;
    included[i] = h.included ? 1 : 0;
    highest = Math.max(highest, h.regionalElevation);
  });
  return {
    ok: true,
    prepared: {
      units: s.units, pins: s.pins, pinWidth: s.pins[1] - s.pins[0],
      referenceElevation: option ?? s.referenceElevation ?? highest,
      horizons, areas, regionalElevations, included,
      resolution: digitisingResolution({ stated: s.resolution, pinWidth: s.pins[1] - s.pins[0] }),
    },
  };
}
