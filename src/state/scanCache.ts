// Decoded scans and their original bytes, keyed by the document's scan id. Kept out of the
// document (and its undo history) because bitmaps are neither plain data nor cheap to copy.
// A decoded scan is held once: its bitmap is the full-resolution level of its tile pyramid (scanTilesPyramid),
// which this cache starts when the bitmap comes in and releases when the bitmap is closed.
import { detachTilePyramid, pyramidsHeld, releaseTilePyramid, startTilePyramid } from './scanTilesPyramid';

/**
 * A scan's original bytes and its decoded bitmap. `bitmap` is null for a scan kept but not shown (a saved scan that
 * no longer decodes to the size its lines were digitised at), `notShown` saying why: its bytes still go into the
 * project file and the browser's copy, so nothing of the project is lost.
 */
export interface CachedScan {
  bitmap: ImageBitmap | null; bytes: Blob; notShown?: string;
  /** Set when the bitmap was closed because the open project no longer shows the scan (scanLifetime); decoded again from `bytes` when it does. */
  released?: true;
}

const scans = new Map<string, CachedScan>();
const listeners = new Set<() => void>();
let version = 0;

/** Stores a decoded scan under its id, starts its reduced views (a bitmap of its own under that id) and notifies subscribers. */
export function putScan(id: string, scan: CachedScan): void {
  const before = scans.get(id)?.bitmap;
  if (before && before !== scan.bitmap) {
    // Another bitmap under the same id: the old one and its tiles close a task later, once the view has let go.
    const closeTiles = detachTilePyramid(id);
    setTimeout(() => {
      closeTiles();
      before.close();
    }, 0);
  }
  scans.set(id, scan);
  if (scan.bitmap) startTilePyramid(id, scan.bitmap);
  else releaseTilePyramid(id);
  version += 1;
  listeners.forEach((l) => l());
}

/** Returns the decoded scan for an id, or undefined. */
export function getScan(id: string | undefined | null): CachedScan | undefined {
  return id ? scans.get(id) : undefined;
}

/** Subscribes to changes; returns the unsubscribe function. */
export function subscribeScans(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/**
 * Keeps decoded only the scan `shownId`: every other scan the `keepIds` list holds (the undo history can bring
 * it back) keeps its bytes with its bitmap closed (`released`); every other scan is dropped with its bitmap
 * closed; their tile pyramids are released with them. Returns the ids whose bitmaps were closed.
 */
export function retainScans(shownId: string | null, keepIds: Set<string>): string[] {
  const closed: string[] = [];
  for (const [id, scan] of scans) {
    if (id === shownId) continue;
    releaseTilePyramid(id);
    if (scan.bitmap) {
      scan.bitmap.close();
      closed.push(id);
    }
    if (keepIds.has(id)) {
      if (scan.bitmap || !scan.released) scans.set(id, { bytes: scan.bytes, bitmap: null, released: true });
    } else {
      scans.delete(id);
      if (!closed.includes(id)) closed.push(id);
    }
  }
  if (closed.length) {
    version += 1;
    listeners.forEach((l) => l());
  }
  return closed;
}

/** The ids of the scans held (decoded or not), for tests and the memory benchmark. */
export function heldScanIds(): string[] {
  return [...scans.keys()];
}

/**
 * What decoded scans hold in this tab: how many are decoded, their full bitmaps' bytes (RGBA), the reduced views'
 * tiles and bytes, whether reduced views are still being made, and the bytes of the canvases they are made through. Shown in the scan panel; read by tests.
 */
export function scanMemoryHeld(): { decoded: number; fullBytes: number; tiles: number; tileBytes: number; building: boolean; scratchBytes: number } {
  let decoded = 0;
  let fullBytes = 0;
  for (const scan of scans.values()) {
    if (!scan.bitmap) continue;
    decoded += 1;
    fullBytes += scan.bitmap.width * scan.bitmap.height * 4;
  }
  const p = pyramidsHeld();
  return { decoded, fullBytes, tiles: p.tiles, tileBytes: p.bytes, building: p.building, scratchBytes: p.scratchBytes };
}

/** Returns a counter that changes whenever a scan is added (for useSyncExternalStore). */
export function scanCacheVersion(): number {
  return version;
}
