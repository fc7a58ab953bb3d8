import { describe, expect, it } from 'vitest';
import { pixelFeatures } from '../../../src/core/trace/pixelFeatures';
import { snapToLine } from '../../../src/core/trace/snapToLine';
import { renderScan, straightCurve } from './syntheticScan';

const paper: [number, number, number] = [240, 236, 225];
const ink: [number, number, number] = [20, 20, 20];

/** Paints an anti-aliased vertical mark at x = `xc`, `widthPx` wide, from row y0 to y1 (exact coverage across). */
function paintTick(scan: { w: number; h: number; rgba: Uint8ClampedArray }, xc: number, widthPx: number, y0: number, y1: number): void {
  for (let y = Math.floor(y0); y < Math.ceil(y1); y++) {
    const along = Math.min(1, Math.max(0, Math.min(y + 1, y1) - Math.max(y, y0)));
    for (let x = 0; x < scan.w; x++) {
      const a = along * Math.min(1, Math.max(0, widthPx / 2 + 0.5 - Math.abs(x + 0.5 - xc)));
      const k = (y * scan.w + x) * 4;
      for (let c = 0; c < 3; c++) scan.rgba[k + c] = Math.round(scan.rgba[k + c] * (1 - a) + ink[c] * a);
    }
  }
}

// Calibration clicks on the ticks of a drawn axis: the click goes to where the tick meets the axis line, at
// sub-pixel precision. Truth is analytic: the axis along y = 30.3, the tick along x = 40.7.
describe('snapToLine on a tick mark', () => {
  it('moves a click beside a tick on an axis to where the tick meets the axis', () => {
    const scan = renderScan({ w: 80, h: 60, paper, angleRad: 0, noise: 3, seed: 12, layers: [{ kind: 'ink', curve: straightCurve(30.3, 0), widthPx: 1.5, colour: ink }] });
    paintTick(scan, 40.7, 1.5, 30.3, 40);
    const f = pixelFeatures(scan.rgba, scan.w, scan.h, 0, 0);
    const snapped = snapToLine(f, 38.6, 32.5, 8);
    expect(snapped).not.toBeNull();
    expect(Math.hypot(snapped![0] - 40.7, snapped![1] - 30.3)).toBeLessThan(0.3);
  });

  it('moves a click beside a lone tick onto its centre line', () => {
    const scan = renderScan({ w: 60, h: 60, paper, angleRad: 0, noise: 3, seed: 13, layers: [] });
    paintTick(scan, 30.4, 1.5, 24, 36);
    const f = pixelFeatures(scan.rgba, scan.w, scan.h, 0, 0);
    const snapped = snapToLine(f, 28.2, 29.1, 8);
    expect(snapped).not.toBeNull();
    expect(Math.abs(snapped![0] - 30.4)).toBeLessThan(0.15);
    expect(snapped![1]).toBeGreaterThan(24);
    expect(snapped![1]).toBeLessThan(36);
  });
});
