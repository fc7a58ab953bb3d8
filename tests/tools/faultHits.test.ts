import { describe, expect, it } from 'vitest';
import { keepOnFault, nearestCutoff, nearestOnFault, pieceEndsOffFault, snapToFault } from '../../src/tools/faultHits';
import { expectClose } from '../expectClose';

// Nearest point on a polyline: orthogonal projection onto each segment, clamped to its ends
// (common practice in computational geometry, recalled from memory); the checks are hand-computed.
const zigzag: [number, number][] = [[0, 0], [100, 0], [100, 100]];

describe('faultHits', () => {
  it('nearestOnFault projects onto the nearest segment and measures along the line', () => {
    const a = nearestOnFault(zigzag, [40, 7])!;
    expect(a.point).toEqual([40, 0]);
    expect(a.distance).toBe(7);
    expect(a.along).toBe(40);
    // Beyond the corner the vertex itself is nearest (3-4-5 triangle, hand-computed).
    const b = nearestOnFault(zigzag, [103, -4])!;
    expect(b.point).toEqual([100, 0]);
    expectClose(b.distance, 5);
    const c = nearestOnFault(zigzag, [96, 60])!;
    expect(c.point).toEqual([100, 60]);
    expect(c.along).toBe(160);
    expect(nearestOnFault([[1, 1]], [0, 0])).toBeNull();
  });

  it('snapToFault takes the nearest shown fault within the tolerance and nothing beyond it', () => {
    const faults = [
      { id: 'fault-1', visible: true, pointsPx: zigzag },
      { id: 'fault-2', visible: true, pointsPx: [[0, 10], [100, 10]] as [number, number][] },
      { id: 'fault-3', visible: false, pointsPx: [[0, 3], [100, 3]] as [number, number][] },
    ];
    expect(snapToFault(faults, [50, 4], 5)).toEqual({ faultId: 'fault-1', point: [50, 0] });
    expect(snapToFault(faults, [50, 7], 5)).toEqual({ faultId: 'fault-2', point: [50, 10] });
    expect(snapToFault(faults, [50, 30], 5)).toBeNull();
  });

  it('keepOnFault slides a dragged end along its fault, however far the pointer goes', () => {
    expect(keepOnFault(zigzag, [60, -200])).toEqual([60, 0]);
    expect(keepOnFault(zigzag, [300, 50])).toEqual([100, 50]);
    const p = keepOnFault(zigzag, [77.25, 3.5]);
    expect(nearestOnFault(zigzag, p)!.distance).toBe(0);
  });

  it('pieceEndsOffFault names the end and start of each join that left its fault, and a missing fault', () => {
    const faults = [{ id: 'fault-1', visible: true, pointsPx: zigzag }];
    const line: [number, number][] = [[-50, 50], [100, 40], [100, 70], [200, 90]];
    expect(pieceEndsOffFault(line, [{ at: 2, faultId: 'fault-1' }], faults, 1e-6)).toEqual([]);
    const moved: [number, number][] = [[-50, 50], [98, 40], [100, 70], [200, 90]];
    expect(pieceEndsOffFault(moved, [{ at: 2, faultId: 'fault-1' }], faults, 1e-6)).toEqual([{ index: 1, faultId: 'fault-1', distancePx: 2 }]);
    expect(pieceEndsOffFault(line, [{ at: 2, faultId: 'fault-9' }], faults, 1e-6).map((e) => e.index)).toEqual([1, 2]);
  });

  it('nearestCutoff finds the pair with a point under the pointer', () => {
    const pairs: [[number, number], [number, number]][] = [[[0, 0], [10, 10]], [[50, 50], [60, 40]]];
    expect(nearestCutoff(pairs, [59, 41], 3)).toBe(1);
    expect(nearestCutoff(pairs, [9, 9], 3)).toBe(0);
    expect(nearestCutoff(pairs, [30, 30], 3)).toBe(-1);
  });
});
