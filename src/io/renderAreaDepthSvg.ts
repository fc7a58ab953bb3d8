// The area–depth graph (Epard & Groshong 1993) as SVG markup: excess area across, depth down, one
// named point per horizon (hollow when left out of the fit), the fitted line, and its crossing of zero
// area at the detachment depth with the 95% Fieller interval as a bar (or the word "unbounded").
import type { SectionAnalysis } from '../core/analysis/analyseSection';
import { isExactFit } from '../core/analysis/isExactFit';
import { areaDepthAxes } from '../format/areaDepthAxes';
import { escapeXml } from './escapeXml';
import { EXACT_FIT_TEXT, formatInterval, formatNumber } from '../format/formatQuantity';
import { MARK_COLOURS } from '../core/model/horizonPalette';

const RED = MARK_COLOURS.detachment;

/** Returns a horizon name cut to `max` characters (with an ellipsis) for a point label. */
export function shortName(name: string, max = 12): string {
  const t = name.trim();
  return t.length <= max ? t : `${t.slice(0, max - 1).trimEnd()}…`;
}

/** The detachment's interval as the graph writes it: bounded [lo, hi], or a word. */
function intervalOf(analysis: SectionAnalysis): { lo: number; hi: number } | string {
  const ad = analysis.areaDepth!;
  if (isExactFit(ad)) return EXACT_FIT_TEXT;
  if (ad.detachmentDepthCI95) return { lo: ad.detachmentDepthCI95[0], hi: ad.detachmentDepthCI95[1] };
  const k = ad.detachmentDepthInterval.kind;
  return k === 'unbounded' ? '95% interval unbounded' : `no 95% interval (n = ${ad.n})`;
}

/**
 * Returns an SVG <g> of the graph in the box (x, y, w, h), figure units, its line and points in `colour` (the
 * scenario's, scenarioColour: as the pane draws it); a note instead of a graph when there is no analysis.
 */
