import { interpolateZAt } from '../../geometry/interpolateZAt';
import type { FittedCalibration } from '../../calibration/fitCalibration';
import { imageToSection } from '../../calibration/mapPoints';
import type { DocHorizon } from '../projectDoc';

/** Returns the horizon's mean elevation where it crosses the pins x = pL, pR (section units), from whichever pins it reaches; NaN if neither. */
export function horizonLevelAtPins(h: DocHorizon, frame: FittedCalibration, pins: [number, number]): number {
  const pts = h.pointsPx.map((p) => imageToSection(frame, p));
  const xs = pts.map((q) => q[0]);
  const zs = pts.map((q) => q[1]);
  const at = pins.map((x) => interpolateZAt(xs, zs, x)).filter((z) => Number.isFinite(z));
  return at.length ? at.reduce((s, z) => s + z, 0) / at.length : Number.NaN;
}
