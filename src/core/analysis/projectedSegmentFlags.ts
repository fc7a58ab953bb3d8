// A projected run [from, to] (model/section.ts) marks vertices from..to as interpreted, so the
// segments joining them (from→from+1 … to−1→to) carry projected area and length.

/** Per-segment flags (1 = projected) for a line of nVertices; runs outside the line are clamped, none gives all 0. */
export function projectedSegmentFlags(runs: readonly [number, number][] | undefined, nVertices: number): Uint8Array {
  const flags = new Uint8Array(Math.max(0, nVertices - 1));
  if (!runs) return flags;
  for (const [from, to] of runs) {
    for (let s = Math.max(0, from); s < Math.min(to, nVertices - 1); s++) flags[s] = 1;
  }
  return flags;
}
