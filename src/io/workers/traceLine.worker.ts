// Follows drawn lines off the main thread. Protocol: 'tile' (a tile's pixels as a transferred bitmap, one
// pixel wider than the tile where the image allows; with `pool`, a rough window to reduce here by blocks of that
// side) stores its features; 'drop' forgets tiles; 'tree' builds an anchor's shortest-path tree over a window,
// centres the path to `toward` (the pointer when it was asked) so its centres come along, and answers 'treeDone'
// with the tree handed over (core/trace/handedTree: its arrays transferred, the worker keeps no copy): the page reads
// every pointer position's path from it in the move's own task; 'once' traces one placed stretch without keeping a
// tree; 'warm' runs the whole chain once on a small made-up window, so that the first real preview does not pay for
// compiling it (cold, a first tile and tree took ten times as long). Messages are handled in order.
import type { Raster } from '../../core/trace/raster';
import type { HandedTree } from '../../core/trace/handedTree';
import { TraceSession } from '../../core/trace/traceSession';

export type TraceWorkerRequest =
  | { type: 'tile'; key: string; tile: Raster; crop: Raster; bitmap: ImageBitmap; pool?: number }
  | { type: 'drop'; keys: string[] }
  | { type: 'tree'; id: number; from: [number, number]; win: Raster; tileKeys: string[]; toward?: [number, number] }
  | { type: 'warm' }
  | { type: 'once'; key: string; from: [number, number]; to: [number, number]; win: Raster; tileKeys: string[] };

export type TraceWorkerReply =
  | { type: 'treeDone'; id: number; bytesHeld: number; tree: HandedTree | null }
  | { type: 'path'; id: number; key: string; points: [number, number][] | null }
  | { type: 'error'; message: string };

const session = new TraceSession();
let canvas: OffscreenCanvas | null = null;

function reply(msg: TraceWorkerReply, transfer: ArrayBuffer[] = []): void {
  (self as unknown as { postMessage(m: unknown, t: ArrayBuffer[]): void }).postMessage(msg, transfer);
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
      let handed: ReturnType<TraceSession['takeTree']> = null;
      try {
        session.buildTree(m.id, m.from, m.win, m.tileKeys);
        if (m.toward) session.path(m.id, m.toward);
        handed = session.takeTree(m.id);
      } finally {
        // Answered even on failure, so the page never waits for a tree that will not come.
        reply({ type: 'treeDone', id: m.id, bytesHeld: session.bytesHeld(), tree: handed?.handed ?? null }, handed?.transfer ?? []);
      }
    } else if (m.type === 'warm') session.warmUp();
    else if (m.type === 'once') reply({ type: 'path', id: -1, key: m.key, points: session.traceOnce(m.from, m.to, m.win, m.tileKeys) });
  } catch (err) {
    reply({ type: 'error', message: err instanceof Error ? err.message : String(err) });
  }
};
