// Imported lines are held to the range of core/model/limits.ts, as a section file is on the command line and in
// the app: the probes of 1e160, 1e308 and a section 1e-300 units wide that the command line refuses.
import { describe, expect, it } from 'vitest';
import { LIMITS } from '../../../src/core/model/limits';
import { importedCoordinateProblem } from '../../../src/core/model/importedCoordinateProblem';
import type { XZ } from '../../../src/core/model/section';

const line = (name: string, pts: XZ[]) => ({ name, line: pts });

describe('importedCoordinateProblem', () => {
  it('refuses a coordinate of 1e160 or 1e308, naming the line and the vertex, with the stated range', () => {
    for (const v of [1e160, -1e308, 1.0000001e9]) {
      const p = importedCoordinateProblem([line('Top', [[0, 0], [v, 10]])]);
      expect(p).toContain('Horizon "Top", vertex 2');
      expect(p).toContain('coordinates must lie within ±1e9 section units');
    }
    expect(importedCoordinateProblem([line('F1', [[0, 0], [1, 1e200]])], 'Fault')).toContain('Fault "F1", vertex 2');
  });

  it('refuses lines together spanning less than the smallest extent (a section 1e-300 units wide)', () => {
    expect(importedCoordinateProblem([line('Tiny', [[0, 0], [1e-300, 1e-300]])])).toContain('the section is too small to measure');
  });

  it('accepts lines within the range, the largest magnitude and the smallest extent included', () => {
    const m = LIMITS.coordinateMagnitude;
    expect(importedCoordinateProblem([line('Edge', [[-m, 0], [m, 1]])])).toBeNull();
    expect(importedCoordinateProblem([line('Small', [[0, 0], [LIMITS.minimumExtent, 0]])])).toBeNull();
    expect(importedCoordinateProblem([])).toBeNull();
  });
});
