// Decimating a line in two steps — its fixed head once, then on each change only the head's last run and the
// new tail — must give exactly the points of decimating the whole line at once (decimatePolyline, itself
// checked against analytic curves in decimatePolyline.test.ts): the fills of a dragged regional are drawn
// this way, and must look the same as when rebuilt whole.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decimateAfterPrefix, decimatePolyline, decimatePrefix } from '../../src/canvas/decimatePolyline';
import { clippedHorizonPx, excessFillGeometry, excessFillSides } from '../../src/canvas/excessFillGeometry';
import { fitCalibration } from '../../src/core/calibration/fitCalibration';
import type { ImagePx } from '../../src/core/model/projectDoc';

const flatLine = fc.array(fc.tuple(fc.double({ min: -50, max: 250, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true })), { maxLength: 60 })
  .map((pts) => pts.flat());

describe('decimateAfterPrefix', () => {
  it('gives the same points as decimating head and tail joined, for any split, scale and window', () => {
    fc.assert(fc.property(flatLine, flatLine, fc.double({ min: 0.05, max: 20, noNaN: true }), fc.integer({ min: -20, max: 40 }), fc.integer({ min: 0, max: 300 }), fc.boolean(),
      (head, tail, scale, first, width, windowed) => {
        const columns: [number, number] = windowed ? [first, first + width] : [-Infinity, Infinity];
        const whole = decimatePolyline(head.concat(tail), scale, columns);
        expect(decimateAfterPrefix(decimatePrefix(head, scale, columns), tail, scale, columns)).toEqual(whole);
      }));
  });

  it('joins a head whose last run shares a pixel column with the tail’s first vertices as one run', () => {
    // Worked by hand: at scale 1 the head's last three vertices and the tail's first two lie in pixel column 2.
    // Whole, that run is v = 5, 9, 7, 1, 4 and keeps its first (2.1, 5), highest (2.3, 9), lowest (2.7, 1) and
    // last (2.9, 4), dropping (2.5, 7); the head's part alone would have kept (2.5, 7) as its last.
    const head = [0.5, 0, 1.5, 3, 2.1, 5, 2.3, 9, 2.5, 7];
    const tail = [2.7, 1, 2.9, 4, 3.5, 4, 4.5, 2];
    const two = decimateAfterPrefix(decimatePrefix(head, 1), tail, 1);
    expect(two).toEqual([0.5, 0, 1.5, 3, 2.1, 5, 2.3, 9, 2.7, 1, 2.9, 4, 3.5, 4, 4.5, 2]);
    expect(two).toEqual(decimatePolyline(head.concat(tail), 1));
  });

  it('copies lines too short or scales unusable, as decimatePolyline does', () => {
    expect(decimateAfterPrefix(decimatePrefix([0, 0, 0.1, 1], 1), [0.2, 2], 1)).toEqual([0, 0, 0.1, 1, 0.2, 2]);
    expect(decimateAfterPrefix(decimatePrefix([0, 0, 0.1, 1, 0.2, 3], 0), [0.3, 2, 0.4, 5, 0.5, 1], 0)).toEqual(decimatePolyline([0, 0, 0.1, 1, 0.2, 3, 0.3, 2, 0.4, 5, 0.5, 1], 0));
  });
});

describe('excessFillSides', () => {
  it('with the kept horizon part makes the loop and clip regions of excessFillGeometry built whole', () => {
    // An invented fold of 5,000 vertices on a 1 px = 2 m axes calibration, regional moved in steps as in a drag.
    const cal = fitCalibration({ kind: 'axes', xPoints: [{ u: 0, v: 0, value: 0 }, { u: 1000, v: 0, value: 2000 }], zPoints: [{ u: 0, v: 0, value: 500 }, { u: 0, v: 500, value: -500 }] });
    if (!cal.ok) throw new Error(cal.message);
    const frame = cal.fit;
    const line: ImagePx[] = Array.from({ length: 5000 }, (_, i) => [i / 5, 250 - 80 * Math.sin((Math.PI * i) / 5000)]);
    const pins: [number, number] = [200, 1800];
    const head = clippedHorizonPx(line, pins, frame)!;
    for (const dv of [0, -3, 7.5, 40]) {
      const regional: ImagePx[] = [[0, 250 + dv], [1000, 252 + dv]];
      const whole = excessFillGeometry(line, regional, pins, frame)!;
      const sides = excessFillSides(regional, pins, frame, head)!;
      expect(head.loopHead.concat(sides.loopTail)).toEqual(whole.loop);
      expect(sides.above).toEqual(whole.above);
      expect(sides.below).toEqual(whole.below);
      const d = decimatePrefix(head.loopHead, 0.37, [-800, 1600]);
      expect(decimateAfterPrefix(d, sides.loopTail, 0.37, [-800, 1600])).toEqual(decimatePolyline(whole.loop, 0.37, [-800, 1600]));
    }
  });
});
