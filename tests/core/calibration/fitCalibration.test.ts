// fitCalibration against transforms we construct ourselves (analytic checks): an affine map with
// rotation and skew must be recovered exactly from exact points, residuals must equal the noise we add,
// and per-axis scales must give the vertical exaggeration as the ratio of the scales.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fitCalibration } from '../../../src/core/calibration/fitCalibration';
import { imageToSection, sectionToImage } from '../../../src/core/calibration/mapPoints';
import type { ControlPoint } from '../../../src/core/model/projectDoc';

/** x = a0 + a1 u + a2 v, z = b0 + b1 u + b2 v built from scale, rotation θ and shear k (our construction). */
function transform(sx: number, sz: number, theta: number, shear: number, x0: number, z0: number) {
  // Scale, then shear u by v, then rotate; z is up while v is down, hence the minus on sz.
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  const m = [[sx, sx * shear], [0, -sz]];
  const a: [number, number, number] = [x0, c * m[0][0] - s * m[1][0], c * m[0][1] - s * m[1][1]];
  const b: [number, number, number] = [z0, s * m[0][0] + c * m[1][0], s * m[0][1] + c * m[1][1]];
  return { a, b, map: (u: number, v: number) => ({ x: a[0] + a[1] * u + a[2] * v, z: b[0] + b[1] * u + b[2] * v }) };
}

describe('fitCalibration (affine)', () => {
  it('fitCalibration(affine) recovers a rotated and skewed transform from exact control points', () => {
    const t = transform(12.5, 4.2, 0.035, 0.02, 300_000, 1_500);
    const pixels: [number, number][] = [[40, 30], [3900, 55], [3880, 2100], [70, 2080], [2000, 1000]];
    const points: ControlPoint[] = pixels.map(([u, v]) => ({ u, v, ...t.map(u, v) }));
    const r = fitCalibration({ kind: 'affine', points });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    for (let i = 0; i < 3; i++) {
      expect(r.fit.a[i]).toBeCloseTo(t.a[i], 6);
      expect(r.fit.b[i]).toBeCloseTo(t.b[i], 6);
    }
    for (const res of r.fit.residuals) expect(res.residualPx).toBeLessThan(1e-6);
    // Round trip through the inverse.
    const q = imageToSection(r.fit, [1234.5, 678.9]);
    const back = sectionToImage(r.fit, q);
    expect(back[0]).toBeCloseTo(1234.5, 6);
    expect(back[1]).toBeCloseTo(678.9, 6);
  });

  it('fitCalibration(affine) recovers any well-spread transform (property, fast-check)', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.1, max: 50, noNaN: true }), fc.double({ min: 0.1, max: 50, noNaN: true }),
      fc.double({ min: -0.2, max: 0.2, noNaN: true }), fc.double({ min: -0.1, max: 0.1, noNaN: true }),
      (sx, sz, theta, shear) => {
        const t = transform(sx, sz, theta, shear, 5_000, -200);
        const points = [[0, 0], [1000, 10], [990, 800], [15, 790]].map(([u, v]) => ({ u, v, ...t.map(u, v) }));
        const r = fitCalibration({ kind: 'affine', points });
        if (!r.ok) return false;
        const p = imageToSection(r.fit, [500, 400]);
        const e = t.map(500, 400);
        return Math.abs(p[0] - e.x) < 1e-6 * (1 + Math.abs(e.x)) && Math.abs(p[1] - e.z) < 1e-6 * (1 + Math.abs(e.z));
      },
    ), { seed: 20240917, verbose: true });
  });

  it('fitCalibration(affine) reports residuals equal to the misfit of noisy points', () => {
    // Symmetric noise on four corners of a square cancels in the least-squares fit (the noise is
    // orthogonal to the columns 1, u, v), so the fit is the true transform and each residual is the noise.
    const t = transform(10, 10, 0, 0, 0, 0);
    const noise = [[1, 1], [-1, 1], [1, -1], [-1, -1]].map(([a, b]) => [a * b * 3, a * b * -4]);
    const pixels: [number, number][] = [[0, 0], [1000, 0], [0, 1000], [1000, 1000]];
    const points = pixels.map(([u, v], i) => {
      const q = t.map(u, v);
      return { u, v, x: q.x + noise[i][0], z: q.z + noise[i][1] };
    });
    const r = fitCalibration({ kind: 'affine', points });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.fit.a[1]).toBeCloseTo(10, 9);
    expect(r.fit.b[2]).toBeCloseTo(-10, 9);
    for (const res of r.fit.residuals) {
      expect(res.residual).toBeCloseTo(5, 9); // hypot(3, 4)
      expect(res.residualPx).toBeCloseTo(0.5, 9); // 5 units at 10 units per pixel
    }
    // Extent: the larger span of the typed values, here z from −10004 to 4 m.
    expect(r.fit.worstRelativeResidual).toBeCloseTo(5 / 10_008, 12);
  });

  it('fitCalibration(affine) gives each misfit in pixels along each axis at 2:1 vertical exaggeration (hand-computed)', () => {
    // Scan at 1 m per pixel across and 0.5 m per pixel down (2 px per m of z: vertical exaggeration 2), x = u,
    // z = −v/2, corners of a 100 px square. One corner's typed value is off by δ = 8 m in x (then in z). For the
    // four corners of a square the affine fit's hat matrix has h_ii = 3/4 and leaves only the contrast
    // (1, −1, −1, 1)/2, so every corner keeps a misfit of δ/4 = 2 m along that axis, and the fitted scale on that
    // axis grows by δ/(2·100) = 0.04 m/px (worked by hand; standard least-squares algebra). Back in pixels:
    // 2 m across at 1.04 m/px = 25/13 px; 2 m of z at 0.46 m/px = 100/23 px. One scale for both (the geometric
    // mean, √(1/|det|)) would say 2.77 and 2.95 px instead.
    const pixels: [number, number][] = [[0, 0], [100, 0], [0, 100], [100, 100]];
    const exact = fitCalibration({ kind: 'affine', points: pixels.map(([u, v]) => ({ u, v, x: u, z: -v / 2 })) });
    expect(exact.ok && exact.fit.verticalExaggeration).toBeCloseTo(2, 12);
    for (const [axis, expectedPx] of [['x', 25 / 13], ['z', 100 / 23]] as const) {
      const points = pixels.map(([u, v], i) => ({ u, v, x: u + (axis === 'x' && i === 3 ? 8 : 0), z: -v / 2 + (axis === 'z' && i === 3 ? 8 : 0) }));
      const r = fitCalibration({ kind: 'affine', points });
      if (!r.ok) throw new Error(r.message);
      for (const res of r.fit.residuals) {
        expect(res.residual).toBeCloseTo(2, 9);
        expect(res.residualPx).toBeCloseTo(expectedPx, 9);
      }
    }
  });

  it('fitCalibration(affine) refuses collinear or too few points with a message', () => {
    const line = [0, 1, 2].map((k) => ({ u: 100 * k, v: 50 * k, x: 10 * k, z: 5 * k }));
    const r = fitCalibration({ kind: 'affine', points: line });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/collinear/);
    const two = fitCalibration({ kind: 'affine', points: line.slice(0, 2) });
    expect(two.ok).toBe(false);
  });
});

