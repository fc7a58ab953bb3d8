import { describe, expect, it } from 'vitest';
import { imageToSection } from '../../src/core/calibration/mapPoints';
import { shoelaceArea } from '../../src/core/geometry/shoelaceArea';
import { clippedHorizonPx, excessFillGeometry, excessFillSides } from '../../src/canvas/excessFillGeometry';
import { joinedLinePx } from '../../src/canvas/joinedLinePx';
import { piecesOfPoints } from '../../src/core/model/piecesOfPoints';
import { decimateAfterPrefix, decimatePolyline, decimatePrefix } from '../../src/canvas/decimatePolyline';
import { expectClose } from '../expectClose';
import { faultedPx } from './faultedFixture';

/** Excess area (m²) enclosed by a fill loop (image px): horizon left → right, regional back; above the regional positive. */
function loopArea(loop: number[], frame: ReturnType<typeof faultedPx>['frame']): number {
  const xs: number[] = [];
  const zs: number[] = [];
  for (let i = 0; i < loop.length; i += 2) {
    const [x, z] = imageToSection(frame, [loop[i], loop[i + 1]]);
    xs.push(x);
    zs.push(z);
  }
  return -shoelaceArea(xs, zs);
}

describe('joinedLinePx', () => {
  it('joinedLinePx(line, no joins) is the line itself, no segment along a fault', () => {
    const line: [number, number][] = [[0, 0], [5, 1], [9, 0]];
    expect(joinedLinePx(line, [], [])).toEqual({ points: line, alongFault: [false, false], pieceStarts: [0] });
  });

  it('piecesOfPoints splits at each join and ignores joins out of range', () => {
    const pts: [number, number][] = [[0, 0], [1, 0], [2, 0], [3, 0], [4, 0]];
    expect(piecesOfPoints(pts, [{ at: 2, faultId: 'f' }, { at: 9, faultId: 'f' }]).map((p) => p.length)).toEqual([2, 3]);
  });

  for (const [label, D] of [['thrust', 1500], ['normal fault', -1200]] as const) {
    for (const rightToLeft of [false, true]) {
      it(`the fill loop of the joined line encloses the forward model's D·(z_r − zd) (${label}, ${rightToLeft ? 'right to left' : 'left to right'})`, () => {
        // Forward model (Gibbs 1983 construction; docs/method.md §Forward models): exact excess area D·(z_r − zd).
        const s = faultedPx(D, rightToLeft);
        s.horizons.forEach((h, i) => {
          const joined = joinedLinePx(h.pointsPx, h.joins, [{ id: 'fault-1', pointsPx: s.faultPx }]);
          expect(joined.pieceStarts).toHaveLength(2);
          expect(joined.alongFault.some((a) => a)).toBe(true);
          const whole = excessFillGeometry(joined.points, h.regionalPx, s.pins, s.frame);
          expect(whole, `horizon ${i}`).not.toBeNull();
          expectClose(loopArea(whole!.loop, s.frame), s.truth.horizons[i].excessArea, 1e-9, { label: `horizon ${i}` });
          // Without the fault stretch the loop is wrong: the pieces alone do not enclose the excess area.
          const unjoined = excessFillGeometry(h.pointsPx, h.regionalPx, s.pins, s.frame);
          if (unjoined) expect(Math.abs(loopArea(unjoined.loop, s.frame) - s.truth.horizons[i].excessArea)).toBeGreaterThan(1);
        });
      });
    }
  }

  it('the incremental fill of a joined line (kept horizon side, regional side rebuilt) matches the fill built whole', () => {
    const s = faultedPx(1500);
    const h = s.horizons[1];
    const joined = joinedLinePx(h.pointsPx, h.joins, [{ id: 'fault-1', pointsPx: s.faultPx }]).points;
    const head = clippedHorizonPx(joined, s.pins, s.frame)!;
    for (const dv of [0, -3, 7.5, 40]) {
      const regional = h.regionalPx.map(([u, v]) => [u, v + dv] as [number, number]);
      const whole = excessFillGeometry(joined, regional, s.pins, s.frame)!;
      const sides = excessFillSides(regional, s.pins, s.frame, head)!;
      expect(head.loopHead.concat(sides.loopTail)).toEqual(whole.loop);
      const d = decimatePrefix(head.loopHead, 0.37, [-800, 1600]);
      expect(decimateAfterPrefix(d, sides.loopTail, 0.37, [-800, 1600])).toEqual(decimatePolyline(whole.loop, 0.37, [-800, 1600]));
    }
  });
});
