// The annotated section as one SVG document: scan, horizons (each piece of a cut horizon drawn on its own),
// faults (heavy, long dashes) with the fault stretch between cutoffs thin in the horizon's colour, regionals, pins, excess-area fills
// (orange above the regional, blue below, as on the canvas), detachment and its 95% band, the
// reference level of the depths, elevation and distance scales, legend of what is drawn, scale bar,
// vertical exaggeration, title block, an inset area–depth graph and the caution. Pure: the same input always gives the same string; every
// user string is escaped (escapeXml), so a hostile name stays text.
import { piecesOfPoints } from '../core/model/piecesOfPoints';
import { SECTION_CAUTION } from '../core/analysis/caution';
import { leftOutText } from '../format/leftOutText';
import { imageToSection } from '../core/calibration/mapPoints';
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { toCoordinateArrays } from '../core/geometry/toCoordinateArrays';
import { activeScenario } from '../core/model/docToSection';
import type { ImagePx, ProjectDoc } from '../core/model/projectDoc';
import type { XZ } from '../core/model/section';
import { isExactFit } from '../core/analysis/isExactFit';
import type { DocAnalysis } from '../core/analysis/analyseDocSection';
import { areaDepthGroup } from './renderAreaDepthSvg';
import { escapeXml } from './escapeXml';
import { EXACT_FIT_TEXT, formatInterval, formatNumber, formatR2 } from '../format/formatQuantity';
import { niceStep } from '../format/niceTicks';
import { halo, sectionAxes } from './sectionFigureAxes';
import { fitSectionFrame, imageToFigureMatrix, sectionToFigure, type SectionFrame } from './sectionFigureFrame';
import { EXCESS_FILL, FAULT_COLOURS, MARK_COLOURS, scenarioColour } from '../core/model/horizonPalette';
import { fillHorizonPart, fillRegionalPart } from '../core/geometry/excessFillOutline';
import { joinPieces } from '../core/model/joinPieces';
import type { FaultArrays } from '../core/model/readFault';
import { lineArrays, type SectionHorizon, type SectionLine } from '../core/model/section';
import type { SectionProblem } from '../core/model/sectionProblem';

export const FIGURE_WIDTH = 1400;
export const FIGURE_HEIGHT = 990;
// Room on the left for the elevation labels and below for the distance labels.
const PANEL = { x: 92, y: 96, w: 908, h: 690 };
/** The excess-area fills, as on the canvas (src/core/model/horizonPalette.ts EXCESS_FILL). */
export const FIGURE_FILL_ABOVE = EXCESS_FILL.above;
export const FIGURE_FILL_BELOW = EXCESS_FILL.below;
const RED = MARK_COLOURS.detachment;
const PIN = MARK_COLOURS.pin;
/** A fault's line width and dash (figure units), heavier than a horizon (2.5) and long-dashed, as on the canvas (src/tools/faultStyle.ts). */
export const FIGURE_FAULT_WIDTH = 3.5;
export const FIGURE_FAULT_DASH = '16 5';

/** The horizon's line as measured (section units): its line, or its pieces joined along their faults (the analysis's rule), with which segments run along a fault; null when the pieces do not join. */
function measuredLine(h: SectionHorizon<SectionLine>, faults: readonly FaultArrays[]): { xs: ArrayLike<number>; zs: ArrayLike<number>; alongFault: ArrayLike<number> | null } | null {
  if (h.line) return { ...lineArrays(h.line), alongFault: null };
  if (!h.pieces) return null;
  if (h.pieces.length === 1) return { ...lineArrays(h.pieces[0]), alongFault: null };
  const problems: SectionProblem[] = [];
  // The section was checked when it was built (piece ends on their faults within the analysis's tolerance); join as it does.
  const joined = joinPieces(h.pieces.map(lineArrays), faults, Infinity, 'horizon', h.name, problems, (n) => new Float64Array(n), h.joinFaults);
  return joined ? { xs: joined.xs, zs: joined.zs, alongFault: joined.faultSegments } : null;
}

