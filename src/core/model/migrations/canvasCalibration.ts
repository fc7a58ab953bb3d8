// A stand-in calibration for work that has no scan: section units drawn on a canvas at one scale
// for both axes (vertical exaggeration 1), so horizons appear and the analysis runs.
import type { Calibration } from '../projectDoc';
import type { XZ } from '../section';

/** Canvas width in image pixels given to the widest extent of the section. */
export const CANVAS_WIDTH_PX = 2000;
const MARGIN_PX = 100;

/** Returns an 'axes' calibration mapping the points' bounding box onto a canvas ~2000 px wide (true scale); degenerate extents fall back to 1 unit. */
export function canvasCalibration(points: XZ[]): Calibration {
  let xmin = Infinity, xmax = -Infinity, zmin = Infinity, zmax = -Infinity;
  for (const [x, z] of points) {
    if (!Number.isFinite(x) || !Number.isFinite(z)) continue;
    xmin = Math.min(xmin, x); xmax = Math.max(xmax, x);
    zmin = Math.min(zmin, z); zmax = Math.max(zmax, z);
  }
  if (!(xmin <= xmax)) { xmin = 0; xmax = 1; zmin = 0; zmax = 1; }
  if (xmax - xmin <= 0) xmax = xmin + 1;
  if (zmax - zmin <= 0) zmax = zmin + 1;
  // One scale for both axes keeps the canvas a true-scale drawing (docs/method.md §Frame and units: never measure with VE ≠ 1 in pixels).
  const s = (CANVAS_WIDTH_PX - 2 * MARGIN_PX) / Math.max(xmax - xmin, zmax - zmin);
  const u = (x: number) => MARGIN_PX + (x - xmin) * s;
  const v = (z: number) => MARGIN_PX + (zmax - z) * s;
  return {
    kind: 'axes',
    xPoints: [{ u: u(xmin), v: MARGIN_PX, value: xmin }, { u: u(xmax), v: MARGIN_PX, value: xmax }],
    zPoints: [{ u: MARGIN_PX, v: v(zmax), value: zmax }, { u: MARGIN_PX, v: v(zmin), value: zmin }],
  };
}
