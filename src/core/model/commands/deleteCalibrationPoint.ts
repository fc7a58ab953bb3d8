import type { ProjectDoc } from '../projectDoc';
import type { CalibrationPointRef } from './calibrationPointRef';

/** Returns the document without the calibration point; unchanged for a missing point. */
export function deleteCalibrationPoint(doc: ProjectDoc, ref: CalibrationPointRef): ProjectDoc {
  const cal = doc.calibration;
  if (!cal) return doc;
  if (cal.kind === 'affine') {
    if (ref.list !== 'points' || !cal.points[ref.index]) return doc;
    return { ...doc, calibration: { ...cal, points: cal.points.filter((_, i) => i !== ref.index) } };
  }
  if (ref.list === 'points' || !cal[ref.list][ref.index]) return doc;
  return { ...doc, calibration: { ...cal, [ref.list]: cal[ref.list].filter((_, i) => i !== ref.index) } };
}
