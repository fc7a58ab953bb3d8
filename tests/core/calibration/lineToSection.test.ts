// A whole line in section units, remembered per line: checked against an affine map built here by hand (our own
// construction, the analytic check of fitCalibration's test) and against the section docToSection gives.
import { describe, expect, it } from 'vitest';
import { fitCalibration } from '../../../src/core/calibration/fitCalibration';
import { lineToSection } from '../../../src/core/calibration/lineToSection';
import { imageToSection } from '../../../src/core/calibration/mapPoints';
import type { ControlPoint, ImagePx } from '../../../src/core/model/projectDoc';

/** x = 1000 + 2.5 u − 0.1 v, z = 300 + 0.2 u − 1.5 v: rotated and sheared, written out by hand. */
const map = (u: number, v: number) => ({ x: 1000 + 2.5 * u - 0.1 * v, z: 300 + 0.2 * u - 1.5 * v });

function fitOf(m: (u: number, v: number) => { x: number; z: number }) {
  const points: ControlPoint[] = [[0, 0], [4000, 0], [4000, 2000], [0, 2000]].map(([u, v]) => ({ u, v, ...m(u, v) }));
  const r = fitCalibration({ kind: 'affine', points });
  if (!r.ok) throw new Error(r.message);
  return r.fit;
}

describe('lineToSection(fit, pointsPx)', () => {
  it('maps every vertex through the calibration, as the hand-written affine does', () => {
    const line: ImagePx[] = Array.from({ length: 1000 }, (_, k) => [k * 3.5, 700 + 40 * Math.sin(k / 30)]);
    const fit = fitOf(map);
    const xz = lineToSection(fit, line);
    expect(xz.xs).toHaveLength(line.length);
    expect(xz.zs).toHaveLength(line.length);
    line.forEach(([u, v], k) => {
      const want = map(u, v);
      expect(xz.xs[k]).toBeCloseTo(want.x, 6);
      expect(xz.zs[k]).toBeCloseTo(want.z, 6);
      // The coordinate arrays hold imageToSection's numbers to the last bit (the pins, regionals and the figure use it).
      const [x, z] = imageToSection(fit, [u, v]);
      expect(Object.is(xz.xs[k], x) && Object.is(xz.zs[k], z)).toBe(true);
    });
  });

  it('gives the same array again for the same line and calibration, and a new one when the calibration changes', () => {
    const line: ImagePx[] = [[10, 20], [30, 25], [50, 22]];
    const fit = fitOf(map);
    const first = lineToSection(fit, line);
    // A fit of the same control points (a new object, equal coefficients) finds it remembered.
    expect(lineToSection(fitOf(map), line)).toBe(first);
    // Recalibrated: twice the x scale. The result follows the new calibration, and going back gives the old numbers.
    const wider = (u: number, v: number) => ({ x: 1000 + 5 * u - 0.1 * v, z: 300 + 0.2 * u - 1.5 * v });
    const again = lineToSection(fitOf(wider), line);
    expect(again).not.toBe(first);
    expect(again.xs[2]).toBeCloseTo(wider(50, 22).x, 6);
    expect(lineToSection(fit, line).xs[2]).toBeCloseTo(map(50, 22).x, 6);
    // Another array with the same vertices is converted on its own.
    expect(lineToSection(fit, line.map((p): ImagePx => [p[0], p[1]]))).not.toBe(first);
  });
});
