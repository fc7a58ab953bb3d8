// The canvas's fill polygons are core's one construction (excessFillOutline) mapped through the calibration: the
// horizon's side must be, to the last bit, what mapping each vertex with mapPoints (imageToSection, then
// sectionToImage) gives, for any line and any affine calibration.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clippedHorizonPx } from '../../src/canvas/excessFillGeometry';
import { fitCalibration } from '../../src/core/calibration/fitCalibration';
import { imageToSection, sectionToImage } from '../../src/core/calibration/mapPoints';
import { fillHorizonPart } from '../../src/core/geometry/excessFillOutline';
import type { ControlPoint, ImagePx } from '../../src/core/model/projectDoc';
import { keptClippedLine, selectAnalysis } from '../../src/state/selectors';
import { sectionFrame } from '../../src/core/model/commands/sectionFrame';
import { pinXs } from '../../src/core/model/commands/pinXs';
import { activeScenario } from '../../src/core/model/docToSection';
import { sampleDoc } from '../io/sampleDoc';

const v = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true });

describe('clippedHorizonPx(linePx, pins, frame)', () => {
  it('is the horizon clipped by fillHorizonPart, each vertex mapped by imageToSection and back by sectionToImage', () => {
    const affine = fc.tuple(v(-1e5, 1e5), v(0.1, 20), v(-2, 2), v(-1e4, 1e4), v(-2, 2), v(-20, -0.1));
    const line = fc.array(fc.tuple(v(-100, 1100), v(0, 800)), { minLength: 2, maxLength: 40 });
    let clipped = 0;
    fc.assert(fc.property(affine, line, v(0.05, 0.45), v(0.55, 0.95), ([a0, a1, a2, b0, b1, b2], pts, l, r) => {
      // A line that runs left to right across the image, with random wiggles; the pins inside its x range.
      const linePx: ImagePx[] = pts.map(([u, w], i): ImagePx => [(1000 * i) / (pts.length - 1) + (u - 500) / 50, w]);
      const points: ControlPoint[] = [[0, 0], [1000, 0], [1000, 800], [0, 800]].map(([u, w]) => ({ u, v: w, x: a0 + a1 * u + a2 * w, z: b0 + b1 * u + b2 * w }));
      const fit = fitCalibration({ kind: 'affine', points });
      if (!fit.ok) return;
      const frame = fit.fit;
      const xz = linePx.map((p) => imageToSection(frame, p));
      const xs = xz.map((q) => q[0]);
      const pins: [number, number] = [imageToSection(frame, [1000 * l, 0])[0], imageToSection(frame, [1000 * r, 0])[0]];
      pins.sort((p, q) => p - q);
      const part = fillHorizonPart(xs, xz.map((q) => q[1]), pins);
      const got = clippedHorizonPx(linePx, pins, frame);
      if (!part) {
        expect(got).toBeNull();
        return;
      }
      const want: number[] = [];
      for (let i = 0; i < part.xs.length; i++) {
        const [u, w] = sectionToImage(frame, [part.xs[i], part.zs[i]]);
        want.push(u, w);
      }
      expect(got?.loopHead).toEqual(want);
      expect(Array.from(got!.part.xs)).toEqual(Array.from(part.xs));
      clipped++;
    }), { numRuns: 200 });
    // Most random lines cross each pin once; the comparison above must have run on them.
    expect(clipped).toBeGreaterThan(20);
  });
});

describe('clippedHorizonPx from the analysis\'s clipped line', () => {
  it('is, to the last bit, the fill clipped here; the analysis is read once it is made, never made for it', () => {
    const doc = sampleDoc();
    const frame = sectionFrame(doc);
    const pins = pinXs(activeScenario(doc).pinsPx, frame)!;
    const id = doc.horizons[1].id;
    expect(keptClippedLine(doc, id, pins, frame)).toBeNull();
    selectAnalysis(doc);
    const line = keptClippedLine(doc, id, pins, frame);
    expect(line).not.toBeNull();
    const own = clippedHorizonPx(doc.horizons[1].pointsPx, pins, frame);
    const fromAnalysis = clippedHorizonPx(doc.horizons[1].pointsPx, pins, frame, line);
    expect(fromAnalysis).toEqual(own);
    expect(Array.from(fromAnalysis!.part.xs)).toEqual(Array.from(own!.part.xs));
    // Other pins than the analysis's: not its line.
    expect(keptClippedLine(doc, id, [pins[0], pins[1] + 1], frame)).toBeNull();
  });
});
