import type { Regime, SectionAnalysis } from '../core/analysis/analyseSection';
import { SECTION_CAUTION } from '../core/analysis/caution';
import { jsonHorizon, type JsonHorizon } from '../format/horizonColumns';
import { analysisNotes } from '../format/analysisNotes';

/** The --json report (src/cli/README.md §JSON report), keys exactly as listed there; non-finite numbers become null; the caution ends the notes. */
export interface JsonReport {
  pinWidth: number;
  referenceElevation: number;
  /** One object per horizon: keys and order from src/format/horizonColumns.ts (the JSON columns). */
  horizons: JsonHorizon[];
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
    horizons: a.horizons.map(jsonHorizon),
    areaDepth: d && {
      n: d.n, slope: d.slope, intercept: d.intercept, displacement: d.displacement,
      detachmentDepth: d.detachmentDepth, detachmentElevation: d.detachmentElevation, r2: d.r2,
      detachmentDepthCI95: d.detachmentDepthCI95, displacementCI95: d.displacementCI95,
    },
    regime: a.regime,
    notes: [...analysisNotes(a), SECTION_CAUTION],
  };
}
