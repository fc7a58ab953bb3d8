// The document with every line's vertices in one Float64Array ([u0, v0, u1, v1, …]) instead of an array of
// [u, v] pairs. Two uses: the autosave (state/autosaveDb), where the browser copies a typed array into
// IndexedDB as one block (a million small arrays took a third of a second of the page's time after every
// edit of a big document) and a line unchanged since the last write is not packed again; and opening a file
// off the main thread (workers/openProject.worker.ts), where the lines cross from the worker as transferred
// buffers, not copied pair by pair, and are unpacked a few lines a task (unpackDocInSteps).
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

/** Returns the [u, v] pairs of a packed line (an odd last number is dropped); packPoints of the result gives `flat` back without packing again. */
export function unpackPoints(flat: Float64Array): ImagePx[] {
  const out = new Array<ImagePx>(flat.length >> 1);
  for (let i = 0; i < out.length; i++) out[i] = [flat[2 * i], flat[2 * i + 1]];
  packed.set(out, flat);
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

/** Returns the buffers of a packed document's lines, once each: the transfer list for postMessage (they are detached after it). */
export function packedDocBuffers(doc: PackedDoc): ArrayBuffer[] {
  const out = new Set<ArrayBuffer>();
  const add = (x: unknown) => x instanceof Float64Array && out.add(x.buffer as ArrayBuffer);
  for (const h of doc.horizons) add(h.pointsPx);
  for (const f of doc.faults ?? []) add(f.pointsPx);
  for (const s of doc.scenarios) for (const r of Object.values(s.regionals)) add(r);
  return [...out];
}

/**
 * Returns a stored document with its lines unpacked, ready for the schema check: lines that are not packed
 * (kept before packing was used, or damaged) are left as they are for the check to judge.
 */
export function unpackDoc(stored: unknown): unknown {
  const unpack = (x: unknown) => (x instanceof Float64Array ? unpackPoints(x) : x);
  return unpackWith(stored, unpack);
}

/**
 * Returns what unpackDoc returns, unpacking about `perStep` vertices at a time and awaiting `step(done, total)`
 * (vertices unpacked so far, of all) between: the caller yields to the page there, so that a document of a
 * million vertices does not hold the main thread in one task.
 */
export async function unpackDocInSteps(stored: unknown, perStep: number, step: (done: number, total: number) => Promise<void>): Promise<unknown> {
  // The lines in the order unpackWith meets them, each unpacked ahead; the second pass only picks them up.
  const flats: Float64Array[] = [];
  unpackWith(stored, (x) => (x instanceof Float64Array && flats.push(x), x));
  let total = 0;
  for (const f of flats) total += f.length >> 1;
  const lines = new Map<Float64Array, ImagePx[]>();
  let done = 0;
  let sinceStep = 0;
  for (const f of flats) {
    if (!lines.has(f)) lines.set(f, unpackPoints(f));
    done += f.length >> 1;
    sinceStep += f.length >> 1;
    if (sinceStep >= perStep) {
      sinceStep = 0;
      await step(done, total);
    }
  }
  return unpackWith(stored, (x) => (x instanceof Float64Array ? lines.get(x) : x));
}

/** A line in a keyed document (packedDelta): the number the receiver holds it under. */
export interface LineKey { lineKey: number }

/** What a sender of packed documents remembers: a number for each packed line, and the lines the receiver holds. */
export interface LineSender { keys: WeakMap<Float64Array, number>; next: number; held: Set<number> }

/** Returns a sender that has sent nothing yet (its receiver holds no line). */
export function createLineSender(): LineSender {
  return { keys: new WeakMap(), next: 1, held: new Set() };
}

/** A packed document for a receiver that keeps lines between documents: each line a key, with the lines it lacks. */
export interface PackedDelta { doc: unknown; lines: [number, Float64Array][] }

/**
 * Returns the packed document with each line replaced by its key, and copies of the lines the receiver does not hold
 * yet (their buffers may be transferred); afterwards the receiver holds exactly this document's lines
 * (receivePackedDelta drops the others), so a line unchanged since the last document is not sent again.
 */
export function packedDelta(sender: LineSender, doc: PackedDoc): PackedDelta {
  const lines: [number, Float64Array][] = [];
  const used = new Set<number>();
  const keyed = unpackWith(doc, (x) => {
    if (!(x instanceof Float64Array)) return x;
    let key = sender.keys.get(x);
    if (key === undefined) sender.keys.set(x, (key = sender.next++));
    if (!sender.held.has(key) && !used.has(key)) lines.push([key, x.slice()]);
    used.add(key);
    return { lineKey: key } satisfies LineKey;
  });
  sender.held = used;
  return { doc: keyed, lines };
}

/**
 * Returns the packed document of a delta, its lines from `held` and the delta's new ones; `held` then keeps only
 * this document's lines. Throws when a key is neither (the sender and receiver disagree).
 */
export function receivePackedDelta(held: Map<number, Float64Array>, delta: PackedDelta): PackedDoc {
  for (const [key, line] of delta.lines) held.set(key, line);
  const used = new Set<number>();
  const doc = unpackWith(delta.doc, (x) => {
    const key = (x as Partial<LineKey> | null)?.lineKey;
    if (typeof key !== 'number') return x;
    const line = held.get(key);
    if (!line) throw new Error(`line ${key} of the kept document was never sent`);
    used.add(key);
    return line;
  });
  for (const key of [...held.keys()]) if (!used.has(key)) held.delete(key);
  return doc as PackedDoc;
}

/** The stored document with each line replaced by `line(it)`; the shape is not checked (the schema does that). */
function unpackWith(stored: unknown, line: (x: unknown) => unknown): unknown {
  if (typeof stored !== 'object' || stored === null) return stored;
  const d = stored as { horizons?: unknown; faults?: unknown; scenarios?: unknown };
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
