import type { ProjectDoc } from '../projectDoc';
import type { CalibrationPointRef } from './calibrationPointRef';
import { updateCalibrationPoint } from './updateCalibrationPoint';

/** Returns the document with the calibration point moved to image pixel (u, v). */
export function moveCalibrationPoint(doc: ProjectDoc, ref: CalibrationPointRef, p: [number, number]): ProjectDoc {
  return updateCalibrationPoint(doc, ref, { u: p[0], v: p[1] });
}
