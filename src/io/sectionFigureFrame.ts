// The frame of the exported section figure: section coordinates (x along the section, z elevation up)
// mapped to figure units with x to the right and z up, at one scale for x and the chosen vertical
// exaggeration for z. The scan and everything digitised on it (image pixels) pass through the
// calibration's affine first, so on a rotated or sheared scan the pins still come out vertical and
// the detachment and reference level horizontal against true axes and grid. The affine composed with
// this frame is again affine: the scan is drawn once through one SVG/canvas matrix.
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { imageToSection } from '../core/calibration/mapPoints';
import type { ImagePx } from '../core/model/projectDoc';
import type { XZ } from '../core/model/section';

export interface Box { x: number; y: number; w: number; h: number }

/** figure x = ox + (x − x0)·s; figure y = oy + (z1 − z)·s·ve (section units → figure units). */
export interface SectionFrame {
  /** Figure units per section unit along x. */
  s: number;
  /** Vertical exaggeration drawn: figure units per unit of z over figure units per unit of x. */
  ve: number;
  x0: number;
  z1: number;
  ox: number;
  oy: number;
  /** The section-coordinate window the panel shows. */
  xRange: [number, number];
  zRange: [number, number];
}

/**
 * Returns the frame that fits the section window [x0, x1] × [z0, z1] into the panel at vertical exaggeration
 * `ve`, centred, and widened to the panel's whole area (so the axes span the panel). A degenerate window is
 * given a width of 1 section unit.
 */
export function fitSectionFrame(window: { x: [number, number]; z: [number, number] }, ve: number, panel: Box): SectionFrame {
  let [xa, xb] = window.x;
  let [za, zb] = window.z;
  if (!(xb > xa)) { xa -= 0.5; xb += 0.5; }
  if (!(zb > za)) { za -= 0.5; zb += 0.5; }
  const v = ve > 0 && Number.isFinite(ve) ? ve : 1;
  const s = Math.min(panel.w / (xb - xa), panel.h / ((zb - za) * v));
  // Centre the window, then report the panel's full extent in section units.
  const xMid = (xa + xb) / 2, zMid = (za + zb) / 2;
  const halfX = panel.w / (2 * s), halfZ = panel.h / (2 * s * v);
  const x0 = xMid - halfX, z1 = zMid + halfZ;
  return { s, ve: v, x0, z1, ox: panel.x, oy: panel.y, xRange: [x0, xMid + halfX], zRange: [zMid - halfZ, z1] };
}

/** Returns the figure position of a section coordinate. */
export function sectionToFigure(f: SectionFrame, q: XZ): [number, number] {
  return [f.ox + (q[0] - f.x0) * f.s, f.oy + (f.z1 - q[1]) * f.s * f.ve];
}

/** Returns the figure position of an image pixel through the calibration. */
export function imageToFigure(fit: FittedCalibration, f: SectionFrame, p: ImagePx): [number, number] {
  return sectionToFigure(f, imageToSection(fit, p));
}

/**
 * Returns the SVG / canvas matrix [a, b, c, d, e, f] that takes image pixel (u, v) to the figure
 * (x' = a·u + c·v + e, y' = b·u + d·v + f): the calibration's affine followed by the frame.
 */
export function imageToFigureMatrix(fit: FittedCalibration, f: SectionFrame): [number, number, number, number, number, number] {
  const sz = f.s * f.ve;
  return [
    f.s * fit.a[1], -sz * fit.b[1],
    f.s * fit.a[2], -sz * fit.b[2],
    f.ox + f.s * (fit.a[0] - f.x0), f.oy + sz * (f.z1 - fit.b[0]),
  ];
}
