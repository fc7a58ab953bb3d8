import type { Calibration, ProjectDoc } from '../projectDoc';
import type { CalibrationPointRef } from './calibrationPointRef';

/**
 * Returns the document with a calibration point added at image pixel (u, v): a control point of known
 * (x, z) for 'points', a known x or z for 'xPoints' / 'zPoints'. A calibration of the other kind is
 * replaced by a new one of the needed kind (undoable like every edit).
 */
export function addCalibrationPoint(doc: ProjectDoc, list: CalibrationPointRef['list'], u: number, v: number, known: { x?: number; z?: number; value?: number }): ProjectDoc {
  const cal: Calibration | null = doc.calibration;
  if (list === 'points') {
    const points = cal?.kind === 'affine' ? cal.points : [];
    return { ...doc, calibration: { kind: 'affine', points: [...points, { u, v, x: known.x ?? 0, z: known.z ?? 0 }] } };
  }
  const base = cal?.kind === 'axes' ? cal : { kind: 'axes' as const, xPoints: [], zPoints: [] };
  const point = { u, v, value: known.value ?? 0 };
  return { ...doc, calibration: { ...base, [list]: [...base[list], point] } };
}
