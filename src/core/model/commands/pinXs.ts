import type { FittedCalibration } from '../../calibration/fitCalibration';
import { imageToSection } from '../../calibration/mapPoints';
import type { ImagePx } from '../projectDoc';

/** Returns a scenario's pins as section x (left < right) in the given frame, or null when not placed or coincident. */
export function pinXs(pinsPx: [ImagePx, ImagePx] | null | undefined, frame: FittedCalibration): [number, number] | null {
  if (!pinsPx) return null;
  const a = imageToSection(frame, pinsPx[0])[0];
  const b = imageToSection(frame, pinsPx[1])[0];
  if (!(Math.abs(a - b) > 0)) return null;
  return [Math.min(a, b), Math.max(a, b)];
}