export interface SectionFigureInput {
  doc: ProjectDoc;
  analysis: DocAnalysis;
  /** The scan as a data: URL, or null to draw without it. */
  scanDataUrl: string | null;
  /** The date printed in the title block (e.g. 2024-05-01). */
  date: string;
  /** Vertical exaggeration to draw (1 = true scale); absent or null: as on the scan (the calibration's). */
  verticalExaggeration?: number | null;
}

const pts = (list: [number, number][]) => list.map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`).join(' ');

/** Without a calibration the drawing stays in image pixels (z = −v), with no scales. */
const PIXEL_FIT: FittedCalibration = { kind: 'axes', a: [0, 1, 0], b: [0, 0, -1], unitsPerPxX: 1, unitsPerPxZ: 1, verticalExaggeration: 1, residuals: [], worstRelativeResidual: 0 };

/** Returns the section window the figure shows: the scan's corners, or (without a scan) everything drawn with a margin. */
function sectionWindow(doc: ProjectDoc, fit: FittedCalibration, extra: XZ[]): { x: [number, number]; z: [number, number] } {
  const all: XZ[] = [];
  if (doc.scan) {
    const { widthPx: w, heightPx: h } = doc.scan;
    for (const p of [[0, 0], [w, 0], [0, h], [w, h]] as ImagePx[]) all.push(imageToSection(fit, p));
  } else {
    for (const hz of doc.horizons) for (const p of hz.pointsPx) all.push(imageToSection(fit, p));
    for (const sc of doc.scenarios) {
      for (const r of Object.values(sc.regionals)) for (const p of r) all.push(imageToSection(fit, p));
      for (const p of sc.pinsPx ?? []) all.push(imageToSection(fit, p));
    }
    for (const q of extra) all.push(q);
  }
  if (all.length === 0) return { x: [0, 1000], z: [-700, 0] };
  let [x0, x1, z0, z1] = [Infinity, -Infinity, Infinity, -Infinity];
  for (const [x, z] of all) {
    if (!Number.isFinite(x) || !Number.isFinite(z)) continue;
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (z < z0) z0 = z;
    if (z > z1) z1 = z;
  }
  if (!(x1 >= x0)) return { x: [0, 1000], z: [-700, 0] };
  if (doc.scan) return { x: [x0, x1], z: [z0, z1] };
  const mx = 0.06 * Math.max(x1 - x0, 1), mz = 0.06 * Math.max(z1 - z0, 1);
  return { x: [x0 - mx, x1 + mx], z: [z0 - mz, z1 + mz] };
}

function hline(f: SectionFrame, z: number): string {
  const [p, q] = [sectionToFigure(f, [f.xRange[0], z]), sectionToFigure(f, [f.xRange[1], z])];
  return `x1="${p[0].toFixed(2)}" y1="${p[1].toFixed(2)}" x2="${q[0].toFixed(2)}" y2="${q[1].toFixed(2)}"`;
}

function wrap(text: string, width: number): string[] {
  const lines: string[] = [];
  let cur = '';
  for (const word of text.split(/\s+/)) {
    if ((cur + ' ' + word).trim().length > width) { lines.push(cur); cur = word; } else cur = (cur + ' ' + word).trim();
  }
  if (cur) lines.push(cur);
  return lines;
}

/** What the drawing holds, so that the legend lists only that. */
interface Drawn { faults: boolean; stretches: boolean; regionals: boolean; pins: boolean; above: boolean; below: boolean; projected: boolean; detachment: boolean; band: boolean; reference: boolean }

function legendRows(doc: ProjectDoc, drawn: Drawn, x: number, y: number): { svg: string; bottom: number } {
  const rows: string[] = [];
  const shown = doc.horizons.filter((h) => h.visible).slice(0, 12);
  let yy = y + 38;
  for (const h of shown) {
    rows.push(`<line x1="${x + 10}" y1="${yy - 4}" x2="${x + 40}" y2="${yy - 4}" stroke="${escapeXml(h.colour)}" stroke-width="2.5"/><text x="${x + 48}" y="${yy}" font-size="11">${escapeXml(h.name.slice(0, 48))}</text>`);
    yy += 17;
  }
  const more = doc.horizons.filter((h) => h.visible).length - shown.length;
  if (more > 0) { rows.push(`<text x="${x + 48}" y="${yy}" font-size="11">… and ${more} more</text>`); yy += 17; }
  yy += 4;
  const line = (stroke: string, w: number, dash = '') => (yy: number) => `<line x1="${x + 10}" y1="${yy - 4}" x2="${x + 40}" y2="${yy - 4}" stroke="${stroke}" stroke-width="${w}"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;
  const box = (fill: string, opacity: number) => (yy: number) => `<rect x="${x + 10}" y="${yy - 10}" width="30" height="10" fill="${fill}" fill-opacity="${opacity}" stroke="${fill}" stroke-opacity="0.6" stroke-width="0.6"/>`;
  const key: [string, (yy: number) => string][] = [];
  if (drawn.faults) key.push(['fault (heavy, long dashes)', line(FAULT_COLOURS[0], FIGURE_FAULT_WIDTH, FIGURE_FAULT_DASH)]);
  if (drawn.stretches) key.push(['horizon along its fault, between cutoffs (thin)', line('#444', 1.2)]);
  if (drawn.regionals) key.push(['regional (dashed, in the horizon’s colour)', line('#444', 1.5, '7 4')]);
  if (drawn.pins) key.push(['pin', (yy) => `<line x1="${x + 25}" y1="${yy - 11}" x2="${x + 25}" y2="${yy + 3}" stroke="${PIN}" stroke-width="2"/>`]);
  if (drawn.above || drawn.below) {
    key.push(['excess area above the regional (added)', box(FIGURE_FILL_ABOVE.colour, FIGURE_FILL_ABOVE.opacity + 0.1)]);
    key.push(['excess area below the regional (subtracted)', box(FIGURE_FILL_BELOW.colour, FIGURE_FILL_BELOW.opacity + 0.1)]);
  }
  if (drawn.projected) key.push(['projected (interpreted) segment', (yy) => `${line('#444', 2.5)(yy)}${line('#ffffff', 1.6, '3 3')(yy)}`]);
  if (drawn.reference) key.push(['reference level: depths are measured below it', line('#1d2731', 1.3, '10 3 2 3')]);
  if (drawn.detachment) key.push(['estimated detachment', line(RED, 3)]);
  if (drawn.band) key.push(['95% interval on its depth (Fieller)', box(RED, 0.15)]);
  for (const [label, mark] of key) {
    rows.push(`${mark(yy)}<text x="${x + 48}" y="${yy}" font-size="11">${label}</text>`);
    yy += 17;
  }
  const bottom = yy + 4;
  return { svg: `<g class="legend"><rect x="${x}" y="${y}" width="340" height="${bottom - y}" fill="#ffffff" stroke="#9aa5ad"/><text x="${x + 10}" y="${y + 18}" font-size="12" font-weight="bold">Legend</text>${rows.join('')}</g>`, bottom };
}

