// The document as the autosave keeps it: every line's vertices in one Float64Array ([u0, v0, u1, v1, …])
// instead of an array of [u, v] pairs. The browser copies a typed array into IndexedDB as one block, where
// a million small arrays took a third of a second of the page's time after every edit of a big document;
// and a line that did not change since the last write (most of them, after most edits) is not packed again.
import type { ImagePx, ProjectDoc } from '../core/model/projectDoc';

const packed = new WeakMap<readonly ImagePx[], Float64Array>();

/** Returns the line's vertices as one flat Float64Array (the same array for the same line, packed once). */
export function packPoints(points: readonly ImagePx[]): Float64Array {
  const hit = packed.get(points);
  if (hit) return hit;
  const flat = new Float64Array(2 * points.length);
  for (let i = 0; i < points.length; i++) {
    flat[2 * i] = points[i][0];
    flat[2 * i + 1] = points[i][1];
  }
  packed.set(points, flat);
  return flat;
}

/** Returns the [u, v] pairs of a packed line (an odd last number is dropped). */
export function unpackPoints(flat: Float64Array): ImagePx[] {
  const out = new Array<ImagePx>(flat.length >> 1);
  for (let i = 0; i < out.length; i++) out[i] = [flat[2 * i], flat[2 * i + 1]];
  return out;
}

/** The document with its horizons' and regionals' vertices packed (packPoints); everything else as it is. */
export type PackedDoc = Omit<ProjectDoc, 'horizons' | 'faults' | 'scenarios'> & {
  horizons: (Omit<ProjectDoc['horizons'][number], 'pointsPx'> & { pointsPx: Float64Array })[];
  faults: (Omit<ProjectDoc['faults'][number], 'pointsPx'> & { pointsPx: Float64Array })[];
  scenarios: (Omit<ProjectDoc['scenarios'][number], 'regionals'> & { regionals: Record<string, Float64Array> })[];
};

/** Returns the document to store: lines packed, the rest shared with the document (not copied). */
export function packDoc(doc: ProjectDoc): PackedDoc {
  // A document that is not the shape it claims is stored as it is (the schema check on reading refuses it).
  if (!Array.isArray(doc.horizons) || !Array.isArray(doc.scenarios)) return doc as unknown as PackedDoc;
  return {
    ...doc,
    horizons: doc.horizons.map((h) => ({ ...h, pointsPx: packPoints(h.pointsPx) })),
    faults: Array.isArray(doc.faults) ? doc.faults.map((f) => ({ ...f, pointsPx: packPoints(f.pointsPx) })) : doc.faults,
    scenarios: doc.scenarios.map((s) => ({ ...s, regionals: Object.fromEntries(Object.entries(s.regionals).map(([id, r]) => [id, packPoints(r)])) })),
  };
}

/**
 * Returns a stored document with its lines unpacked, ready for the schema check: lines that are not packed
 * (kept before packing was used, or damaged) are left as they are for the check to judge.
 */
export function unpackDoc(stored: unknown): unknown {
  if (typeof stored !== 'object' || stored === null) return stored;
  const d = stored as { horizons?: unknown; faults?: unknown; scenarios?: unknown };
  const line = (x: unknown) => (x instanceof Float64Array ? unpackPoints(x) : x);
  const lines = (list: unknown[]) => list.map((h: unknown) => (typeof h === 'object' && h !== null ? { ...h, pointsPx: line((h as { pointsPx?: unknown }).pointsPx) } : h));
  return {
    ...d,
    ...(Array.isArray(d.horizons) ? { horizons: lines(d.horizons) } : {}),
    ...(Array.isArray(d.faults) ? { faults: lines(d.faults) } : {}),
    ...(Array.isArray(d.scenarios)
      ? {
          scenarios: d.scenarios.map((s: unknown) => {
            const r = (s as { regionals?: unknown } | null)?.regionals;
            if (typeof r !== 'object' || r === null) return s;
            return { ...(s as object), regionals: Object.fromEntries(Object.entries(r).map(([id, v]) => [id, line(v)])) };
          }),
        }
      : {}),
  };
}
