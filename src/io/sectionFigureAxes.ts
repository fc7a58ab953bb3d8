// The section figure's scales: elevation labelled along the left edge of the panel and distance along
// its bottom edge (1-2-5 ticks, section units), with a faint grid of elevation and distance lines across
// the drawing so that a reader can take any elevation, or a depth below the marked reference, off the
// figure. The figure is drawn in section coordinates (sectionFigureFrame.ts): grid lines are straight,
// elevation lines horizontal and distance lines vertical, whatever the scan's rotation.
import { axisTicks } from './axisTicks';
import { escapeXml } from './escapeXml';
import { formatNumber } from './formatNumber';
import { sectionToFigure, type Box, type SectionFrame } from './sectionFigureFrame';

export type { Box } from './sectionFigureFrame';

const HALO = 'paint-order="stroke" stroke="#ffffff" stroke-width="3" stroke-linejoin="round"';

/** Returns the text attributes that keep a label readable over the scan (a white outline drawn under the letters). */
export const halo = (): string => HALO;

/** Returns the SVG of the elevation axis (left edge), the distance axis (bottom edge) and the faint grid across the panel. */
export function sectionAxes(frame: SectionFrame, panel: Box, units: string): string {
  const out: string[] = ['<g class="section-axes" font-size="11">'];
  const u = escapeXml(units);
  const [zLo, zHi] = frame.zRange;
  const [xLo, xHi] = frame.xRange;
  const elevations = axisTicks(zLo, zHi, panel.h, () => 'xx', 8, 14);
  for (const z of elevations) {
    const fy = sectionToFigure(frame, [xLo, z])[1];
    out.push(`<line class="grid-z" x1="${panel.x}" y1="${fy.toFixed(2)}" x2="${panel.x + panel.w}" y2="${fy.toFixed(2)}" stroke="#5b6975" stroke-width="0.6" stroke-opacity="0.45" stroke-dasharray="2 4"/>`);
    out.push(`<line x1="${panel.x - 6}" y1="${fy.toFixed(2)}" x2="${panel.x}" y2="${fy.toFixed(2)}" stroke="#1d2731"/>`);
    out.push(`<text x="${panel.x - 9}" y="${(fy + 4).toFixed(2)}" text-anchor="end">${formatNumber(z, 6)}</text>`);
  }
  if (elevations.length > 0) {
    out.push(`<text transform="translate(${panel.x - 62} ${panel.y + panel.h / 2}) rotate(-90)" text-anchor="middle" font-size="12">Elevation z (${u})</text>`);
  }
  const label = (x: number) => formatNumber(x, 6);
  const distances = axisTicks(xLo, xHi, panel.w, label, 7, 12);
  const by = panel.y + panel.h;
  for (const x of distances) {
    const fx = sectionToFigure(frame, [x, zLo])[0];
    out.push(`<line class="grid-x" x1="${fx.toFixed(2)}" y1="${panel.y}" x2="${fx.toFixed(2)}" y2="${by}" stroke="#5b6975" stroke-width="0.6" stroke-opacity="0.3" stroke-dasharray="2 4"/>`);
    out.push(`<line x1="${fx.toFixed(2)}" y1="${by}" x2="${fx.toFixed(2)}" y2="${by + 5}" stroke="#1d2731"/><text x="${fx.toFixed(2)}" y="${by + 17}" text-anchor="middle">${label(x)}</text>`);
  }
  out.push('</g>');
  return elevations.length + distances.length > 0 ? out.join('') : '';
}