/** Returns the regional's z at x by linear interpolation along its clipped vertices (x increasing). */
function zAt(xs: ArrayLike<number>, zs: ArrayLike<number>, x: number): number {
  for (let i = 1; i < xs.length; i++) {
    if (x <= xs[i] || i === xs.length - 1) {
      const t = xs[i] === xs[i - 1] ? 0 : (x - xs[i - 1]) / (xs[i] - xs[i - 1]);
      return zs[i - 1] + t * (zs[i] - zs[i - 1]);
    }
  }
  return zs[0];
}

/** Returns the runs of consecutive segments flagged along a fault, as point lists. */
function alongFaultRuns(xs: ArrayLike<number>, zs: ArrayLike<number>, along: ArrayLike<number>): XZ[][] {
  const runs: XZ[][] = [];
  let run: XZ[] | null = null;
  for (let s = 0; s < along.length; s++) {
    if (along[s] !== 1) { run = null; continue; }
    if (!run) runs.push((run = [[xs[s], zs[s]]]));
    run.push([xs[s + 1], zs[s + 1]]);
  }
  return runs;
}


/**
 * The figure in the two parts drawn below and above the scan, with where the scan goes: so that a PNG can draw
 * the decoded scan itself between them (exportFigure.startFigurePng) instead of passing it through an SVG string.
 */
