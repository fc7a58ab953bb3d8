import type { Cutoff } from '../model/joinPieces';
import type { AnySection, LengthUnit } from '../model/section';
import type { Regime } from './detachmentOfLine';
import type { SectionProblem } from '../model/validateSection';
import { chamberlinDepth, type ChamberlinReason } from './chamberlinDepth';
import { fitAreaDepth, type AreaDepthResult } from './fitAreaDepth';
import { layerParallelStrain } from './layerParallelStrain';
import type { PreparationBuffer } from './preparationBuffer';
import { prepareSection, prepareSectionScratch, type PrepareOptions, type PreparedSection } from './prepareSection';

export type { SectionProblem, SectionProblemCode } from '../model/validateSection';
export type { AreaDepthResult } from './fitAreaDepth';
export type { Cutoff } from '../model/joinPieces';
export type { Regime } from './detachmentOfLine';
export type { ChamberlinReason } from './chamberlinDepth';

export interface HorizonResult {
  name: string; included: boolean; excessArea: number; bedLength: number; regionalLength: number;
  regionalElevation: number; depth: number; chamberlinDepth: number | null;
  /** Why there is no Chamberlin depth (L ≤ W, or a shortening below the digitising resolution), as data; null when there is one. */
  chamberlinReason: ChamberlinReason | null;
  lpsStrain: number | null;
  projectedAreaShare: number; projectedLength: number; residual: number | null;
  /** Number of pieces (1 for an unbroken line) and the cutoff pairs between them (empty for one piece). */
  pieces: number; cutoffs: Cutoff[];
}

export interface SectionAnalysis {
  units: LengthUnit; pinWidth: number; referenceElevation: number;
  horizons: HorizonResult[]; areaDepth: AreaDepthResult | null;
  /** The engine's notes in words; the Chamberlin reasons and projected shares are data on the horizons, and src/format/analysisNotes.ts shows all. */
  notes: string[];
  /** Shortening or extension from the area–depth line; null when there is no detachment below the horizons. */
  regime: Regime | null;
}

export type AnalysisOutcome = { ok: true; analysis: SectionAnalysis; warnings: SectionProblem[] }
  | { ok: false; problems: SectionProblem[] };

/**
 * Full area-balance analysis (units and units² of the section); input problems as { ok: false, problems }, never thrown.
 * A caller that analyses repeatedly may hand in its own `buffer` (createPreparationBuffer) to spare fresh memory per call.
 */
export function analyseSection(section: AnySection, options: PrepareOptions & { buffer?: PreparationBuffer } = {}): AnalysisOutcome {
  // Only numbers leave this function, so the prepared lines may live in the caller's buffer.
  const prep = options.buffer ? prepareSectionScratch(section, options, options.buffer) : prepareSection(section, options);
  if (!prep.ok) return { ok: false, problems: prep.problems };
  return { ok: true, analysis: analysePrepared(prep.prepared), warnings: [] };
}

/** The analysis of an already prepared section (same result as analyseSection). */
export function analysePrepared(p: PreparedSection): SectionAnalysis {
  const depths = p.horizons.map((h) => p.referenceElevation - h.regionalElevation);
  const fitIdx = p.horizons.map((h, i) => (h.included ? i : -1)).filter((i) => i >= 0);
  const area = fitAreaDepth(fitIdx.map((i) => depths[i]), fitIdx.map((i) => p.areas[i]), p.referenceElevation, 'the fit', p.units);
  const ad = area.result;
  const useD = ad !== null && !ad.noDetachment;
  const residuals = new Map(fitIdx.map((i, k) => [i, area.fit ? area.fit.residuals[k] : null]));
  const notes = [...area.notes];
  const horizons = p.horizons.map((h, i): HorizonResult => {
    const chamberlin = chamberlinDepth(h.excessArea, h.bedBeyond - h.regionalBeyond, p.resolution);
    return {
      name: h.name, included: h.included, excessArea: h.excessArea, bedLength: h.bedLength,
      regionalLength: h.regionalLength, regionalElevation: h.regionalElevation, depth: depths[i],
      chamberlinDepth: chamberlin.depth, chamberlinReason: chamberlin.reason,
      lpsStrain: useD ? layerParallelStrain(h.bedLength, h.regionalLength, ad.displacement) : null,
      projectedAreaShare: h.projectedAreaShare, projectedLength: h.projectedLength,
      residual: residuals.get(i) ?? null,
      pieces: h.pieces, cutoffs: h.cutoffs,
    };
  });
  return { units: p.units, pinWidth: p.pinWidth, referenceElevation: p.referenceElevation, horizons, areaDepth: ad, notes, regime: ad ? ad.regime : null };
}
