import type { Calibration } from '../projectDoc';

/** Which calibration point: a control point (affine) or an x or z point (per axis), by index in its list. */
export interface CalibrationPointRef { list: 'points' | 'xPoints' | 'zPoints'; index: number }

/** Returns every point of the calibration with its reference and image position, in list order. */
export function calibrationPoints(cal: Calibration | null): { ref: CalibrationPointRef; u: number; v: number }[] {
  if (!cal) return [];
  if (cal.kind === 'affine') return cal.points.map((p, index) => ({ ref: { list: 'points', index }, u: p.u, v: p.v }));
  return [
    ...cal.xPoints.map((p, index) => ({ ref: { list: 'xPoints' as const, index }, u: p.u, v: p.v })),
    ...cal.zPoints.map((p, index) => ({ ref: { list: 'zPoints' as const, index }, u: p.u, v: p.v })),
  ];
}
