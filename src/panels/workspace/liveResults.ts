// The numbers of the results strip: a reading of the one live analysis (selectLiveAnalysis, core's
// analyseDocGesture) that the pane, the graph, the detachment line and the exports read too, so the strip
// cannot disagree with them. It follows a regional drag every frame through that analysis's fast path.
import type { DocAnalysis } from '../../core/analysis/analyseDocSection';
import type { Regime } from '../../core/analysis/analyseSection';
import { activeScenario } from '../../core/model/docToSection';
import type { ProjectDoc } from '../../core/model/projectDoc';
import type { LengthUnit } from '../../core/model/section';
import type { AreaUnit } from '../../format/formatQuantity';
import { tableAreaUnit } from '../../format/horizonColumns';
import { selectLiveAnalysis } from '../../state/selectors';

export interface LiveHorizon {
  id: string; name: string; colour: string; excessArea: number | null; included: boolean;
  /** Why the horizon is left out of the analysis (a problem of its own line or regional), or null. */
  leftOutReason: string | null;
}

export type LiveResults =
  | { ready: false; message: string; horizons: LiveHorizon[] }
  | {
    ready: true; units: LengthUnit; horizons: LiveHorizon[];
    /** The one area unit for every horizon's area, the same as the pane's table and the exports (tableAreaUnit). */
    areaUnit: AreaUnit;
    /** Null when fewer than two included horizons at distinct depths. */
    detachmentDepth: number | null; detachmentElevation: number | null; displacement: number | null;
    noDetachment: boolean; referenceElevation: number; note: string | null;
    /** Shortening or extension, from the area–depth line; null without a detachment. */
    regime: Regime | null;
  };

// The strip's numbers are read by each of its live texts (panels/liveText.tsx): made once per analysis.
const read = new WeakMap<DocAnalysis, { doc: ProjectDoc; results: LiveResults }>();

/** Returns the strip's numbers for the document (section units; areas in units²), or why there are none yet. */
export function liveResults(doc: ProjectDoc, gestureStart: ProjectDoc | null = null): LiveResults {
  const d = selectLiveAnalysis(doc, gestureStart);
  const hit = read.get(d);
  if (hit && hit.doc === doc) return hit.results;
  const results = liveResultsOf(doc, d);
  read.set(d, { doc, results });
  return results;
}

/** The strip's reading of an analysis already at hand. */
export function liveResultsOf(doc: ProjectDoc, d: DocAnalysis): LiveResults {
  const excluded = activeScenario(doc).excluded;
  const reasons = new Map(d.leftOut.map((h) => [h.id, h.reason]));
  const analysis = d.outcome?.ok ? d.outcome.analysis : null;
  const areas = new Map<string, number>();
  if (analysis && d.docSection.ok) d.docSection.horizonIds.forEach((id, i) => areas.set(id, analysis.horizons[i].excessArea));
  const horizons = doc.horizons.map((h): LiveHorizon => ({
    id: h.id, name: h.name, colour: h.colour, excessArea: areas.get(h.id) ?? null,
    included: !excluded.includes(h.id), leftOutReason: reasons.get(h.id) ?? null,
  }));
  if (!d.docSection.ok) return { ready: false, message: d.docSection.message, horizons };
  if (!d.outcome) return { ready: false, message: 'Draw a regional for each horizon to see its excess area.', horizons };
  if (!d.outcome.ok) return { ready: false, message: d.outcome.problems[0]?.message ?? 'The section cannot be analysed.', horizons };
  const a = d.outcome.analysis;
  const ad = a.areaDepth;
  const leftOut = d.leftOut.length === 0 ? null
    : `Left out: ${d.leftOut.map((h) => `${h.name} (${h.reason.replace(/\.$/, '')})`).join('; ')}.`;
  const fitNote = !ad ? 'Include at least two horizons at different depths for an area–depth line.'
    : ad.noDetachment ? 'No detachment below these horizons: the area–depth line does not reach zero area below the deepest one.' : null;
  return {
    ready: true, units: a.units, horizons, areaUnit: tableAreaUnit(a),
    detachmentElevation: ad?.detachmentElevation ?? null,
    detachmentDepth: ad?.detachmentDepth ?? null,
    displacement: ad ? ad.displacement : null,
    noDetachment: ad?.noDetachment ?? false,
    referenceElevation: a.referenceElevation,
    regime: ad && !ad.noDetachment ? ad.regime : null,
    note: [fitNote, leftOut].filter((s) => s !== null).join(' ') || null,
  };
}
