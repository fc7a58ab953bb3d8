import { fitCalibration, type FittedCalibration } from '../../calibration/fitCalibration';
import type { Calibration, ProjectDoc } from '../projectDoc';

// Before calibration the workspace still needs "section-like" coordinates to draw pins as vertical
// lines, fill excess areas and move regionals up and down. The pixel frame x = u, z = −v stands in.

/** The pixel frame: x = u, z = −v (image pixels, elevation up). */
export const PIXEL_FRAME: FittedCalibration = {
  kind: 'axes', a: [0, 1, 0], b: [0, 0, -1], unitsPerPxX: 1, unitsPerPxZ: 1, verticalExaggeration: 1, residuals: [], worstRelativeResidual: 0,
};

const cache = new WeakMap<Calibration, FittedCalibration | null>();

/** Returns the fitted calibration of the document, or null when it is missing or does not fit (memoised per calibration object). */
export function documentFit(doc: ProjectDoc): FittedCalibration | null {
  const cal = doc.calibration;
  if (!cal) return null;
  if (!cache.has(cal)) {
    const r = fitCalibration(cal);
    cache.set(cal, r.ok ? r.fit : null);
  }
  return cache.get(cal) ?? null;
}

/** Returns the document's fitted calibration, or the pixel frame when it is not calibrated yet. */
export function sectionFrame(doc: ProjectDoc): FittedCalibration {
  return documentFit(doc) ?? PIXEL_FRAME;
}
