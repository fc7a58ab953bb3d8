import { describe, expect, it } from 'vitest';
import { renderScan, straightCurve, type Curve, type ScanSpec, type SyntheticScan } from './syntheticScan';
import { distanceStats, featuresOf, traceThrough } from './traceHelpers';

// A horizon that meets a heavier line at a shallow angle: the land surface where the horizon crops out, drawn
// wider than the horizons (common practice on a section), with the horizon ending on it or leaving it as a dashed
// projection above it. Truth is the straight line each scan was drawn from (analytic); the target is the one
// the tracing was built to, every traced vertex within half a pixel of its own ink.
const paper: [number, number, number] = [238, 230, 212];
const ink: [number, number, number] = [35, 30, 28];
/** The land surface: a wide line along v = 120. */
const SURFACE_V = 120;
const surface: Curve = straightCurve(SURFACE_V, 0);
const SURFACE_WIDTH_PX = 4.5;
const HORIZON_WIDTH_PX = 2;

/** Draws an anti-aliased vertical ink line at column x between rows y0 and y1 (a section's border). */
function drawBorder(scan: SyntheticScan, x: number, y0: number, y1: number, widthPx: number): void {
  for (let j = Math.floor(y0); j < Math.ceil(y1); j++) {
    for (let i = 0; i < scan.w; i++) {
      const a = Math.max(0, Math.min(i + 1, x + widthPx / 2) - Math.max(i, x - widthPx / 2));
      if (a <= 0) continue;
      const k = (j * scan.w + i) * 4;
      for (let c = 0; c < 3; c++) scan.rgba[k + c] = Math.round(scan.rgba[k + c] * (1 - a) + ink[c] * a);
    }
  }
}

/** A scan of the land surface and one horizon `h` drawn over `spanU` (dashed when `dashU` is given). */
function scanWith(h: Curve, spanU: [number, number], dashU?: [number, number]): SyntheticScan {
  const spec: ScanSpec = {
    w: 640, h: 240, paper, angleRad: 0, noise: 4, seed: 17,
    layers: [
      { kind: 'ink', curve: surface, widthPx: SURFACE_WIDTH_PX, colour: ink },
      { kind: 'ink', curve: h, widthPx: HORIZON_WIDTH_PX, colour: ink, spanU, dashU },
    ],
  };
  return renderScan(spec);
}

/** Distance from the horizon of the traced line (its vertices and the straight runs between them, every 0.25 px). */
function offHorizon(scan: SyntheticScan, h: Curve, pts: [number, number][]): { rms: number; max: number } {
  const along: [number, number][] = [];
  for (let i = 0; i + 1 < pts.length; i++) {
    const [ax, ay] = pts[i];
    const [bx, by] = pts[i + 1];
    const steps = Math.max(1, Math.ceil(Math.hypot(bx - ax, by - ay) / 0.25));
    for (let k = 0; k < steps; k++) along.push([ax + ((bx - ax) * k) / steps, ay + ((by - ay) * k) / steps]);
  }
  along.push(pts[pts.length - 1]);
  return distanceStats(scan, h, along);
}

describe('a horizon that meets the heavier land surface at a shallow angle', () => {
  it('follows the thin horizon, not a heavier line reachable through a border, between two junctions', () => {
    // The horizon starts on the section's border 60 px below the land surface and rises at 6.6° to end on the
    // surface at u = 560; the border joins the two lines, so a path may climb it and run along the surface instead.
    const slope = -60 / 520;
    const h = straightCurve(SURFACE_V - slope * 560, slope);
    const scan = scanWith(h, [40, 560]);
    drawBorder(scan, 40, 60, 230, HORIZON_WIDTH_PX);
    const pts = traceThrough(scan, featuresOf(scan), [[40, h.f(40)], [560, h.f(560)]], 0);
    const { rms, max } = offHorizon(scan, h, pts);
    expect(rms).toBeLessThan(0.3);
    expect(max).toBeLessThan(0.5);
  });

  it('leaves the land surface along its own line from an anchor where it ends on the surface', () => {
    // Solid horizon from the land surface at u = 100, descending at 11°.
    const h = straightCurve(SURFACE_V - 0.2 * 100, 0.2);
    const scan = scanWith(h, [100, 620]);
    const pts = traceThrough(scan, featuresOf(scan), [[100, h.f(100)], [520, h.f(520)]], 0);
    const { rms, max } = offHorizon(scan, h, pts);
    expect(rms).toBeLessThan(0.3);
    expect(max).toBeLessThan(0.5);
  });

  it('leaves the land surface along a dashed projection from an anchor where it crops out', () => {
    // The eroded horizon projected above the surface: dashes of 12 px with gaps of 6 px, rising at 31°.
    const h = straightCurve(SURFACE_V + 0.6 * 100, -0.6);
    const scan = scanWith(h, [100, 300], [12, 6]);
    const pts = traceThrough(scan, featuresOf(scan), [[100, h.f(100)], [280, h.f(280)]], 0);
    const { rms, max } = offHorizon(scan, h, pts);
    expect(rms).toBeLessThan(0.3);
    expect(max).toBeLessThan(0.5);
  });
});
