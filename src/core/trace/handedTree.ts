// A shortest-path tree handed from the worker that built it to the page, as flat typed arrays that move
// without copying (transferred): the predecessor steps, the window's features and the centres already
// found. The page then reads each pointer position's path itself, in the same task as the move, with no
// round trip to the worker (Mortensen & Barrett 1995: once the tree is built, a path is read back in
// time proportional to its length).
import type { PixelFeatures } from './pixelFeatures';
import type { Raster } from './raster';
import type { CentreCache } from './refineToCentre';
import type { PathTree } from './shortestPathTree';

/** A tree with its anchor, window, features and centre cache, as one anchor's tracing keeps it. */
export interface KeptTree { id: number; from: [number, number]; win: Raster; tree: PathTree; features: PixelFeatures; centres: CentreCache }

/** A kept tree as plain data and typed arrays (the distances are left behind: reading a path needs only the steps). */
export interface HandedTree {
  id: number;
  from: [number, number];
  win: Raster;
  source: number;
  pred: Uint8Array;
  dark: Float32Array;
  edge: Float32Array;
  /** Centre cache: keys, and per key the centre (x, y; NaN where no line was found) and the line's width. */
  centreKeys: Float64Array;
  centreXY: Float64Array;
  centreWidthPx: Float32Array;
}

/** Returns the tree as handed data and the buffers to transfer with it (the tree's own arrays: it is not to be used after). */
export function handTree(t: KeptTree): { handed: HandedTree; transfer: ArrayBuffer[] } {
  const n = t.centres.size;
  const centreKeys = new Float64Array(n);
  const centreXY = new Float64Array(2 * n).fill(NaN);
  const centreWidthPx = new Float32Array(n).fill(NaN);
  let i = 0;
  for (const [k, c] of t.centres) {
    centreKeys[i] = k;
    if (c) {
      centreXY[2 * i] = c.point[0];
      centreXY[2 * i + 1] = c.point[1];
      centreWidthPx[i] = c.widthPx;
    }
    i++;
  }
  const handed: HandedTree = { id: t.id, from: t.from, win: t.win, source: t.tree.source, pred: t.tree.pred, dark: t.features.dark, edge: t.features.edge, centreKeys, centreXY, centreWidthPx };
  const transfer = [handed.pred.buffer, handed.dark.buffer, handed.edge.buffer, centreKeys.buffer, centreXY.buffer, centreWidthPx.buffer] as ArrayBuffer[];
  return { handed, transfer };
}

/** Returns the kept tree rebuilt from handed data (its distances empty: only paths are read from it). */
export function keptTree(h: HandedTree): KeptTree {
  const { w, h: ht } = h.win;
  const centres: CentreCache = new Map();
  for (let i = 0; i < h.centreKeys.length; i++) {
    const x = h.centreXY[2 * i];
    centres.set(h.centreKeys[i], Number.isNaN(x) ? null : { point: [x, h.centreXY[2 * i + 1]], widthPx: h.centreWidthPx[i] });
  }
  return {
    id: h.id,
    from: h.from,
    win: h.win,
    tree: { w, h: ht, source: h.source, dist: new Int32Array(0), pred: h.pred },
    features: { ...h.win, dark: h.dark, edge: h.edge },
    centres,
  };
}
