// Least-cost paths from one pixel to every pixel of a window, 8-connected (Dijkstra 1959 with Dial's
// 1969 bucket queue: step costs are small integers, so the queue is a ring of buckets indexed by
// distance and every push and pop is constant time). The tree is computed once per anchor; every
// cursor position inside the window then reads its path back in time proportional to its length,
// which is what lets the live-wire preview follow the mouse.
import { MAX_STEP_COST } from './traceCost';

/** Predecessor directions: index into DX/DY of the step that reached a pixel; NO_STEP for the source and unreached pixels. */
export const NO_STEP = 255;
const DX = [1, -1, 0, 0, 1, 1, -1, -1];
const DY = [0, 0, 1, -1, 1, -1, 1, -1];

/** A shortest-path tree over a w × h window rooted at pixel `source` (row-major index). */
export interface PathTree { w: number; h: number; source: number; dist: Int32Array; pred: Uint8Array }

/**
 * Returns the shortest-path tree from `source` over the integer step costs `cost` (cost of stepping onto a pixel;
 * a diagonal step costs ≈ √2 times as much, as 181/128). With a `target` pixel the search stops once the target is
 * settled (its path is then final; farther pixels may be unreached). A source outside the window gives a tree
 * that reaches nothing.
 */
export function shortestPathTree(cost: Uint8Array, w: number, h: number, source: number, target = -1): PathTree {
  const n = w * h;
  const dist = new Int32Array(n).fill(0x7fffffff);
  const pred = new Uint8Array(n).fill(NO_STEP);
  const tree: PathTree = { w, h, source, dist, pred };
  if (!(source >= 0 && source < n)) return tree;
  const done = new Uint8Array(n);
  const ring = MAX_STEP_COST * 2 + 1;
  const buckets: number[][] = [];
  for (let b = 0; b < ring; b++) buckets.push([]);
  dist[source] = 0;
  buckets[0].push(source);
  let queued = 1;
  for (let d = 0; queued > 0; d++) {
    const bucket = buckets[d % ring];
    while (bucket.length > 0) {
      const k = bucket.pop() as number;
      queued--;
      if (done[k]) continue;
      done[k] = 1;
      if (k === target) return tree;
      const y = (k / w) | 0;
      const x = k - y * w;
      for (let s = 0; s < 8; s++) {
        const nx = x + DX[s];
        const ny = y + DY[s];
        if (nx < 0 || ny < 0 || nx >= w || ny >= h) continue;
        const q = ny * w + nx;
        if (done[q]) continue;
        const step = s < 4 ? cost[q] : (cost[q] * 181) >> 7;
        const nd = d + step;
        if (nd < dist[q]) {
          dist[q] = nd;
          pred[q] = s;
          buckets[nd % ring].push(q);
          queued++;
        }
      }
    }
  }
  return tree;
}

/** Returns the path of pixel indices from the tree's source to `target` (both included), or [] when `target` is unreached or outside. */
export function pathToSource(tree: PathTree, target: number): number[] {
  const { w, h, pred, source } = tree;
  if (!(target >= 0 && target < w * h)) return [];
  if (target !== source && pred[target] === NO_STEP) return [];
  const path: number[] = [];
  let k = target;
  for (let guard = 0; guard <= w * h; guard++) {
    path.push(k);
    if (k === source) return path.reverse();
    const s = pred[k];
    if (s === NO_STEP) return [];
    k -= DY[s] * w + DX[s];
  }
  return [];
}
