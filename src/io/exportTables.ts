// Tables and data files written from the document: results CSV, horizons in section units, the
// section file for the command line. Every results table carries the caution (DEVELOPERS.md §Project rules).
import { piecesOfPoints } from '../core/model/piecesOfPoints';
import { SECTION_CAUTION } from '../core/analysis/caution';
import { fitCalibration } from '../core/calibration/fitCalibration';
import { imageToSection } from '../core/calibration/mapPoints';
import type { ImportedFault, ImportedHorizon } from '../core/model/commands/importHorizons';
import { activeScenario } from '../core/model/docToSection';
import type { ProjectDoc } from '../core/model/projectDoc';
import { linePoints, type AnySection, type Section } from '../core/model/section';
import type { DocAnalysis } from '../core/analysis/analyseDocSection';
import { cleanCoordinate, cleanPoint } from './cleanCoordinate';
import { CsvCommentLabel, toCsv } from './csvText';
import { columnsOf, csvHeader, dataCell } from '../format/horizonColumns';
import type { UncertaintyReport } from './uncertaintyReport';
import { leftOutText } from '../format/leftOutText';
import { analysisNotes } from '../format/analysisNotes';

/** Returns every horizon of the document in section units, a horizon cut by faults with its pieces (empty when the document has no usable calibration). */
export function docHorizonsInSection(doc: ProjectDoc): ImportedHorizon[] {
  const cal = doc.calibration ? fitCalibration(doc.calibration) : null;
  if (!cal || !cal.ok) return [];
  const fit = cal.fit;
  return doc.horizons.filter((h) => h.pointsPx.length >= 2).map((h) => {
    const line = h.pointsPx.map((p) => imageToSection(fit, p));
    if (h.joins.length === 0) return { name: h.name, line };
    return { name: h.name, line, pieces: piecesOfPoints(line, h.joins) };
  });
}

/** Returns every fault of the document with at least two vertices, in section units (empty without a usable calibration). */
export function docFaultsInSection(doc: ProjectDoc): ImportedFault[] {
  const cal = doc.calibration ? fitCalibration(doc.calibration) : null;
  if (!cal || !cal.ok) return [];
  const fit = cal.fit;
  return doc.faults.filter((f) => f.pointsPx.length >= 2).map((f) => ({ name: f.name, line: f.pointsPx.map((p) => imageToSection(fit, p)) }));
}

/** Returns the section with every coordinate, pin and reference rounded to 1e-6 unit (cleanCoordinate), for writing to a file; the resolution is kept as used (digitisingResolution already gives six figures). */
export function cleanSection({ horizons, faults, ...section }: AnySection): Section {
  return {
    ...section,
    pins: [cleanCoordinate(section.pins[0]), cleanCoordinate(section.pins[1])],
    ...(section.referenceElevation !== undefined ? { referenceElevation: cleanCoordinate(section.referenceElevation) } : {}),
    horizons: horizons.map(({ line, pieces, ...h }) => ({
      ...h,
      ...(line ? { line: linePoints(line).map(cleanPoint) } : {}),
      ...(pieces ? { pieces: pieces.map((p) => linePoints(p).map(cleanPoint)) } : {}),
      regional: h.regional.map(cleanPoint),
    })),
    ...(faults ? { faults: faults.map((f) => ({ ...f, line: linePoints(f.line).map(cleanPoint) })) } : {}),
  };
}

/** Returns the section file (the command line's input, JSON, with a "caution" key) of the active scenario, or a message saying what is missing. */
export function sectionFileText(analysis: DocAnalysis): { ok: true; text: string } | { ok: false; message: string } {
  const ds = analysis.docSection;
  if (!ds.ok) return { ok: false, message: `No section file yet: ${ds.message}` };
  if (ds.section.horizons.length === 0) return { ok: false, message: 'No section file yet: no horizon has a regional.' };
  // validateSection (the command line's reader) ignores keys it does not know, so the caution rides along.
  // The horizons left out of the analysis are not in it; the file says which and why.
  const leftOut = analysis.leftOut.length ? { leftOut: analysis.leftOut.map((h) => ({ name: h.name, reason: h.reason })) } : {};
  return { ok: true, text: JSON.stringify({ ...cleanSection(ds.section), ...leftOut, caution: SECTION_CAUTION }, null, 1) };
}

// Ten significant digits, and a magnitude below 1e-9 (rounding residue of an exact fit) written as 0, never "-0".
const r = (v: number | null | undefined): number | null => (v === null || v === undefined || !Number.isFinite(v) ? null : Math.abs(v) < 1e-9 ? 0 : Number(v.toPrecision(10)));

const comment = (label: string): CsvCommentLabel => new CsvCommentLabel(label);

/** Returns the results table of the analysis as CSV (one row per horizon, then the area–depth line, the last Monte Carlo run and the caution), or null when there are no results. */
export function resultsCsv(doc: ProjectDoc, analysis: DocAnalysis, uncertainty: UncertaintyReport | null = null): string | null {
  const out = analysis.outcome;
  if (!out || !out.ok) return null;
  const a = out.analysis;
  const u = a.units;
  const rows: (string | number | boolean | null | CsvCommentLabel)[][] = [
    [comment('# project'), doc.title], [comment('# scenario'), activeScenario(doc).name], [comment('# units'), u],
    columnsOf('csv').map((c) => csvHeader(c, u)),
    // A single number goes in as a number (csvField guards text that starts like a formula, not numbers).
    ...a.horizons.map((h) => columnsOf('csv').map((c) => { const v = dataCell(c, h); return v !== '' && c.kind === 'horizon' && c.unit !== 'text' && c.unit !== 'yes-no' ? Number(v) : v; })),
  ];
  const ad = a.areaDepth;
  rows.push([]);
  rows.push(['quantity', 'value', 'low_95', 'high_95']);
  rows.push([`pin_width_${u}`, r(a.pinWidth), null, null]);
  rows.push([`reference_elevation_${u}`, r(a.referenceElevation), null, null]);
  if (ad) {
    rows.push([`displacement_${u}`, r(ad.displacement), r(ad.displacementCI95?.[0]), r(ad.displacementCI95?.[1])]);
    rows.push([`detachment_depth_${u}`, r(ad.detachmentDepth), r(ad.detachmentDepthCI95?.[0]), r(ad.detachmentDepthCI95?.[1])]);
    rows.push([`detachment_elevation_${u}`, r(ad.detachmentElevation), null, null]);
    rows.push(['r2', r(ad.r2), null, null]);
    rows.push(['horizons_in_fit', ad.n, null, null]);
  }
  if (uncertainty) {
    rows.push(['sensitivity_amplification_1_plus_W0_over_D', r(uncertainty.amplification), null, null]);
    if (uncertainty.status === 'none') rows.push([comment('# monte carlo'), uncertainty.lines[0]]);
    for (const [name, v] of uncertainty.rows) rows.push([name, typeof v === 'number' ? r(v) : v, null, null]);
  }
  // A horizon left out for a problem of its own (a line that crosses itself, a regional short of a pin), as the pane says.
  for (const h of analysis.leftOut) rows.push([comment('# left out'), leftOutText(h)]);
  for (const n of analysisNotes(a)) rows.push([comment('# note'), n]);
  rows.push([comment('# caution'), SECTION_CAUTION]);
  return toCsv(rows);
}
