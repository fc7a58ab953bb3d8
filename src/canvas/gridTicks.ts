// Grid lines in section units for the view: tick spacing in 1-2-5 steps and the screen position of each
// line. Pure arithmetic (camera + viewport + calibration -> lines), tested without a browser.
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { imageToSection, sectionToImage } from '../core/calibration/mapPoints';
import type { ImagePx } from '../core/model/projectDoc';
import type { CameraLike } from '../state/scanTiles';
import { niceStep, stepDecimals } from '../format/niceTicks';
import { minOf, maxOf } from '../core/stats/minMax';

export interface GridLine {
  value: number;
  /** Ends of the line in screen pixels (relative to the view's top-left). */
  from: [number, number];
  to: [number, number];
}

export interface GridLines { x: GridLine[]; z: GridLine[]; stepX: number; stepZ: number; decimalsX: number; decimalsZ: number }

/** Most lines drawn per axis (a guard against a degenerate calibration, not a display choice). */
const MAX_LINES = 400;


function linesFor(values: [number, number], step: number, fixed: 'x' | 'z', other: [number, number], toScreen: (x: number, z: number) => [number, number]): GridLine[] {
  const out: GridLine[] = [];
  if (!Number.isFinite(step)) return out;
  const first = Math.ceil(values[0] / step);
  const last = Math.floor(values[1] / step);
  if (last - first > MAX_LINES) return out;
  for (let i = first; i <= last; i++) {
    const value = i * step + 0; // + 0 turns -0 into 0
    const from = fixed === 'x' ? toScreen(value, other[0]) : toScreen(other[0], value);
    const to = fixed === 'x' ? toScreen(value, other[1]) : toScreen(other[1], value);
    out.push({ value, from, to });
  }
  return out;
}

/**
 * Returns the grid lines covering the viewport, about `targetPx` screen pixels apart. Without a
 * calibration the grid is in image pixels (x = u, z = v).
 */
export function gridLines(fit: FittedCalibration | null, camera: CameraLike, viewW: number, viewH: number, targetPx = 100): GridLines {
  const toImage = (sx: number, sy: number): ImagePx => [(sx - camera.x) / camera.scale, (sy - camera.y) / camera.scale];
  const toSection = (p: ImagePx): [number, number] => (fit ? imageToSection(fit, p) : [p[0], p[1]]);
  const toScreen = (x: number, z: number): [number, number] => {
    const p = fit ? sectionToImage(fit, [x, z]) : [x, z];
    return [p[0] * camera.scale + camera.x, p[1] * camera.scale + camera.y];
  };
  const corners = [toSection(toImage(0, 0)), toSection(toImage(viewW, 0)), toSection(toImage(0, viewH)), toSection(toImage(viewW, viewH))];
  const xr: [number, number] = [minOf(corners.map((c) => c[0])), maxOf(corners.map((c) => c[0]))];
  const zr: [number, number] = [minOf(corners.map((c) => c[1])), maxOf(corners.map((c) => c[1]))];
  const stepX = niceStep((targetPx * (fit ? fit.unitsPerPxX : 1)) / camera.scale, 1, 'up');
  const stepZ = niceStep((targetPx * (fit ? fit.unitsPerPxZ : 1)) / camera.scale, 1, 'up');
  return {
    x: linesFor(xr, stepX, 'x', zr, toScreen),
    z: linesFor(zr, stepZ, 'z', xr, toScreen),
    stepX,
    stepZ,
    decimalsX: stepDecimals(stepX),
    decimalsZ: stepDecimals(stepZ),
  };
}