export interface SectionSvgParts {
  /** `<svg …>` and its `<defs>`: opens both parts. */
  head: string;
  /** Everything drawn before the scan (background, title block, the panel's box). */
  under: string;
  /** The opening of the panel's clipped group: the scan is drawn first inside it. */
  panelOpen: string;
  /** Everything drawn after the scan, closing the panel's group; ends before `</svg>`. */
  over: string;
  /** The panel's box (figure units): the scan is clipped to it. */
  panel: { x: number; y: number; w: number; h: number };
  /** The scan's place: scan pixels (0, 0)–(widthPx, heightPx) mapped to figure units by the affine `matrix` (SVG order a b c d e f), at `opacity`; null without a scan. */
  scan: { widthPx: number; heightPx: number; matrix: [number, number, number, number, number, number]; opacity: number } | null;
  /** Section units → figure units (sectionToFigure): how to read the drawing back in section units. */
  frame: SectionFrame;
}

/** The text cut to at most `max` characters, ending in "…" when it was cut. */
function shortened(text: string, max: number): string {
  const chars = Array.from(text);
  return chars.length <= max ? text : `${chars.slice(0, max - 1).join('')}…`;
}

/** Returns the scan's `<image>` element up to its `href` value (the caller writes the URL, escaped, then `"/>`): one element, one embedding. */
export function scanImageOpen(scan: NonNullable<SectionSvgParts['scan']>): string {
  return `<image class="scan" x="0" y="0" width="${scan.widthPx}" height="${scan.heightPx}" transform="matrix(${scan.matrix.join(' ')})" preserveAspectRatio="none" opacity="${scan.opacity}" href="`;
}

/** Returns the annotated section figure as an SVG document string (FIGURE_WIDTH × FIGURE_HEIGHT units); sections without results still show the drawing and say why. The scan, when given, is embedded once. */
export function renderSectionSvg(input: SectionFigureInput): string {
  const parts = renderSectionSvgParts(input);
  const { scan } = parts;
  const image = scan && input.scanDataUrl ? `${scanImageOpen(scan)}${escapeXml(input.scanDataUrl)}"/>` : '';
  return `${parts.head}${parts.under}${parts.panelOpen}${image}${parts.over}</svg>`;
}