describe('fitCalibration (per axis)', () => {
  it('fitCalibration(axes) gives the vertical exaggeration as the ratio of the two scales', () => {
    // 25 m per pixel across and 5 m per pixel down: pixels per metre 0.04 and 0.2, VE = 0.2 / 0.04 = 5.
    const r = fitCalibration({
      kind: 'axes',
      xPoints: [{ u: 0, v: 10, value: 1000 }, { u: 400, v: 300, value: 11_000 }],
      zPoints: [{ u: 7, v: 0, value: 500 }, { u: 9, v: 200, value: -500 }],
    });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.fit.unitsPerPxX).toBeCloseTo(25, 12);
    expect(r.fit.unitsPerPxZ).toBeCloseTo(5, 12);
    expect(r.fit.verticalExaggeration).toBeCloseTo(5, 12);
    expect(imageToSection(r.fit, [200, 100])).toEqual([6000, 0]);
  });

  it('fitCalibration(axes) residuals of a third x point off the line are its misfit in units and pixels', () => {
    // x at u = 0, 100, 200 given as 0, 1000 + 30, 2000: the line fits slope 10, intercept 10; residuals −10, +20, −10.
    const r = fitCalibration({
      kind: 'axes',
      xPoints: [{ u: 0, v: 0, value: 0 }, { u: 100, v: 0, value: 1030 }, { u: 200, v: 0, value: 2000 }],
      zPoints: [{ u: 0, v: 0, value: 0 }, { u: 0, v: 100, value: -100 }],
    });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const rx = r.fit.residuals.filter((q) => q.axis === 'x');
    expect(rx.map((q) => q.residual)).toEqual([expect.closeTo(10, 9), expect.closeTo(-20, 9), expect.closeTo(10, 9)]);
    expect(rx[1].residualPx).toBeCloseTo(-2, 9);
  });

  it('fitCalibration(axes) asks for two points per axis at different positions', () => {
    const one = fitCalibration({ kind: 'axes', xPoints: [{ u: 0, v: 0, value: 0 }], zPoints: [] });
    expect(one.ok).toBe(false);
    const same = fitCalibration({ kind: 'axes', xPoints: [{ u: 5, v: 0, value: 0 }, { u: 5, v: 9, value: 10 }], zPoints: [{ u: 0, v: 0, value: 0 }, { u: 0, v: 1, value: -1 }] });
    expect(same.ok).toBe(false);
    if (!same.ok) expect(same.message).toMatch(/different horizontal positions/);
  });
});
