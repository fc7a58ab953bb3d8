// The annotated section as one SVG document: scan, horizons, regionals, pins, excess-area fills,
// detachment and its 95% band, legend, scale bar, vertical exaggeration, title block, an inset
// area–depth graph and the caution. Pure: the same input always gives the same string; every
// user string is escaped (escapeXml), so a hostile name stays text.
import { SECTION_CAUTION } from '../core/analysis/caution';
import { sectionToImage } from '../core/calibration/mapPoints';
import { imageToSection } from '../core/calibration/mapPoints';
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { clipPolylineToPins } from '../core/geometry/clipPolylineToPins';
import { toCoordinateArrays } from '../core/geometry/toCoordinateArrays';
import { activeScenario } from '../core/model/docToSection';
import type { ImagePx, ProjectDoc } from '../core/model/projectDoc';
import type { XZ } from '../core/model/section';
import type { DocAnalysis } from '../state/selectors';
import { areaDepthGroup } from './renderAreaDepthSvg';
import { escapeXml } from './escapeXml';
import { formatNumber, niceStep } from './formatNumber';

export const FIGURE_WIDTH = 1400;
export const FIGURE_HEIGHT = 990;
const PANEL = { x: 30, y: 96, w: 970, h: 700 };

export interface SectionFigureInput {
  doc: ProjectDoc;
  analysis: DocAnalysis;
  /** The scan as a data: URL, or null to draw without it. */
  scanDataUrl: string | null;
  /** The date printed in the title block (e.g. 2024-05-01). */
  date: string;
}

