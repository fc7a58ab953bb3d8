// Follows drawn lines off the main thread. Protocol: 'tile' (a tile's pixels as a transferred bitmap, one
// pixel wider than the tile where the image allows; with `pool`, a rough window to reduce here by blocks of that
// side) stores its features; 'drop' forgets tiles; 'tree'
// builds an anchor's shortest-path tree over a window and answers 'treeDone'; 'path' answers the traced
// stretch to a point (null when that tree is no longer kept); 'once' traces one placed stretch without
// keeping a tree; 'warm' runs the whole chain once on a small made-up window, so that the first real preview
// does not pay for compiling it (cold, a first tile and tree took ten times as long). A 'tree' may carry the
// pointer position whose path it answers as soon as it is built, saving a round trip. Messages are handled in order.
import type { Raster } from '../../core/trace/raster';
import { TraceSession } from '../../core/trace/traceSession';

export type TraceWorkerRequest =
  | { type: 'tile'; key: string; tile: Raster; crop: Raster; bitmap: ImageBitmap; pool?: number }
  | { type: 'drop'; keys: string[] }
  | { type: 'tree'; id: number; from: [number, number]; win: Raster; tileKeys: string[]; path?: { key: string; to: [number, number] } }
  | { type: 'warm' }
  | { type: 'path'; id: number; key: string; to: [number, number] }
  | { type: 'once'; key: string; from: [number, number]; to: [number, number]; win: Raster; tileKeys: string[] };

export type TraceWorkerReply =
  | { type: 'treeDone'; id: number; bytesHeld: number }
  | { type: 'path'; id: number; key: string; points: [number, number][] | null }
  | { type: 'error'; message: string };

const session = new TraceSession();
let canvas: OffscreenCanvas | null = null;

function reply(msg: TraceWorkerReply): void {
  (self as unknown as { postMessage(m: unknown): void }).postMessage(msg);
}

function readPixels(bitmap: ImageBitmap): Uint8ClampedArray {
  if (!canvas || canvas.width < bitmap.width || canvas.height < bitmap.height) canvas = new OffscreenCanvas(Math.max(bitmap.width, canvas?.width ?? 0), Math.max(bitmap.height, canvas?.height ?? 0));
  const ctx = canvas.getContext('2d', { willReadFrequently: true }) as OffscreenCanvasRenderingContext2D;
  const { width, height } = bitmap;
  ctx.clearRect(0, 0, width, height);
  ctx.drawImage(bitmap, 0, 0);
  bitmap.close();
  return ctx.getImageData(0, 0, width, height).data;
}

self.onmessage = (e: MessageEvent<TraceWorkerRequest>) => {
  const m = e.data;
  try {
    if (m.type === 'tile') {
      const { width, height } = m.bitmap;
      const px = readPixels(m.bitmap);
      // A rough window comes whole at (or near) full resolution and is reduced here, keeping each block's darkest pixel.
      if (m.pool && m.pool > 1) session.putPooledTile(m.key, px, width, height, m.pool);
      else session.putTile(m.key, m.tile, px, m.crop);
    }
    else if (m.type === 'drop') session.dropTiles(m.keys);
    else if (m.type === 'tree') {
      try {
        session.buildTree(m.id, m.from, m.win, m.tileKeys);
        // The path before the tree's end: the page starts its next work on 'treeDone', and the preview came after it.
        if (m.path) reply({ type: 'path', id: m.id, key: m.path.key, points: session.path(m.id, m.path.to) });
      } finally {
        // Answered even on failure, so the page never waits for a tree that will not come.
        reply({ type: 'treeDone', id: m.id, bytesHeld: session.bytesHeld() });
      }
    } else if (m.type === 'warm') session.warmUp(); else if (m.type === 'path') reply({ type: 'path', id: m.id, key: m.key, points: session.path(m.id, m.to) });
    else if (m.type === 'once') reply({ type: 'path', id: -1, key: m.key, points: session.traceOnce(m.from, m.to, m.win, m.tileKeys) });
  } catch (err) {
    reply({ type: 'error', message: err instanceof Error ? err.message : String(err) });
  }
};
