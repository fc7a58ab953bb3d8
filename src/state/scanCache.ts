// Decoded scans and their original bytes, keyed by the document's scan id. Kept out of the
// document (and its undo history) because bitmaps are neither plain data nor cheap to copy.

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

/** Stores a decoded scan under its id and notifies subscribers. */
export function putScan(id: string, scan: CachedScan): void {
  scans.set(id, scan);
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
 * closed. Returns the ids whose bitmaps were closed.
 */
export function retainScans(shownId: string | null, keepIds: Set<string>): string[] {
  const closed: string[] = [];
  for (const [id, scan] of scans) {
    if (id === shownId) continue;
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

/** Returns a counter that changes whenever a scan is added (for useSyncExternalStore). */
export function scanCacheVersion(): number {
  return version;
}
