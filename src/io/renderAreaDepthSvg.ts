// The area–depth graph (Epard & Groshong 1993) as SVG markup: excess area across, depth down,
// the fitted line, and its crossing of zero area at the detachment depth.
import type { SectionAnalysis } from '../core/analysis/analyseSection';
import { escapeXml } from './escapeXml';
import { formatNumber, niceStep } from './formatNumber';

function ticks(lo: number, hi: number): number[] {
  const step = niceStep((hi - lo) / 4);
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9 && out.length < 12; v += step) out.push(v);
  return out;
}

/** Returns an SVG <g> of the graph in the box (x, y, w, h), figure units; a note instead of a graph when there is no analysis. */
export function areaDepthGroup(analysis: SectionAnalysis | null, x: number, y: number, w: number, h: number): string {
  const parts: string[] = [`<g class="area-depth" font-family="DejaVu Sans, sans-serif">`];
  parts.push(`<rect x="${x}" y="${y}" width="${w}" height="${h}" fill="#ffffff" stroke="#9aa5ad"/>`);
  parts.push(`<text x="${x + 8}" y="${y + 16}" font-size="12" font-weight="bold" fill="#1d2731">Area–depth graph</text>`);
  if (!analysis || analysis.horizons.length === 0) {
    parts.push(`<text x="${x + 8}" y="${y + 40}" font-size="11" fill="#5b6975">No results to plot yet.</text></g>`);
    return parts.join('');
  }
  const u = escapeXml(analysis.units);
  const ad = analysis.areaDepth;
  const zd = ad && !ad.noDetachment ? ad.detachmentDepth : null;
  const areas = analysis.horizons.map((r) => r.excessArea);
  const depths = analysis.horizons.map((r) => r.depth);
  const aLo = Math.min(0, ...areas);
  const aHi = Math.max(...areas, aLo + 1) * 1.1;
  const dLo = Math.min(0, ...depths);
  const dHi = Math.max(...depths, zd !== null && Number.isFinite(zd) ? zd : -Infinity, dLo + 1) * 1.1;
  const L = x + 56, R = x + w - 12, T = y + 28, B = y + h - 36;
  const px = (a: number) => L + ((a - aLo) / (aHi - aLo)) * (R - L);
  const py = (d: number) => T + ((d - dLo) / (dHi - dLo)) * (B - T);
  parts.push(`<rect x="${L}" y="${T}" width="${R - L}" height="${B - T}" fill="#fbfbfa" stroke="#c4cbd1"/>`);
  for (const a of ticks(aLo, aHi)) {
    parts.push(`<line x1="${px(a)}" y1="${B}" x2="${px(a)}" y2="${B + 4}" stroke="#5b6975"/><text x="${px(a)}" y="${B + 15}" font-size="9" text-anchor="middle" fill="#1d2731">${formatNumber(a, 3)}</text>`);
  }
  for (const d of ticks(dLo, dHi)) {
    parts.push(`<line x1="${L - 4}" y1="${py(d)}" x2="${L}" y2="${py(d)}" stroke="#5b6975"/><text x="${L - 6}" y="${py(d) + 3}" font-size="9" text-anchor="end" fill="#1d2731">${formatNumber(d, 3)}</text>`);
  }
  parts.push(`<line x1="${px(0)}" y1="${T}" x2="${px(0)}" y2="${B}" stroke="#8a949c" stroke-dasharray="3 3"/>`);
  parts.push(`<text x="${(L + R) / 2}" y="${B + 29}" font-size="10" text-anchor="middle" fill="#1d2731">excess area (${u}²)</text>`);
  parts.push(`<text transform="translate(${x + 12} ${(T + B) / 2}) rotate(-90)" font-size="10" text-anchor="middle" fill="#1d2731">depth below reference (${u})</text>`);
  if (ad) {
    // The fitted line A = a + b·h drawn over the depth range of the axis.
    const a0 = ad.intercept + ad.slope * dLo;
    const a1 = ad.intercept + ad.slope * dHi;
    parts.push(`<line x1="${px(a0)}" y1="${py(dLo)}" x2="${px(a1)}" y2="${py(dHi)}" stroke="#1f6f8b" stroke-width="1.5" clip-path="url(#ad-clip)"/>`);
    parts.unshift(`<defs><clipPath id="ad-clip"><rect x="${L}" y="${T}" width="${R - L}" height="${B - T}"/></clipPath></defs>`);
  }
  analysis.horizons.forEach((r) => {
    parts.push(`<circle cx="${px(r.excessArea)}" cy="${py(r.depth)}" r="4" fill="${r.included ? '#1f6f8b' : '#ffffff'}" stroke="#1f6f8b" stroke-width="1.5"><title>${escapeXml(r.name)}</title></circle>`);
  });
  if (zd !== null && Number.isFinite(zd)) {
    parts.push(`<path d="M ${px(0) - 6} ${py(zd)} h 12 M ${px(0)} ${py(zd) - 6} v 12" stroke="#b3261e" stroke-width="2"/>`);
    parts.push(`<text x="${px(0) + 8}" y="${py(zd) - 6}" font-size="10" fill="#b3261e">detachment ${formatNumber(zd)} ${u}</text>`);
  }
  parts.push('</g>');
  return parts.join('');
}

/** Returns a standalone SVG document of the area–depth graph (for the report page), w × h figure units. */
export function renderAreaDepthSvg(analysis: SectionAnalysis | null, w = 520, h = 380): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}" viewBox="0 0 ${w} ${h}">${areaDepthGroup(analysis, 0.5, 0.5, w - 1, h - 1)}</svg>`;
}
