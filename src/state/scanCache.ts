// Decoded scans and their original bytes, keyed by the document's scan id. Kept out of the
// document (and its undo history) because bitmaps are neither plain data nor cheap to copy.

/**
 * A scan's original bytes and its decoded bitmap. `bitmap` is null for a scan kept but not shown (a saved scan that
 * no longer decodes to the size its lines were digitised at), `notShown` saying why: its bytes still go into the
 * project file and the browser's copy, so nothing of the project is lost.
 */
export interface CachedScan { bitmap: ImageBitmap | null; bytes: Blob; notShown?: string }

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

/** Returns a counter that changes whenever a scan is added (for useSyncExternalStore). */
export function scanCacheVersion(): number {
  return version;
}
