// The section figure's scales: elevation labelled along the left edge of the panel and distance along
// its bottom edge (1-2-5 ticks, section units), with faint elevation lines across the drawing so that a
// reader can take any elevation, or a depth below the marked reference, off the figure. The calibration
// is affine (mapPoints.ts), so along one edge of the panel x and z are linear in the figure position.
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { imageToSection, sectionToImage } from '../core/calibration/mapPoints';
import type { ImagePx } from '../core/model/projectDoc';
import type { XZ } from '../core/model/section';
import { axisTicks } from './axisTicks';
import { escapeXml } from './escapeXml';
import { formatNumber } from './formatNumber';

export interface Box { x: number; y: number; w: number; h: number }

/** Figure units ↔ image pixels of the drawing: figure = image * k + (ox, oy). */
export interface FigureFrame { k: number; ox: number; oy: number }

const HALO = 'paint-order="stroke" stroke="#ffffff" stroke-width="3" stroke-linejoin="round"';

/** Returns the text attributes that keep a label readable over the scan (a white outline drawn under the letters). */
export const halo = (): string => HALO;

/** Returns the SVG of the elevation axis (left edge) and distance axis (bottom edge) of the panel, and faint elevation lines across it; '' when the calibration has no usable scale. */
export function sectionAxes(fit: FittedCalibration, frame: FigureFrame, panel: Box, units: string, xRange: [number, number]): string {
  const { k, ox, oy } = frame;
  const toImage = (fx: number, fy: number): ImagePx => [(fx - ox) / k, (fy - oy) / k];
  const toFig = (q: XZ): [number, number] => {
    const p = sectionToImage(fit, q);
    return [ox + p[0] * k, oy + p[1] * k];
  };
  const out: string[] = ['<g class="section-axes" font-size="11">'];
  const u = escapeXml(units);
  // Elevation along the left edge: z at the top and bottom corners, linear in between.
  const zTop = imageToSection(fit, toImage(panel.x, panel.y))[1];
  const zBottom = imageToSection(fit, toImage(panel.x, panel.y + panel.h))[1];
  const [zLo, zHi] = [Math.min(zTop, zBottom), Math.max(zTop, zBottom)];
  const elevations = Math.abs(zTop - zBottom) > 0 ? axisTicks(zLo, zHi, panel.h, () => 'xx', 8, 14) : [];
  for (const z of elevations) {
    const fy = panel.y + ((z - zTop) / (zBottom - zTop)) * panel.h;
    // The elevation line follows constant z across the drawing (tilted if the scan is rotated).
    const [a, b] = [toFig([xRange[0], z]), toFig([xRange[1], z])];
    out.push(`<line x1="${a[0].toFixed(2)}" y1="${a[1].toFixed(2)}" x2="${b[0].toFixed(2)}" y2="${b[1].toFixed(2)}" stroke="#5b6975" stroke-width="0.6" stroke-opacity="0.45" stroke-dasharray="2 4" clip-path="url(#panel-clip)"/>`);
    out.push(`<line x1="${panel.x - 6}" y1="${fy.toFixed(2)}" x2="${panel.x}" y2="${fy.toFixed(2)}" stroke="#1d2731"/>`);
    out.push(`<text x="${panel.x - 9}" y="${(fy + 4).toFixed(2)}" text-anchor="end">${formatNumber(z, 6)}</text>`);
  }
  if (elevations.length > 0) {
    out.push(`<text transform="translate(${panel.x - 62} ${panel.y + panel.h / 2}) rotate(-90)" text-anchor="middle" font-size="12">Elevation z (${u})</text>`);
  }
  // Distance along the bottom edge.
  const xLeft = imageToSection(fit, toImage(panel.x, panel.y + panel.h))[0];
  const xRight = imageToSection(fit, toImage(panel.x + panel.w, panel.y + panel.h))[0];
  const label = (x: number) => formatNumber(x, 6);
  const distances = Math.abs(xRight - xLeft) > 0 ? axisTicks(Math.min(xLeft, xRight), Math.max(xLeft, xRight), panel.w, label, 7, 12) : [];
  const by = panel.y + panel.h;
  for (const x of distances) {
    const fx = panel.x + ((x - xLeft) / (xRight - xLeft)) * panel.w;
    out.push(`<line x1="${fx.toFixed(2)}" y1="${by}" x2="${fx.toFixed(2)}" y2="${by + 5}" stroke="#1d2731"/><text x="${fx.toFixed(2)}" y="${by + 17}" text-anchor="middle">${label(x)}</text>`);
  }
  out.push('</g>');
  return elevations.length + distances.length > 0 ? out.join('') : '';
}
