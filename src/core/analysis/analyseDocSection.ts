// The analysis of a project document's scenario as the app shows it (memoised by state/selectors).
import type { DocSection } from '../model/docToSection';
import type { PreparationBuffer } from './preparationBuffer';
import { analysePrepared, type AnalysisOutcome } from './analyseSection';
import { prepareSection, type PreparedSection } from './prepareSection';

/** A horizon the engine could not analyse (its own input problem), left out so that the others still are. */
export interface LeftOutHorizon { id: string; name: string; reason: string }

export interface DocAnalysis {
  /** The section analysed: without the left-out horizons (their ids are not in horizonIds). */
  docSection: DocSection;
  /** Null when the document is not yet ready to analyse (no calibration, no pins, no regionals). */
  outcome: AnalysisOutcome | null;
  /** Horizons left out for a problem of their own (e.g. a regional short of a pin); empty when none. */
  leftOut: LeftOutHorizon[];
  /**
   * The preparation the outcome was computed from (docSection.section validated, clipped and measured), when the
   * outcome is ok: a gesture's start and the sensitivity sweeps start from it instead of preparing the same
   * section again (a big document's lines take a tenth of a second each time). Shared: never change it.
   */
  prepared?: PreparedSection;
}

// One unfinished horizon must not hide the results of the others while the user works (the CLI stays
// strict: it reads analyseSection directly). When every problem the engine reports names a horizon,
// those horizons are left out with the engine's message as the reason and the rest is analysed again;
// a problem of the whole section (pins, units) still stops the analysis.

/** Returns the analysis of a document's section, leaving out horizons with problems of their own (listed with the reason); outcome null when there is nothing to analyse. `buffer`: the caller's reusable memory for the validated input (createPreparationBuffer), else fresh arrays. */
export function analyseDocSection(docSection: DocSection, buffer?: PreparationBuffer): DocAnalysis {
  if (!docSection.ok || docSection.section.horizons.length === 0) return { docSection, outcome: null, leftOut: [] };
  const first = analysed(docSection, buffer);
  const outcome = first.outcome;
  if (outcome.ok || !outcome.problems.every((p) => p.horizon !== undefined)) return { docSection, leftOut: [], ...first };
  const bad = new Map<string, string>();
  for (const p of outcome.problems) {
    const reason = problemReason(p.message, p.horizon!);
    const had = bad.get(p.horizon!);
    bad.set(p.horizon!, had && had !== reason ? `${had}; ${reason}` : reason);
  }
  const keep = docSection.section.horizons.map((h) => !bad.has(h.name));
  // A problem naming no horizon of the section, or every horizon bad: nothing to gain, report as it is.
  if (keep.every((k) => k) || !keep.some((k) => k)) return { docSection, outcome, leftOut: [] };
  const leftOut = docSection.horizonIds.flatMap((id, i) => (keep[i] ? [] : [{ id, name: docSection.section.horizons[i].name, reason: bad.get(docSection.section.horizons[i].name)! }]));
  const reduced: DocSection = {
    ...docSection,
    section: { ...docSection.section, horizons: docSection.section.horizons.filter((_, i) => keep[i]) },
    horizonIds: docSection.horizonIds.filter((_, i) => keep[i]),
  };
  const again = analysed(reduced, buffer);
  // Leaving some out can bring up a problem of the rest only in theory (problems are per horizon); keep it honest.
  return again.outcome.ok ? { docSection: reduced, leftOut, ...again } : { docSection, outcome, leftOut: [] };
}

/** analyseSection of the section (the same outcome), with the preparation it was computed from when it is ok. */
function analysed(docSection: Extract<DocSection, { ok: true }>, buffer: PreparationBuffer | undefined): { outcome: AnalysisOutcome; prepared?: PreparedSection } {
  const prep = prepareSection(docSection.section, {}, buffer);
  if (!prep.ok) return { outcome: { ok: false, problems: prep.problems } };
  return { outcome: { ok: true, analysis: analysePrepared(prep.prepared), warnings: [] }, prepared: prep.prepared };
}

/** The engine's message without its leading 'Horizon "name": ' (the pane names the horizon itself). */
function problemReason(message: string, name: string): string {
  const prefix = `Horizon "${name}"`;
  if (!message.startsWith(prefix)) return message;
  return message.slice(prefix.length).replace(/^\s*[:,]?\s*/, '');
}
