import { describe, expect, it } from 'vitest';
import { gridLines } from '../../src/canvas/gridTicks';
import { formatFixed } from '../../src/format/formatQuantity';
import { niceStep as ladder, stepDecimals } from '../../src/format/niceTicks';

const niceStep = (raw: number) => ladder(raw, 1, 'up');
import { fitCalibration } from '../../src/core/calibration/fitCalibration';

describe('niceStep', () => {
  it('niceStep rounds up to 1, 2 or 5 times a power of ten', () => {
    expect(niceStep(0.7)).toBe(1);
    expect(niceStep(1)).toBe(1);
    expect(niceStep(1.2)).toBe(2);
    expect(niceStep(3)).toBe(5);
    expect(niceStep(7)).toBe(10);
    expect(niceStep(230)).toBe(500);
    expect(niceStep(0.0031)).toBeCloseTo(0.005, 12);
    expect(niceStep(0)).toBeNaN();
  });
  it('stepDecimals gives the digits that separate ticks', () => {
    expect(stepDecimals(500)).toBe(0);
    expect(stepDecimals(1)).toBe(0);
    expect(stepDecimals(0.5)).toBe(1);
    expect(stepDecimals(0.02)).toBe(2);
  });
});

describe('gridLines', () => {
  // Axis calibration: u 0..1000 px -> x 0..5000 m; v 0..500 px -> z 0..-1000 m (v down, z up; VE 2.5).
  const cal = fitCalibration({
    kind: 'axes',
    xPoints: [{ u: 0, v: 0, value: 0 }, { u: 1000, v: 0, value: 5000 }],
    zPoints: [{ u: 0, v: 0, value: 0 }, { u: 0, v: 500, value: -1000 }],
  });
  if (!cal.ok) throw new Error(cal.message);
  it('gridLines puts vertical lines at round x values, each at the screen position the calibration maps it to', () => {
    const cam = { scale: 1, x: 0, y: 0 };
    const g = gridLines(cal.fit, cam, 1000, 500, 100);
    expect(g.stepX).toBe(500); // 100 px × 5 m/px
    expect(g.stepZ).toBe(200); // 100 px × 2 m/px
    expect(g.x.map((l) => l.value)).toEqual([0, 500, 1000, 1500, 2000, 2500, 3000, 3500, 4000, 4500, 5000]);
    for (const l of g.x) {
      expect(l.from[0]).toBeCloseTo(l.value / 5, 9);
      expect(l.to[0]).toBeCloseTo(l.value / 5, 9);
    }
    for (const l of g.z) expect(l.from[1]).toBeCloseTo(-l.value / 2, 9);
  });
  it('gridLines spacing follows the zoom so lines stay about the target apart on screen', () => {
    for (const scale of [0.05, 0.3, 1, 4, 40]) {
      const g = gridLines(cal.fit, { scale, x: 0, y: 0 }, 1400, 900, 100);
      const px = (g.stepX / 5) * scale;
      expect(px).toBeGreaterThanOrEqual(100 - 1e-9);
      expect(px).toBeLessThanOrEqual(500 + 1e-9);
    }
  });
  it('gridLines without a calibration is a grid of image pixels', () => {
    const g = gridLines(null, { scale: 2, x: 10, y: 0 }, 400, 200, 100);
    expect(g.stepX).toBe(50);
    expect(g.x[0].value).toBe(0);
    expect(g.x[0].from[0]).toBe(10);
  });
});

describe('formatFixed', () => {
  it('formatFixed writes negative values with the minus sign U+2212 (Unicode MINUS SIGN) and never "−0"', () => {
    expect(formatFixed(-2800, 0)).toBe('\u22122800');
    expect(formatFixed(-1250.46, 1)).toBe('\u22121250.5');
    expect(formatFixed(-0.04, 1)).toBe('0.0');
    expect(formatFixed(-0, 0)).toBe('0');
    expect(formatFixed(37.5, 1)).toBe('37.5');
  });
});
