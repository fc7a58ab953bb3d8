// Where the section sits on the demo raster, and the pixel <-> section mapping including the scan's rotation.
import type { XZ } from '../../src/core/model/section';

export const image = { width: 2400, height: 1200 };
/** Section window drawn inside the frame (m). */
export const window = { xMin: 0, xMax: 26000, zMin: -2800, zMax: 2800 };
export const verticalExaggeration = 2;
/** Horizontal scale of the drawing, image px per metre; the vertical scale is VE times this. */
export const pxPerMetre = 0.08;
export const frame = { left: 160, top: 150 };
/** Clockwise rotation of the "scan" about the image centre, degrees. */
export const rotationDegrees = 0.4;

/** Returns the drawing (unrotated) pixel position of a section point. */
export function drawingPx([x, z]: XZ): [number, number] {
  return [frame.left + pxPerMetre * (x - window.xMin), frame.top + pxPerMetre * verticalExaggeration * (window.zMax - z)];
}

export interface Affine { a: number; b: number; c: number; d: number; e: number; f: number }

/** Returns the affine that takes section (x, z) to image pixels (u, v) of the rotated raster: u = a x + b z + c, v = d x + e z + f. */
export function sectionToImage(): Affine {
  const sx = pxPerMetre;
  const sz = pxPerMetre * verticalExaggeration;
  // Drawing px: u0 = sx x + cu, v0 = −sz z + cv.
  const cu = frame.left - sx * window.xMin;
  const cv = frame.top + sz * window.zMax;
  // The canvas turns the drawing by θ about the centre (canvas rotate: clockwise on screen, v down).
  const t = (rotationDegrees * Math.PI) / 180;
  const [cx, cy] = [image.width / 2, image.height / 2];
  const cos = Math.cos(t);
  const sin = Math.sin(t);
  return {
    a: cos * sx, b: sin * sz, c: cx + cos * (cu - cx) - sin * (cv - cy),
    d: sin * sx, e: -cos * sz, f: cy + sin * (cu - cx) + cos * (cv - cy),
  };
}

/** Returns the inverse affine: x = a u + b v + c, z = d u + e v + f. */
export function invert(m: Affine): Affine {
  const det = m.a * m.e - m.b * m.d;
  const a = m.e / det;
  const b = -m.b / det;
  const d = -m.d / det;
  const e = m.a / det;
  return { a, b, c: -(a * m.c + b * m.f), d, e, f: -(d * m.c + e * m.f) };
}

/** Applies an affine to a point. */
export function apply(m: Affine, [p, q]: [number, number]): [number, number] {
  return [m.a * p + m.b * q + m.c, m.d * p + m.e * q + m.f];
}
