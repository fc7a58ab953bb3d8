import type { ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/** Returns the document with the segments between vertices from..to (either order) marked projected (or unmarked); runs are merged. */
export function setProjected(doc: ProjectDoc, horizonId: string, run: [number, number], projected: boolean): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => {
    const segments = Math.max(0, h.pointsPx.length - 1);
    const flags = new Array<boolean>(segments).fill(false);
    for (const [a, b] of h.projected) for (let s = Math.max(0, a); s < Math.min(b, segments); s++) flags[s] = true;
    const lo = Math.max(0, Math.min(run[0], run[1]));
    const hi = Math.min(segments, Math.max(run[0], run[1]));
    for (let s = lo; s < hi; s++) flags[s] = projected;
    // Back to runs of vertex indices [from, to]: segment s joins vertices s and s + 1.
    const runs: [number, number][] = [];
    for (let s = 0; s < segments; s++) {
      if (!flags[s]) continue;
      const last = runs[runs.length - 1];
      if (last && last[1] === s) last[1] = s + 1;
      else runs.push([s, s + 1]);
    }
    return { ...h, projected: runs };
  });
}

/** Returns true when every segment between vertices from..to of the horizon is projected. */
export function isProjectedRun(runs: [number, number][], run: [number, number]): boolean {
  const lo = Math.min(run[0], run[1]);
  const hi = Math.max(run[0], run[1]);
  for (let s = lo; s < hi; s++) if (!runs.some(([a, b]) => a <= s && s < b)) return false;
  return hi > lo;
}