export function areaDepthGroup(analysis: SectionAnalysis | null, colour: string, x: number, y: number, w: number, h: number): string {
  const parts: string[] = [`<g class="area-depth" font-family="DejaVu Sans, sans-serif">`];
  parts.push(`<rect x="${x}" y="${y}" width="${w}" height="${h}" fill="#ffffff" stroke="#9aa5ad"/>`);
  parts.push(`<text x="${x + 8}" y="${y + 16}" font-size="12" font-weight="bold" fill="#1d2731">Area–depth graph</text>`);
  if (!analysis || analysis.horizons.length === 0) {
    parts.push(`<text x="${x + 8}" y="${y + 40}" font-size="11" fill="#5b6975">No results to plot yet.</text></g>`);
    return parts.join('');
  }
  const u = escapeXml(analysis.units);
  const ad = analysis.areaDepth;
  const zd = ad && !ad.noDetachment && ad.detachmentDepth !== null && Number.isFinite(ad.detachmentDepth) ? ad.detachmentDepth : null;
  const interval = ad && zd !== null ? intervalOf(analysis) : null;
  // The pane's axes rule (format/areaDepthAxes.ts): the same data shows the same ticks in both.
  const axes = areaDepthAxes(analysis.horizons.map((r) => ({ area: r.excessArea, depth: r.depth })), [ad], false, analysis.units)!;
  const unit = axes.unit;
  const areas = analysis.horizons.map((r) => r.excessArea * unit.factor);
  const depths = analysis.horizons.map((r) => r.depth);
  const [aLo, aHi] = [axes.area[0] * unit.factor, axes.area[1] * unit.factor];
  const [dLo, dHi] = axes.depth;
  const L = x + 58, R = x + w - 14, T = y + 28, B = y + h - 38;
  const px = (a: number) => L + ((a - aLo) / (aHi - aLo)) * (R - L);
  const py = (d: number) => T + ((d - dLo) / (dHi - dLo)) * (B - T);
  parts.unshift(`<defs><clipPath id="ad-clip"><rect x="${L}" y="${T}" width="${R - L}" height="${B - T}"/></clipPath></defs>`);
  parts.push(`<rect x="${L}" y="${T}" width="${R - L}" height="${B - T}" fill="#fbfbfa" stroke="#c4cbd1"/>`);
  const aLabel = (a: number) => formatNumber(a);
  for (const a of axes.areaTicks) {
    parts.push(`<line x1="${px(a)}" y1="${B}" x2="${px(a)}" y2="${B + 4}" stroke="#5b6975"/><text x="${px(a)}" y="${B + 15}" font-size="9.5" text-anchor="middle" fill="#1d2731" class="area-tick">${aLabel(a)}</text>`);
  }
  const dLabel = (d: number) => formatNumber(d);
  for (const d of axes.depthTicks) {
    parts.push(`<line x1="${L - 4}" y1="${py(d)}" x2="${L}" y2="${py(d)}" stroke="#5b6975"/><text x="${L - 6}" y="${py(d) + 3}" font-size="9.5" text-anchor="end" fill="#1d2731" class="depth-tick">${dLabel(d)}</text>`);
  }
  parts.push(`<line x1="${px(0)}" y1="${T}" x2="${px(0)}" y2="${B}" stroke="#8a949c" stroke-dasharray="3 3"/>`);
  parts.push(`<text x="${(L + R) / 2}" y="${B + 30}" font-size="10" text-anchor="middle" fill="#1d2731">excess area (${escapeXml(unit.label)})</text>`);
  parts.push(`<text transform="translate(${x + 13} ${(T + B) / 2}) rotate(-90)" font-size="10" text-anchor="middle" fill="#1d2731">depth below reference at elevation ${formatNumber(analysis.referenceElevation)} ${u} (${u})</text>`);
  if (ad) {
    // The fitted line A = a + b·h over the depth range of the axis (areas in the display unit).
    const a0 = (ad.intercept + ad.slope * dLo) * unit.factor;
    const a1 = (ad.intercept + ad.slope * dHi) * unit.factor;
    parts.push(`<line class="fitted-line" x1="${px(a0)}" y1="${py(dLo)}" x2="${px(a1)}" y2="${py(dHi)}" stroke="${colour}" stroke-width="1.5" clip-path="url(#ad-clip)"/>`);
  }
  // Points with short names; a label near the right edge goes to the left of its point, and one that
  // would sit on the previous label's line (points close in depth) takes the other side.
  const order = analysis.horizons.map((r, i) => ({ r, i, cx: px(areas[i]), cy: py(depths[i]) })).sort((p, q) => p.cy - q.cy);
  let lastY = -Infinity;
  let lastRight = false;
  for (const { r, cx, cy } of order) {
    parts.push(`<circle cx="${cx}" cy="${cy}" r="4" fill="${r.included ? colour : '#ffffff'}" stroke="${colour}" stroke-width="1.5"><title>${escapeXml(r.name)}</title></circle>`);
    let right = cx < R - 70;
    if (Math.abs(cy - lastY) < 11 && right === lastRight) right = !right && cx > L + 70;
    const text = escapeXml(shortName(r.name) + (r.included ? '' : ' (out)'));
    parts.push(`<text class="point-label" x="${right ? cx + 7 : cx - 7}" y="${cy + 3.5}" font-size="9" text-anchor="${right ? 'start' : 'end'}" fill="#1d2731">${text}</text>`);
    lastY = cy;
    lastRight = right;
  }
  if (zd !== null && interval !== null) {
    const cx = px(0);
    if (typeof interval !== 'string') {
      const [ya, yb] = [py(interval.lo), py(Math.min(interval.hi, dHi))];
      const cut = interval.hi > dHi;
      parts.push(`<path class="fieller-bar" d="M ${cx} ${ya} V ${yb} M ${cx - 5} ${ya} h 10${cut ? '' : ` M ${cx - 5} ${yb} h 10`}" stroke="${RED}" stroke-width="1.6" fill="none"/>`);
      if (cut) parts.push(`<path d="M ${cx - 4} ${yb - 6} L ${cx} ${yb} L ${cx + 4} ${yb - 6}" stroke="${RED}" stroke-width="1.6" fill="none"/>`);
    }
    parts.push(`<circle cx="${cx}" cy="${py(zd)}" r="4.5" fill="${RED}"/>`);
    const words = typeof interval === 'string' ? interval : `95%: ${formatInterval([interval.lo, interval.hi], u)}`;
    parts.push(`<text x="${cx + 9}" y="${py(zd) - 4}" font-size="10" font-weight="bold" fill="${RED}">detachment ${formatNumber(zd)} ${u}</text>`);
    parts.push(`<text x="${cx + 9}" y="${py(zd) + 9}" font-size="9.5" fill="${RED}">${escapeXml(words)}</text>`);
  } else if (ad && ad.noDetachment) {
    parts.push(`<text x="${L + 6}" y="${B - 8}" font-size="10" fill="${RED}">no detachment: the line does not reach zero below the horizons</text>`);
  }
  parts.push('</g>');
  return parts.join('');
}

/** Returns a standalone SVG document of the area–depth graph in the scenario's `colour` (for the report page), w × h figure units. */
export function renderAreaDepthSvg(analysis: SectionAnalysis | null, colour: string, w = 520, h = 380): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}" viewBox="0 0 ${w} ${h}">${areaDepthGroup(analysis, colour, 0.5, 0.5, w - 1, h - 1)}</svg>`;
}
