import type { Calibration, ProjectDoc } from '../projectDoc';
import type { CalibrationPointRef } from './calibrationPointRef';

function same(p: object, change: object): boolean {
  return Object.entries(change).every(([k, v]) => v === undefined || (p as Record<string, unknown>)[k] === v);
}

/** Returns the document with one calibration point changed (image position and/or known values); unchanged for a missing point. */
export function updateCalibrationPoint(doc: ProjectDoc, ref: CalibrationPointRef, change: { u?: number; v?: number; x?: number; z?: number; value?: number }): ProjectDoc {
  const cal = doc.calibration;
  if (!cal) return doc;
  if (cal.kind === 'affine') {
    if (ref.list !== 'points' || !cal.points[ref.index]) return doc;
    const points = cal.points.slice();
    const p = points[ref.index];
    if (same(p, change)) return doc;
    points[ref.index] = { u: change.u ?? p.u, v: change.v ?? p.v, x: change.x ?? p.x, z: change.z ?? p.z };
    return { ...doc, calibration: { ...cal, points } };
  }
  if (ref.list === 'points' || !cal[ref.list][ref.index]) return doc;
  const list = cal[ref.list].slice();
  const p = list[ref.index];
  if (same(p, change)) return doc;
  list[ref.index] = { u: change.u ?? p.u, v: change.v ?? p.v, value: change.value ?? p.value };
  const next: Calibration = { ...cal, [ref.list]: list };
  return { ...doc, calibration: next };
}
