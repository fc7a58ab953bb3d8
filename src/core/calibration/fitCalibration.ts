// Fits the mapping from scan image pixels to section coordinates, per axis or as a least-squares affine.
import type { Calibration } from '../model/projectDoc';
import { solveAffine } from './solveAffine';
import { minOf, maxOf } from '../stats/minMax';

export interface CalibrationPointResidual {
  /** Index in the calibration's point list (x points first, then z points, for 'axes'). */
  index: number;
  axis: 'x' | 'z' | 'xz';
  /** Misfit in section units (distance for affine points). */
  residual: number;
  /** The same misfit in image pixels along the fitted scale. */
  residualPx: number;
}

/** Image pixel (u, v) -> section (x, z): x = a0 + a1 u + a2 v, z = b0 + b1 u + b2 v. */
export interface FittedCalibration {
  kind: Calibration['kind'];
  a: [number, number, number];
  b: [number, number, number];
  /** Section units per image pixel along the section's x and z directions. */
  unitsPerPxX: number;
  unitsPerPxZ: number;
  /** Vertical exaggeration: pixels per unit of z over pixels per unit of x. */
  verticalExaggeration: number;
  residuals: CalibrationPointResidual[];
  /** Largest residual as a share of the calibrated extent (dimensionless). */
  worstRelativeResidual: number;
}

export type CalibrationFit = { ok: true; fit: FittedCalibration } | { ok: false; message: string };

function fitLine(t: number[], y: number[]): [number, number] | null {
  const n = t.length;
  const tm = t.reduce((s, v) => s + v, 0) / n;
  const ym = y.reduce((s, v) => s + v, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (t[i] - tm) ** 2;
    sxy += (t[i] - tm) * (y[i] - ym);
  }
  if (!(sxx > 0)) return null;
  const slope = sxy / sxx;
  return [ym - slope * tm, slope];
}

function finishFit(kind: Calibration['kind'], a: FittedCalibration['a'], b: FittedCalibration['b'], residuals: CalibrationPointResidual[], extent: number): CalibrationFit {
  const det = a[1] * b[2] - a[2] * b[1];
  if (!Number.isFinite(det) || Math.abs(det) < 1e-300) return { ok: false, message: 'The calibration points are collinear or repeated: spread them across the scan.' };
  // Columns of the inverse Jacobian: image pixels per unit of x and per unit of z.
  const pxPerX = Math.hypot(b[2], -b[1]) / Math.abs(det);
  const pxPerZ = Math.hypot(-a[2], a[1]) / Math.abs(det);
  const worst = residuals.reduce((m, r) => Math.max(m, Math.abs(r.residual)), 0);
  return {
    ok: true,
    fit: {
      kind, a, b,
      unitsPerPxX: 1 / pxPerX,
      unitsPerPxZ: 1 / pxPerZ,
      verticalExaggeration: pxPerZ / pxPerX,
      residuals,
      worstRelativeResidual: extent > 0 ? worst / extent : 0,
    },
  };
}

/** Returns the fitted calibration, or a message saying which points are missing or degenerate. */
export function fitCalibration(cal: Calibration): CalibrationFit {
  if (cal.kind === 'axes') {
    if (cal.xPoints.length < 2) return { ok: false, message: 'Horizontal scale: give at least two points of known x.' };
    if (cal.zPoints.length < 2) return { ok: false, message: 'Vertical scale: give at least two points of known elevation z.' };
    const lx = fitLine(cal.xPoints.map((p) => p.u), cal.xPoints.map((p) => p.value));
    const lz = fitLine(cal.zPoints.map((p) => p.v), cal.zPoints.map((p) => p.value));
    if (!lx) return { ok: false, message: 'Horizontal scale: the x points must be at different horizontal positions on the scan.' };
    if (!lz) return { ok: false, message: 'Vertical scale: the z points must be at different heights on the scan.' };
    const residuals: CalibrationPointResidual[] = [
      ...cal.xPoints.map((p, i) => {
        const r = lx[0] + lx[1] * p.u - p.value;
        return { index: i, axis: 'x' as const, residual: r, residualPx: r / lx[1] };
      }),
      ...cal.zPoints.map((p, i) => {
        const r = lz[0] + lz[1] * p.v - p.value;
        return { index: cal.xPoints.length + i, axis: 'z' as const, residual: r, residualPx: r / lz[1] };
      }),
    ];
    const xs = cal.xPoints.map((p) => p.value);
    const zs = cal.zPoints.map((p) => p.value);
    const extent = Math.max(maxOf(xs) - minOf(xs), maxOf(zs) - minOf(zs));
    return finishFit('axes', [lx[0], lx[1], 0], [lz[0], 0, lz[1]], residuals, extent);
  }
  if (cal.points.length < 3) return { ok: false, message: 'Control points: give at least three points of known (x, z).' };
  const solved = solveAffine(cal.points);
  if (!solved) return { ok: false, message: 'The control points are collinear or repeated: spread at least three across the scan.' };
  const { a, b } = solved;
  const det = a[1] * b[2] - a[2] * b[1];
  // The misfit in pixels is the section-unit misfit (dx, dz) taken back through the inverse of the fitted
  // mapping, (du, dv) = J⁻¹ (dx, dz) with J = [[a1, a2], [b1, b2]]: one scale for both directions (such as
  // the geometric mean √|det⁻¹|) is wrong by √VE in each direction once the vertical exaggeration is not 1.
  const residuals = cal.points.map((p, i) => {
    const dx = a[0] + a[1] * p.u + a[2] * p.v - p.x;
    const dz = b[0] + b[1] * p.u + b[2] * p.v - p.z;
    const du = (b[2] * dx - a[2] * dz) / det;
    const dv = (a[1] * dz - b[1] * dx) / det;
    return { index: i, axis: 'xz' as const, residual: Math.hypot(dx, dz), residualPx: Math.hypot(du, dv) };
  });
  const xs = cal.points.map((p) => p.x);
  const zs = cal.points.map((p) => p.z);
  const extent = Math.max(maxOf(xs) - minOf(xs), maxOf(zs) - minOf(zs));
  return finishFit('affine', a, b, residuals, extent);
}
