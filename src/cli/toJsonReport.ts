import type { Regime, SectionAnalysis } from '../core/analysis/analyseSection';
import { SECTION_CAUTION } from '../core/analysis/caution';

/** The --json report (src/cli/README.md §JSON report), keys exactly as listed there; non-finite numbers become null; the caution ends the notes. */
export interface JsonReport {
  pinWidth: number;
  referenceElevation: number;
  horizons: {
    name: string; excessArea: number; bedLength: number; regionalLength: number; regionalElevation: number;
    depth: number; chamberlinDepth: number | null; lpsStrain: number | null; included: boolean;
    /** Pieces of the horizon (1 for an unbroken line) and its cutoff pairs (empty for one piece). */
    pieces: number;
    cutoffs: { fault: string; from: [number, number]; to: [number, number]; slip: number; heave: number; throw: number }[];
  }[];
  areaDepth: {
    n: number; slope: number; intercept: number; displacement: number; detachmentDepth: number | null;
    detachmentElevation: number | null; r2: number; detachmentDepthCI95: [number, number] | null;
    displacementCI95: [number, number] | null;
  } | null;
  /** Shortening (D > 0) or extension (D < 0) when there is a detachment below the horizons, else null. */
  regime: Regime | null;
  notes: string[];
}

/** The analysis reduced to the CLI's JSON report (section units, areas in units²). */
export function toJsonReport(a: SectionAnalysis): JsonReport {
  const d = a.areaDepth;
  return {
    pinWidth: a.pinWidth,
    referenceElevation: a.referenceElevation,
    horizons: a.horizons.map((h) => ({
      name: h.name, excessArea: h.excessArea, bedLength: h.bedLength, regionalLength: h.regionalLength,
      regionalElevation: h.regionalElevation, depth: h.depth, chamberlinDepth: h.chamberlinDepth,
      lpsStrain: h.lpsStrain, included: h.included, pieces: h.pieces,
      cutoffs: h.cutoffs.map((c) => ({ fault: c.fault, from: c.from, to: c.to, slip: c.slip, heave: c.heave, throw: c.throw })),
    })),
    areaDepth: d && {
      n: d.n, slope: d.slope, intercept: d.intercept, displacement: d.displacement,
      detachmentDepth: d.detachmentDepth, detachmentElevation: d.detachmentElevation, r2: d.r2,
      detachmentDepthCI95: d.detachmentDepthCI95, displacementCI95: d.displacementCI95,
    },
    regime: a.regime,
    notes: [...a.notes, SECTION_CAUTION],
  };
}
