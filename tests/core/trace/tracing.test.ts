import { describe, expect, it } from 'vitest';
import { renderScan, sineCurve, straightCurve, type ScanSpec } from './syntheticScan';
import { distanceStats, featuresOf, pointsOnCurve, traceThrough } from './traceHelpers';

// Every scan here is generated in the test with its truth known analytically (the curve it was drawn from);
// the targets are the ones the tracing was built to: RMS ≤ 0.5 px on ink lines, ≤ 1 px on colour boundaries.
const paper: [number, number, number] = [238, 230, 212];
const ink: [number, number, number] = [35, 30, 28];

describe('tracing a drawn line (live-wire over darkness and colour edges)', () => {
  it('follows an anti-aliased sine line on a slightly rotated, noisy scan to well under half a pixel', () => {
    const curve = sineCurve(100, 30, 420, 0.3);
    const spec: ScanSpec = { w: 640, h: 200, paper, angleRad: 0.015, noise: 5, seed: 7, layers: [{ kind: 'ink', curve, widthPx: 2.2, colour: ink }] };
    const scan = renderScan(spec);
    const f = featuresOf(scan);
    // Two clicks, each 2 px beside the line: the snap and the trace must do the rest.
    const pts = traceThrough(scan, f, pointsOnCurve(scan, curve, [30, 610], 2));
    const { rms, max } = distanceStats(scan, curve, pts);
    // Pixel-grid vertices alone would score about 0.29 px RMS (uniform rounding); the centring must beat that.
    expect(rms).toBeLessThan(0.15);
    expect(max).toBeLessThan(0.4);
    // Simplified: far fewer vertices than the ~640 pixels walked, yet more than the two anchors.
    expect(pts.length).toBeGreaterThan(10);
    expect(pts.length).toBeLessThan(250);
  });

  it('follows the boundary between two colour fills that has no ink line, within a pixel', () => {
    const boundary = sineCurve(90, 25, 500, 1.1);
    const spec: ScanSpec = {
      w: 600, h: 180, paper, angleRad: -0.01, noise: 5, seed: 11,
      layers: [
        { kind: 'fill', below: straightCurve(-10, 0), colour: [214, 190, 120] },
        { kind: 'fill', below: boundary, colour: [150, 180, 205] },
      ],
    };
    const scan = renderScan(spec);
    const f = featuresOf(scan);
    const pts = traceThrough(scan, f, pointsOnCurve(scan, boundary, [20, 580], 1.5));
    const { rms, max } = distanceStats(scan, boundary, pts);
    expect(rms).toBeLessThan(0.6);
    expect(max).toBeLessThan(1.5);
  });

  it('keeps to its own line through a crossing line', () => {
    const a = sineCurve(100, 12, 600, 0);
    const b = straightCurve(100 - 3 * 300, 3); // steep line crossing a near u = 300
    const spec: ScanSpec = {
      w: 600, h: 200, paper, angleRad: 0, noise: 4, seed: 3,
      layers: [{ kind: 'ink', curve: a, widthPx: 2, colour: ink }, { kind: 'ink', curve: b, widthPx: 2, colour: ink }],
    };
    const scan = renderScan(spec);
    const f = featuresOf(scan);
    const pts = traceThrough(scan, f, pointsOnCurve(scan, a, [40, 560]));
    const { rms, max } = distanceStats(scan, a, pts);
    expect(rms).toBeLessThan(0.3);
    // Near the crossing the other line's ink pulls the centre, by well under a line width.
    expect(max).toBeLessThan(1);
  });

  it('runs straight where nothing is drawn: a smooth tone is not a line', () => {
    // Analytic: on a scan with no line the stretch is the chord itself, two points.
    const spec: ScanSpec = { w: 300, h: 120, paper, angleRad: 0, noise: 0, seed: 1, layers: [] };
    const scan = renderScan(spec);
    for (let y = 0; y < scan.h; y++) for (let x = 0; x < scan.w; x++) for (let c = 0; c < 3; c++) scan.rgba[(y * scan.w + x) * 4 + c] = Math.round(40 + (x / scan.w) * 180 + (y / scan.h) * 30);
    const f = featuresOf(scan);
    expect(traceThrough(scan, f, [[20.5, 30.5], [280.5, 90.5]])).toEqual([[20.5, 30.5], [280.5, 90.5]]);
  });

  it('bridges a gap in the ink and stays on the line either side', () => {
    const curve = sineCurve(100, 20, 500, 0.5);
    const gapFrom = 290;
    const gapTo = 306;
    const spec: ScanSpec = { w: 600, h: 200, paper, angleRad: 0.01, noise: 4, seed: 5, layers: [{ kind: 'ink', curve, widthPx: 2, colour: ink }] };
    const scan = renderScan(spec);
    // Erase the ink over a band of columns (repaint paper), leaving a 16 px gap.
    for (let y = 0; y < scan.h; y++) for (let x = gapFrom; x < gapTo; x++) for (let c = 0; c < 3; c++) scan.rgba[(y * scan.w + x) * 4 + c] = paper[c];
    const f = featuresOf(scan);
    const pts = traceThrough(scan, f, pointsOnCurve(scan, curve, [30, 570]));
    const outside = pts.filter((p) => p[0] < gapFrom - 4 || p[0] > gapTo + 4);
    expect(distanceStats(scan, curve, outside).rms).toBeLessThan(0.3);
    // Across the gap the path takes the chord; on this curve the chord stays within a pixel of it.
    expect(distanceStats(scan, curve, pts).max).toBeLessThan(1);
  });
});