type Fig = (p: ImagePx) => [number, number];
const pts = (list: [number, number][]) => list.map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`).join(' ');

function extentPx(doc: ProjectDoc, extra: ImagePx[]): [number, number, number, number] {
  if (doc.scan) return [0, 0, doc.scan.widthPx, doc.scan.heightPx];
  const all: ImagePx[] = [...extra, ...doc.horizons.flatMap((h) => h.pointsPx), ...doc.scenarios.flatMap((s) => [...Object.values(s.regionals).flat(), ...(s.pinsPx ?? [])])];
  if (all.length === 0) return [0, 0, 1000, 700];
  const us = all.map((p) => p[0]), vs = all.map((p) => p[1]);
  const [u0, u1, v0, v1] = [Math.min(...us), Math.max(...us), Math.min(...vs), Math.max(...vs)];
  const m = 0.06 * Math.max(u1 - u0, v1 - v0, 1);
  return [u0 - m, v0 - m, u1 + m, v1 + m];
}

function sectionLine(fit: FittedCalibration, fig: Fig, a: XZ, b: XZ): string {
  const [p, q] = [fig(sectionToImage(fit, a)), fig(sectionToImage(fit, b))];
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

function legend(doc: ProjectDoc, hasDetachment: boolean, x: number, y: number): string {
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
  const box = (fill: string, opacity: number) => (yy: number) => `<rect x="${x + 10}" y="${yy - 10}" width="30" height="10" fill="${fill}" fill-opacity="${opacity}"/>`;
  const key: [string, (yy: number) => string][] = [
    ['regional (dashed, per horizon)', line('#444', 1.5, '7 4')],
    ['pin', (yy) => `<line x1="${x + 25}" y1="${yy - 11}" x2="${x + 25}" y2="${yy + 3}" stroke="#20323f" stroke-width="2"/>`],
    ['excess area (between horizon and regional)', box('#1f77b4', 0.25)],
    ['projected (interpreted) segment', line('#444', 2.5, '3 3')],
  ];
  if (hasDetachment) key.push(['estimated detachment', line('#b3261e', 3)], ['95% interval on its depth', box('#b3261e', 0.15)]);
  for (const [label, mark] of key) {
    rows.push(`${mark(yy)}<text x="${x + 48}" y="${yy}" font-size="11">${label}</text>`);
    yy += 17;
  }
  return `<g class="legend"><rect x="${x}" y="${y}" width="340" height="${yy - y + 4}" fill="#ffffff" stroke="#9aa5ad"/><text x="${x + 10}" y="${y + 18}" font-size="12" font-weight="bold">Legend</text>${rows.join('')}</g>`;
}

/** Returns the annotated section figure as an SVG document string (FIGURE_WIDTH × FIGURE_HEIGHT units); sections without results still show the drawing and say why. */
export function renderSectionSvg(input: SectionFigureInput): string {
  const { doc, analysis, scanDataUrl, date } = input;
  const scenario = activeScenario(doc);
  const ds = analysis.docSection;
  const fit = ds.fit;
  const result = analysis.outcome && analysis.outcome.ok ? analysis.outcome.analysis : null;
  const ad = result?.areaDepth ?? null;
  // Without a scan the drawing is framed to show the detachment and its band as well.
  const extra: ImagePx[] = [];
  if (fit && ds.ok && ad && !ad.noDetachment && ad.detachmentElevation !== null && result) {
    const els = [ad.detachmentElevation, ...(ad.detachmentDepthCI95 ?? []).map((d) => result.referenceElevation - d)];
    for (const e of els) extra.push(sectionToImage(fit, [ds.section.pins[0], e]), sectionToImage(fit, [ds.section.pins[1], e]));
  }
  const [u0, v0, u1, v1] = extentPx(doc, extra.filter((p) => Number.isFinite(p[0]) && Number.isFinite(p[1])));
  const k = Math.min(PANEL.w / (u1 - u0), PANEL.h / (v1 - v0));
  const ox = PANEL.x + (PANEL.w - (u1 - u0) * k) / 2 - u0 * k;
  const oy = PANEL.y + (PANEL.h - (v1 - v0) * k) / 2 - v0 * k;
  const fig: Fig = (p) => [ox + p[0] * k, oy + p[1] * k];
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" width="${FIGURE_WIDTH}" height="${FIGURE_HEIGHT}" viewBox="0 0 ${FIGURE_WIDTH} ${FIGURE_HEIGHT}" font-family="DejaVu Sans, sans-serif" fill="#1d2731">`);
  out.push(`<defs><clipPath id="panel-clip"><rect x="${PANEL.x}" y="${PANEL.y}" width="${PANEL.w}" height="${PANEL.h}"/></clipPath></defs>`);
  out.push(`<rect width="${FIGURE_WIDTH}" height="${FIGURE_HEIGHT}" fill="#ffffff"/>`);
  // Title block.
  out.push(`<g class="title-block"><rect x="${PANEL.x}" y="16" width="${FIGURE_WIDTH - 60}" height="66" fill="#f3f5f7" stroke="#9aa5ad"/>`);
  out.push(`<text x="${PANEL.x + 12}" y="44" font-size="22" font-weight="bold">${escapeXml(doc.title.slice(0, 120))}</text>`);
  out.push(`<text x="${PANEL.x + 12}" y="70" font-size="12">Author: ${escapeXml(doc.author.slice(0, 80) || '—')}   ·   Date: ${escapeXml(date)}   ·   Scenario: ${escapeXml(scenario.name.slice(0, 80))}</text>`);
  const u = escapeXml(doc.units);
  const headline = ad && !ad.noDetachment && ad.detachmentDepth !== null
    ? `Detachment ${formatNumber(ad.detachmentDepth)} ${u} below reference${ad.detachmentDepthCI95 ? ` (95%: ${formatNumber(ad.detachmentDepthCI95[0])}–${formatNumber(ad.detachmentDepthCI95[1])})` : ''}; elevation ${formatNumber(ad.detachmentElevation)} ${u}; displacement ${formatNumber(ad.displacement)} ${u}`
    : ad && ad.noDetachment ? 'No detachment below these horizons (area does not decrease with depth).'
    : `No area–depth result: ${ds.ok ? (analysis.outcome && !analysis.outcome.ok ? analysis.outcome.problems[0]?.message ?? 'input problems' : 'fewer than two horizons with regionals') : ds.message}`;
  out.push(`<text x="${FIGURE_WIDTH - 42}" y="44" font-size="13" text-anchor="end">${escapeXml(headline.slice(0, 170))}</text></g>`);
  // The section panel.
  out.push(`<rect x="${PANEL.x}" y="${PANEL.y}" width="${PANEL.w}" height="${PANEL.h}" fill="#fbfbfa" stroke="#9aa5ad"/>`);
  out.push('<g clip-path="url(#panel-clip)">');
  if (scanDataUrl && doc.scan) {
    const [a, b] = [fig([0, 0]), fig([doc.scan.widthPx, doc.scan.heightPx])];
    out.push(`<image x="${a[0]}" y="${a[1]}" width="${b[0] - a[0]}" height="${b[1] - a[1]}" preserveAspectRatio="none" opacity="0.85" href="${escapeXml(scanDataUrl)}" xlink:href="${escapeXml(scanDataUrl)}"/>`);
  }
  const colourOf = new Map(doc.horizons.map((h) => [h.id, h.colour]));
  const corners = fit ? [[u0, v0], [u1, v0], [u0, v1], [u1, v1]].map((p) => imageToSection(fit, p as ImagePx)) : [];
  const xs = corners.map((c) => c[0]), zs = corners.map((c) => c[1]);
  const [xLo, xHi, zLo, zHi] = [Math.min(...xs), Math.max(...xs), Math.min(...zs), Math.max(...zs)];
  if (ds.ok && fit) {
    const [pL, pR] = ds.section.pins;
    ds.section.horizons.forEach((h, i) => {
      const line = toCoordinateArrays(h.line), reg = toCoordinateArrays(h.regional);
      const cl = clipPolylineToPins(line.xs, line.zs, pL, pR).clipped;
      const cr = clipPolylineToPins(reg.xs, reg.zs, pL, pR).clipped;
      if (!cl || !cr) return;
      const loop: [number, number][] = [];
      for (let j = 0; j < cl.xs.length; j++) loop.push(fig(sectionToImage(fit, [cl.xs[j], cl.zs[j]])));
      for (let j = cr.xs.length - 1; j >= 0; j--) loop.push(fig(sectionToImage(fit, [cr.xs[j], cr.zs[j]])));
      out.push(`<polygon points="${pts(loop)}" fill="${escapeXml(colourOf.get(ds.horizonIds[i]) ?? '#888')}" fill-opacity="0.25" stroke="none"/>`);
    });
    if (ad && !ad.noDetachment && ad.detachmentElevation !== null && result) {
      const ci = ad.detachmentDepthCI95;
      if (ci) {
        const [eA, eB] = [result.referenceElevation - ci[0], result.referenceElevation - ci[1]];
        const band = [[xLo, eA], [xHi, eA], [xHi, eB], [xLo, eB]].map((q) => fig(sectionToImage(fit, q as XZ)));
        out.push(`<polygon points="${pts(band)}" fill="#b3261e" fill-opacity="0.15"/>`);
      }
      out.push(`<line ${sectionLine(fit, fig, [xLo, ad.detachmentElevation], [xHi, ad.detachmentElevation])} stroke="#b3261e" stroke-width="3"/>`);
      const e = ad.detachmentElevation;
      if (e < zLo || e > zHi) {
        out.push(`<text x="${PANEL.x + PANEL.w / 2}" y="${e < zLo ? PANEL.y + PANEL.h - 12 : PANEL.y + 20}" font-size="13" font-weight="bold" text-anchor="middle" fill="#b3261e">${e < zLo ? '▼' : '▲'} estimated detachment at elevation ${formatNumber(e)} ${u}, ${e < zLo ? 'below' : 'above'} the drawn area</text>`);
      }
    }
  }
  for (const h of doc.horizons) {
    if (!h.visible) continue;
    const reg = scenario.regionals[h.id];
    const c = escapeXml(h.colour);
    if (reg && reg.length >= 2) out.push(`<polyline points="${pts(reg.map(fig))}" fill="none" stroke="${c}" stroke-width="1.5" stroke-dasharray="7 4"/>`);
    if (h.pointsPx.length >= 2) out.push(`<polyline points="${pts(h.pointsPx.map(fig))}" fill="none" stroke="${c}" stroke-width="2.5" stroke-linejoin="round"/>`);
    for (const [a, b] of h.projected) {
      const run = h.pointsPx.slice(a, b + 1);
      if (run.length >= 2) out.push(`<polyline points="${pts(run.map(fig))}" fill="none" stroke="#ffffff" stroke-width="1.6" stroke-dasharray="3 3"/>`);
    }
  }
  if (fit && scenario.pinsPx) {
    for (const [i, p] of scenario.pinsPx.entries()) {
      const x = imageToSection(fit, p)[0];
      out.push(`<line ${sectionLine(fit, fig, [x, zLo], [x, zHi])} stroke="#20323f" stroke-width="2"/>`);
      const top = fig(sectionToImage(fit, [x, zHi]));
      out.push(`<text x="${top[0] + 4}" y="${Math.max(PANEL.y + 14, top[1] + 14)}" font-size="11" fill="#20323f">${i === 0 ? 'left pin' : 'right pin'}</text>`);
    }
  }
  out.push('</g>');
  // Scale bar and vertical exaggeration below the panel.
  const by = PANEL.y + PANEL.h + 30;
  if (fit) {
    const unitsPerFig = fit.unitsPerPxX / k;
    const len = niceStep(PANEL.w * 0.25 * unitsPerFig);
    const w = len / unitsPerFig;
    out.push(`<g class="scale-bar"><rect x="${PANEL.x}" y="${by}" width="${w / 2}" height="6" fill="#1d2731"/><rect x="${PANEL.x + w / 2}" y="${by}" width="${w / 2}" height="6" fill="#ffffff" stroke="#1d2731"/>`);
    out.push(`<text x="${PANEL.x}" y="${by + 20}" font-size="11">0</text><text x="${PANEL.x + w}" y="${by + 20}" font-size="11" text-anchor="middle">${formatNumber(len)} ${u}</text></g>`);
    out.push(`<text x="${PANEL.x + w + 60}" y="${by + 8}" font-size="12">Vertical exaggeration ${formatNumber(fit.verticalExaggeration, 3)}× (as drawn)${doc.scan ? '' : ' · drawn without a scan'}</text>`);
  } else out.push(`<text x="${PANEL.x}" y="${by + 8}" font-size="12">Not calibrated: no scale, no vertical exaggeration.</text>`);
  out.push(legend(doc, Boolean(ad && !ad.noDetachment), 1030, PANEL.y));
  out.push(areaDepthGroup(result, 1030, 470, 340, 326));
  // The caution (METHOD.md), in every export.
  const cy = FIGURE_HEIGHT - 96;
  out.push(`<g class="caution"><rect x="${PANEL.x}" y="${cy}" width="${FIGURE_WIDTH - 60}" height="76" fill="#fff8e6" stroke="#9a5b00"/>`);
  wrap(`Caution: ${SECTION_CAUTION}`, 190).forEach((line, i) => out.push(`<text x="${PANEL.x + 12}" y="${cy + 22 + i * 17}" font-size="12" fill="#6b3f00">${escapeXml(line)}</text>`));
  out.push('</g></svg>');
  return out.join('');
}