/** Returns the figure's parts below and above the scan and the scan's place (SectionSvgParts); the scan's data URL is not read. */
export function renderSectionSvgParts(input: Omit<SectionFigureInput, 'scanDataUrl'>): SectionSvgParts {
  const { doc, analysis, date } = input;
  const scenario = activeScenario(doc);
  const ds = analysis.docSection;
  const fit = ds.fit;
  const result = analysis.outcome && analysis.outcome.ok ? analysis.outcome.analysis : null;
  const ad = result?.areaDepth ?? null;
  const hasDetachment = Boolean(fit && ds.ok && ad && !ad.noDetachment && ad.detachmentElevation !== null && result);
  // Without a scan the drawing is framed to show the detachment and its band as well.
  const extra: XZ[] = [];
  if (fit && ds.ok && ad && hasDetachment && result) {
    const els = [ad.detachmentElevation as number, ...(ad.detachmentDepthCI95 ?? []).map((d) => result.referenceElevation - d)];
    for (const e of els) extra.push([ds.section.pins[0], e], [ds.section.pins[1], e]);
  }
  // Drawn in section coordinates (x right, z up) at the chosen vertical exaggeration, or the scan's own.
  const mapFit = fit ?? PIXEL_FIT;
  const chosenVe = input.verticalExaggeration ?? null;
  const ve = fit ? (chosenVe && chosenVe > 0 ? chosenVe : fit.verticalExaggeration) : 1;
  const frame = fitSectionFrame(sectionWindow(doc, mapFit, extra), ve, PANEL);
  const [xLo, xHi] = frame.xRange;
  const [zLo, zHi] = frame.zRange;
  const toFig = (q: XZ) => sectionToFigure(frame, q);
  const fig = (p: ImagePx) => toFig(imageToSection(mapFit, p));
  const drawn: Drawn = { faults: false, stretches: false, regionals: false, pins: false, above: false, below: false, projected: false, detachment: false, band: false, reference: false };
  const out: string[] = [];
  const defs: string[] = [`<clipPath id="panel-clip"><rect x="${PANEL.x}" y="${PANEL.y}" width="${PANEL.w}" height="${PANEL.h}"/></clipPath>`];
  out.push(`<rect width="${FIGURE_WIDTH}" height="${FIGURE_HEIGHT}" fill="#ffffff"/>`);
  // Title block: title, byline, then the headline result on a line of its own.
  const u = escapeXml(doc.units);
  out.push(`<g class="title-block"><rect x="30" y="14" width="${FIGURE_WIDTH - 60}" height="72" fill="#f3f5f7" stroke="#9aa5ad"/>`);
  // The title block holds only so much: a longer text is shortened with an ellipsis, so the figure shows it was cut.
  out.push(`<text x="42" y="40" font-size="22" font-weight="bold">${escapeXml(shortened(doc.title, 100))}</text>`);
  out.push(`<text x="${FIGURE_WIDTH - 42}" y="40" font-size="12" text-anchor="end">Author: ${escapeXml(shortened(doc.author, 60) || '—')}   ·   Date: ${escapeXml(date)}   ·   Scenario: ${escapeXml(shortened(scenario.name, 60))}</text>`);
  const ref = result ? `the reference at elevation ${formatNumber(result.referenceElevation)} ${u}` : 'the reference';
  const ciText = ad && isExactFit(ad) ? ` (${EXACT_FIT_TEXT})`
    : ad?.detachmentDepthCI95 ? ` (95%: ${formatInterval(ad.detachmentDepthCI95, u)})`
    : ad && ad.detachmentDepthInterval.kind === 'unbounded' ? ' (95% interval unbounded)' : '';
  const headline = ad && !ad.noDetachment && ad.detachmentDepth !== null
    ? `Detachment at elevation ${formatNumber(ad.detachmentElevation)} ${u}: ${formatNumber(ad.detachmentDepth)} ${u} below ${ref}${ciText}; displacement ${formatNumber(ad.displacement)} ${u}; r² = ${formatR2(ad.r2, isExactFit(ad))} over ${ad.n} horizons`
    : ad && ad.noDetachment ? 'No detachment below these horizons (the area–depth line does not reach zero below them).'
    : `No area–depth result: ${ds.ok ? (analysis.outcome && !analysis.outcome.ok ? analysis.outcome.problems[0]?.message ?? 'input problems' : 'fewer than two horizons with regionals') : ds.message}`;
  out.push(`<text x="42" y="70" font-size="13.5">${escapeXml(headline.slice(0, 200))}</text></g>`);
  // The section panel.
  out.push(`<rect x="${PANEL.x}" y="${PANEL.y}" width="${PANEL.w}" height="${PANEL.h}" fill="#fbfbfa" stroke="#9aa5ad"/>`);
  const slot = out.length;
  out.push('<g clip-path="url(#panel-clip)">');
  // The scan resampled through the calibration: one affine matrix from its pixels to the figure (drawn by the caller).
  const scan = doc.scan
    ? { widthPx: doc.scan.widthPx, heightPx: doc.scan.heightPx, matrix: imageToFigureMatrix(mapFit, frame).map((v) => Number(v.toPrecision(10))) as [number, number, number, number, number, number], opacity: 0.85 }
    : null;
  // The stretches of joined lines along their faults (between cutoffs), drawn thin over the faults.
  const stretches: { colour: string; runs: [number, number][][] }[] = [];
  if (ds.ok && fit) {
    const [pL, pR] = ds.section.pins;
    const faultArrays: FaultArrays[] = (ds.section.faults ?? []).map((f) => ({ name: f.name, ...lineArrays(f.line) }));
    ds.section.horizons.forEach((h, i) => {
      // A horizon in pieces is filled along its joined line (the line the analysis measures), as on the canvas.
      const line = measuredLine(h, faultArrays);
      if (!line) return;
      const reg = toCoordinateArrays(h.regional);
      if (line.alongFault) stretches.push({ colour: escapeXml(doc.horizons.find((d) => d.id === ds.horizonIds[i])?.colour ?? '#444'), runs: alongFaultRuns(line.xs, line.zs, line.alongFault).map((r) => r.map(toFig)) });
      const cl = fillHorizonPart(line.xs, line.zs, [pL, pR]);
      const cr = cl && fillRegionalPart(reg.xs, reg.zs, [pL, pR], cl);
      if (!cl || !cr) return;
      // The outline of src/core/geometry/excessFillOutline.ts, as on the canvas: the loop is drawn twice,
      // clipped to the half-planes above and below the regional, so lobes above it (added) and below it
      // (subtracted) differ in colour.
      const loop: [number, number][] = [];
      for (let j = 0; j < cl.xs.length; j++) loop.push(toFig([cl.xs[j], cl.zs[j]]));
      for (const q of cr.tail) loop.push(toFig(q));
      defs.push(`<clipPath id="above-${i}"><polygon points="${pts(cr.above.map(toFig))}"/></clipPath><clipPath id="below-${i}"><polygon points="${pts(cr.below.map(toFig))}"/></clipPath>`);
      const regXs = cr.tail.map((q) => q[0]).reverse(), regZs = cr.tail.map((q) => q[1]).reverse();
      const diffs = Array.from(cl.xs, (x, j) => cl.zs[j] - zAt(regXs, regZs, x));
      const tol = 1e-9 * (Math.abs(zHi - zLo) + 1);
      const isAbove = diffs.some((d) => d > tol), isBelow = diffs.some((d) => d < -tol);
      drawn.above ||= isAbove;
      drawn.below ||= isBelow;
      const id = escapeXml(ds.horizonIds[i]);
      if (isAbove) out.push(`<polygon class="fill-above" data-horizon="${id}" points="${pts(loop)}" fill="${FIGURE_FILL_ABOVE.colour}" fill-opacity="${FIGURE_FILL_ABOVE.opacity}" stroke="none" clip-path="url(#above-${i})"/>`);
      if (isBelow) out.push(`<polygon class="fill-below" data-horizon="${id}" points="${pts(loop)}" fill="${FIGURE_FILL_BELOW.colour}" fill-opacity="${FIGURE_FILL_BELOW.opacity}" stroke="none" clip-path="url(#below-${i})"/>`);
    });
    if (ad && hasDetachment && result) {
      const ci = ad.detachmentDepthCI95;
      if (ci && !isExactFit(ad)) {
        const [eA, eB] = [result.referenceElevation - ci[0], result.referenceElevation - ci[1]];
        const band = [[xLo, eA], [xHi, eA], [xHi, eB], [xLo, eB]].map((q) => toFig(q as XZ));
        out.push(`<polygon points="${pts(band)}" fill="${RED}" fill-opacity="0.15"/>`);
        drawn.band = true;
      }
    }
  }
  // Faults: heavy and long-dashed in their own dark colours, so none reads as a horizon; under the horizons.
  for (const f of doc.faults) {
    if (!f.visible || f.pointsPx.length < 2) continue;
    const line = pts(f.pointsPx.map(fig));
    out.push(`<polyline class="halo" points="${line}" fill="none" stroke="#ffffff" stroke-opacity="0.85" stroke-width="${FIGURE_FAULT_WIDTH + 2.5}" stroke-linejoin="round"/>`);
    out.push(`<polyline class="fault" data-fault="${escapeXml(f.id)}" points="${line}" fill="none" stroke="${escapeXml(f.colour)}" stroke-width="${FIGURE_FAULT_WIDTH}" stroke-dasharray="${FIGURE_FAULT_DASH}" stroke-linejoin="round"/>`);
    drawn.faults = true;
  }
  for (const s of stretches) {
    for (const run of s.runs) {
      out.push(`<polyline class="fault-stretch" points="${pts(run)}" fill="none" stroke="${s.colour}" stroke-width="1.2" stroke-linejoin="round" stroke-linecap="round"/>`);
      drawn.stretches = true;
    }
  }
  for (const h of doc.horizons) {
    if (!h.visible) continue;
    const reg = scenario.regionals[h.id];
    const c = escapeXml(h.colour);
    if (reg && reg.length >= 2) {
      const line = pts(reg.map(fig));
      // A white outline under the dashes keeps the regional visible over a fill of its own colour.
      out.push(`<polyline class="halo" points="${line}" fill="none" stroke="#ffffff" stroke-opacity="0.85" stroke-width="4.5" stroke-dasharray="7 4"/>`);
      out.push(`<polyline points="${line}" fill="none" stroke="${c}" stroke-width="1.5" stroke-dasharray="7 4"/>`);
      drawn.regionals = true;
    }
    // Each piece on its own: no straight step is drawn across a fault.
    for (const piece of piecesOfPoints(h.pointsPx, h.joins)) {
      if (piece.length < 2) continue;
      const line = pts(piece.map(fig));
      out.push(`<polyline class="halo" points="${line}" fill="none" stroke="#ffffff" stroke-opacity="0.85" stroke-width="5" stroke-linejoin="round"/>`);
      out.push(`<polyline points="${line}" fill="none" stroke="${c}" stroke-width="2.5" stroke-linejoin="round"/>`);
    }
    for (const [a, b] of h.projected) {
      const run = h.pointsPx.slice(a, b + 1);
      if (run.length >= 2) {
        out.push(`<polyline points="${pts(run.map(fig))}" fill="none" stroke="#ffffff" stroke-width="1.6" stroke-dasharray="3 3"/>`);
        drawn.projected = true;
      }
    }
  }
  if (fit && ds.ok && result) {
    // The reference level of the depths (docs/method.md §Area-depth line: h = zref − r), labelled at the right end.
    const zr = result.referenceElevation;
    out.push(`<line class="reference-level" ${hline(frame, zr)} stroke="#1d2731" stroke-width="1.3" stroke-dasharray="10 3 2 3"/>`);
    const at = toFig([xHi, zr]);
    const y = Math.min(PANEL.y + PANEL.h - 6, Math.max(PANEL.y + 14, at[1] - 5));
    out.push(`<text x="${Math.min(at[0], PANEL.x + PANEL.w) - 6}" y="${y.toFixed(2)}" font-size="11.5" text-anchor="end" ${halo()}>reference level, elevation ${formatNumber(zr)} ${u}: depths below this line</text>`);
    drawn.reference = true;
  }
  if (fit && ad && hasDetachment && result) {
    const e = ad.detachmentElevation as number;
    out.push(`<line class="detachment" ${hline(frame, e)} stroke="${RED}" stroke-width="3"/>`);
    drawn.detachment = true;
    const at = toFig([xLo, e]);
    if (e >= zLo && e <= zHi) {
      out.push(`<text x="${Math.max(at[0], PANEL.x) + 8}" y="${(at[1] - 7).toFixed(2)}" font-size="12" font-weight="bold" fill="${RED}" ${halo()}>estimated detachment: elevation ${formatNumber(e)} ${u}, ${formatNumber(ad.detachmentDepth)} ${u} below the reference</text>`);
    } else {
      out.push(`<text x="${PANEL.x + PANEL.w / 2}" y="${e < zLo ? PANEL.y + PANEL.h - 12 : PANEL.y + 20}" font-size="13" font-weight="bold" text-anchor="middle" fill="${RED}" ${halo()}>${e < zLo ? '▼' : '▲'} estimated detachment at elevation ${formatNumber(e)} ${u}, ${e < zLo ? 'below' : 'above'} the drawn area</text>`);
    }
  }
  if (fit && scenario.pinsPx) {
    for (const [i, p] of scenario.pinsPx.entries()) {
      const x = imageToSection(fit, p)[0];
      const [lo, hi] = [toFig([x, zLo]), toFig([x, zHi])];
      out.push(`<line class="pin" x1="${lo[0].toFixed(2)}" y1="${lo[1].toFixed(2)}" x2="${hi[0].toFixed(2)}" y2="${hi[1].toFixed(2)}" stroke="${PIN}" stroke-width="2"/>`);
      const top = toFig([x, zHi]);
      out.push(`<text x="${top[0] + 4}" y="${Math.max(PANEL.y + 14, top[1] + 14)}" font-size="11" fill="${PIN}" ${halo()}>${i === 0 ? 'left pin' : 'right pin'}</text>`);
      drawn.pins = true;
    }
  }
  out.push('</g>');
  // Elevation and distance scales on the panel's edges, then the scale bar and vertical exaggeration.
  if (fit) out.push(sectionAxes(frame, PANEL, doc.units));
  const by = PANEL.y + PANEL.h + 30;
  if (fit) {
    const unitsPerFig = 1 / frame.s;
    const len = niceStep(PANEL.w * 0.25 * unitsPerFig, 1, 'down');
    const w = len / unitsPerFig;
    out.push(`<g class="scale-bar"><rect x="${PANEL.x}" y="${by}" width="${w / 2}" height="6" fill="#1d2731"/><rect x="${PANEL.x + w / 2}" y="${by}" width="${w / 2}" height="6" fill="#ffffff" stroke="#1d2731"/>`);
    out.push(`<text x="${PANEL.x}" y="${by + 20}" font-size="11">0</text><text x="${PANEL.x + w}" y="${by + 20}" font-size="11" text-anchor="middle">${formatNumber(len)} ${u}</text></g>`);
    const veText = chosenVe && chosenVe > 0
      ? (Math.abs(ve - 1) < 1e-12 ? 'True scale: vertical exaggeration 1×' : `Vertical exaggeration ${formatNumber(ve, 3)}× (chosen)`)
      : `Vertical exaggeration ${formatNumber(ve, 3)}× (as on the scan)`;
    out.push(`<text class="vertical-exaggeration" x="${PANEL.x + w + 60}" y="${by + 8}" font-size="12">${veText}${doc.scan ? '' : ' · drawn without a scan'}</text>`);
    out.push(`<text x="${PANEL.x + PANEL.w}" y="${by + 8}" font-size="12" text-anchor="end">Distance along the section x (${u})</text>`);
  } else out.push(`<text x="${PANEL.x}" y="${by + 8}" font-size="12">Not calibrated: no scale, no vertical exaggeration.</text>`);
  // Horizons left out of the analysis for a problem of their own (a line that crosses itself), as the pane names them.
  if (analysis.leftOut.length > 0) {
    const text = `Left out of the analysis: ${analysis.leftOut.map(leftOutText).join('; ')}`;
    const lines = wrap(text, 150);
    // Two lines at most above the caution; a longer list says it goes on (the pane and the report give it all).
    const shown = lines.length > 2 ? [lines[0], `${lines[1]} …`] : lines;
    shown.forEach((line, i) => out.push(`<text class="left-out" x="${PANEL.x}" y="${by + 40 + i * 15}" font-size="11.5" fill="#8a2b00">${escapeXml(line)}</text>`));
  }
  const legend = legendRows(doc, drawn, 1030, PANEL.y);
  out.push(legend.svg);
  const insetTop = legend.bottom + 14;
  out.push(areaDepthGroup(result, scenarioColour(doc.scenarios.indexOf(scenario)), 1030, insetTop, 340, PANEL.y + PANEL.h - insetTop));
  // The caution (docs/method.md §Cautions), in every export.
  const cy = FIGURE_HEIGHT - 96;
  out.push(`<g class="caution"><rect x="30" y="${cy}" width="${FIGURE_WIDTH - 60}" height="76" fill="#fff8e6" stroke="#9a5b00"/>`);
  wrap(`Caution: ${SECTION_CAUTION}`, 190).forEach((line, i) => out.push(`<text x="42" y="${cy + 22 + i * 17}" font-size="12" fill="#6b3f00">${escapeXml(line)}</text>`));
  out.push('</g>');
  const head = `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" width="${FIGURE_WIDTH}" height="${FIGURE_HEIGHT}" viewBox="0 0 ${FIGURE_WIDTH} ${FIGURE_HEIGHT}" font-family="DejaVu Sans, sans-serif" fill="#1d2731">`;
  return {
    head: `${head}<defs>${defs.join('')}</defs>`, under: out.slice(0, slot).join(''), panelOpen: out[slot], over: out.slice(slot + 1).join(''),
    panel: { ...PANEL }, scan, frame,
  };
}
