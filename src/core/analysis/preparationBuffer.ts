import type { Allocate } from '../model/readPoints';

// Memory for the points a preparation only needs while it runs (the validated input, and in a
// scratch preparation the clipped lines too). Live dragging and the benchmark prepare sections
// many times, and fresh large typed arrays cost page faults on first write, so a caller that
// prepares repeatedly keeps one buffer and hands it in. The buffer belongs to its caller, not to
// the engine: two preparations with two buffers never touch each other's memory, however they are
// interleaved, and nothing computed is kept in it between calls, only the memory.

/** A caller-held reusable memory for prepareSection / analyseSection. */
export interface PreparationBuffer {
  /** Returns a view of n free float64 slots in the buffer (grows it when full; earlier views stay valid until reset). */
  allocate: Allocate;
  /** Makes the whole buffer free again: views handed out before are overwritten by later allocations. */
  reset(): void;
}

/** Returns a new, empty preparation buffer of `initialLength` float64 slots (grown on demand; a non-positive length starts at 1). */
export function createPreparationBuffer(initialLength = 1 << 12): PreparationBuffer {
  let pool = new Float64Array(Math.max(1, Math.floor(initialLength) || 1));
  let used = 0;
  return {
    allocate: (n) => {
      if (used + n > pool.length) {
        // Views handed out earlier keep the old memory alive until they are dropped.
        pool = new Float64Array(Math.max(2 * pool.length, 2 * n));
        used = 0;
      }
      used += n;
      return pool.subarray(used - n, used);
    },
    reset: () => {
      used = 0;
    },
  };
}
