import { describe, expect, it } from 'vitest';
import polygonClipping from 'polygon-clipping';
import { fillHorizonPart, fillRegionalPart } from '../../../src/core/geometry/excessFillOutline';
import type { XZ } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';

/** Planar area of polygon-clipping's multipolygon (shoelace over outer rings minus holes). */
function area(mp: polygonClipping.MultiPolygon): number {
  const ring = (r: polygonClipping.Ring) => {
    let s = 0;
    for (let i = 0; i < r.length - 1; i++) s += r[i][0] * r[i + 1][1] - r[i + 1][0] * r[i][1];
    return Math.abs(s) / 2;
  };
  return mp.reduce((t, poly) => t + ring(poly[0]) - poly.slice(1).reduce((h, r) => h + ring(r), 0), 0);
}

describe('excessFillOutline: the fill loop and its clip regions above and below the regional', () => {
  // A horizon rising 1 above a flat regional (z = 0) then falling 1 below it, pins at 0 and 6: two
  // triangles of base 3 and height 1, area 1.5 each (analytic), added above and subtracted below.
  const line: XZ[] = [[-1, 0], [0, 0], [1.5, 1], [3, 0], [4.5, -1], [6, 0], [7, 0]];
  const regional: XZ[] = [[-1, 0], [7, 0]];
  const pins: [number, number] = [0, 6];
  const head = fillHorizonPart(line.map((p) => p[0]), line.map((p) => p[1]), pins)!;
  const side = fillRegionalPart(regional.map((p) => p[0]), regional.map((p) => p[1]), pins, head)!;
  const loop: XZ[] = [...Array.from(head.xs, (x, i): XZ => [x, head.zs[i]]), ...side.tail];

  it('runs the horizon left to right between the pins, then the regional back', () => {
    expect(loop[0]).toEqual([0, 0]);
    expect(loop[Array.from(head.xs).length - 1]).toEqual([6, 0]);
    expect(side.tail[0]).toEqual([6, 0]);
    expect(side.tail[side.tail.length - 1]).toEqual([0, 0]);
  });

  it('clips to the lobe above and the lobe below, 1.5 each (checked with polygon-clipping)', () => {
    const closed = (r: XZ[]): polygonClipping.Polygon => [[...r, r[0]]];
    expectClose(area(polygonClipping.intersection(closed(loop), closed(side.above))), 1.5, 1e-12);
    expectClose(area(polygonClipping.intersection(closed(loop), closed(side.below))), 1.5, 1e-12);
  });

  it('returns null when the horizon or the regional misses a pin', () => {
    expect(fillHorizonPart([1, 5], [0, 0], pins)).toBeNull();
    expect(fillRegionalPart([1, 7], [0, 0], pins, head)).toBeNull();
  });
});
