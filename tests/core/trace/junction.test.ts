import { describe, expect, it } from 'vitest';
import { renderScan, sineCurve, type ScanSpec, type SyntheticScan } from './syntheticScan';
import { snapToLine } from '../../../src/core/trace/snapToLine';
import { distanceStats, featuresOf, pointsOnCurve, traceThrough } from './traceHelpers';

// A horizon that ends on another drawn line (a section's border, a fault, the land surface): the stretch ends on
// the junction, where the profile across the path reaches the other line's ink. Truth is the curve the scan was
// drawn from (analytic); the target is RMS ≤ 0.5 px on ink lines, and the other line must not pull the vertices.
const paper: [number, number, number] = [238, 230, 212];
const ink: [number, number, number] = [35, 30, 28];

/** Blanks the scan left of column `x` to paper and draws an anti-aliased vertical ink line of width `widthPx` there (coverage of each pixel column). */
function endOnBorder(scan: SyntheticScan, x: number, widthPx: number): void {
  for (let j = 0; j < scan.h; j++) {
    for (let i = 0; i < scan.w; i++) {
      const k = (j * scan.w + i) * 4;
      if (i + 1 <= x) for (let c = 0; c < 3; c++) scan.rgba[k + c] = paper[c];
      const a = Math.max(0, Math.min(i + 1, x + widthPx / 2) - Math.max(i, x - widthPx / 2));
      for (let c = 0; c < 3; c++) scan.rgba[k + c] = scan.rgba[k + c] * (1 - a) + ink[c] * a;
    }
  }
}

describe('a traced stretch that ends where its line meets another', () => {
  it('stays on its own line up to an anchor on the junction with a border line', () => {
    const curve = sineCurve(100, 5, 500, 0.8);
    const spec: ScanSpec = { w: 400, h: 200, paper, angleRad: 0, noise: 3, seed: 5, layers: [{ kind: 'ink', curve, widthPx: 2.5, colour: ink }] };
    const scan = renderScan(spec);
    const borderX = 60;
    endOnBorder(scan, borderX, 4);
    const f = featuresOf(scan);
    // Clicks exactly on the line (no snap): the first on the junction, the way a horizon ends on the border.
    const pts = traceThrough(scan, f, pointsOnCurve(scan, curve, [borderX, 360]), 0);
    const { rms, max } = distanceStats(scan, curve, pts);
    expect(rms).toBeLessThan(0.2);
    // Beside the border its ink fills the profile across the horizon; a centroid there lies between the two lines.
    // (Centring every path pixel up to the anchor gave 0.54 px RMS and 1.6 px at worst on this scan.)
    expect(max).toBeLessThan(0.35);
  });

  it('snaps a click beside the junction to where the two centre lines cross, not into the ink blob', () => {
    const curve = sineCurve(100, 5, 500, 0.8);
    const spec: ScanSpec = { w: 400, h: 200, paper, angleRad: 0, noise: 3, seed: 5, layers: [{ kind: 'ink', curve, widthPx: 2.5, colour: ink }] };
    const scan = renderScan(spec);
    const borderX = 60;
    endOnBorder(scan, borderX, 4);
    const f = featuresOf(scan);
    // The junction is the border's centre (x = 60) on the horizon's centre line; the click is 2 px off both.
    const truth: [number, number] = [borderX, curve.f(borderX)];
    const q = snapToLine(f, truth[0] + 2, truth[1] + 2, 14);
    expect(q).not.toBeNull();
    // (The centroid of the blob lay 1.7 px inside the horizon's arm.)
    expect(Math.hypot(q![0] - truth[0], q![1] - truth[1])).toBeLessThan(0.5);
  });

  it('still lands on the centre of a plain line away from any junction', () => {
    const curve = sineCurve(100, 5, 500, 0.8);
    const spec: ScanSpec = { w: 400, h: 200, paper, angleRad: 0, noise: 3, seed: 5, layers: [{ kind: 'ink', curve, widthPx: 2.5, colour: ink }] };
    const scan = renderScan(spec);
    const f = featuresOf(scan);
    const q = snapToLine(f, 200, curve.f(200) + 2.5, 14);
    expect(q).not.toBeNull();
    expect(distanceStats(scan, curve, [q!]).max).toBeLessThan(0.2);
  });
});
