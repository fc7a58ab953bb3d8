// A short key of everything in a section that the analysis reads, so that a result computed earlier
// (a Monte Carlo run, a sensitivity sweep) can be told apart from the current state: equal keys, same
// analysis; a different key, a stale result.
import { horizonPieces, isFlatLine, type AnySection, type SectionLine } from './section';

// The key hashes every number and name the analysis reads (units, pins, reference, resolution, each horizon's
// name, include flag, line or pieces, regional and projected runs, and every fault), so two sections with the same key give the
// same analysis; a hash of the float bits rather than of JSON text so that a drag frame costs one
// pass over the vertices. Memoised per section object (the selectors hand out the same object until
// the document changes).
// Two 32-bit FNV-1a style lanes with different multipliers: about 2⁻⁶⁴ odds of a chance collision. The lanes
// and the word count live in `lanes` between the steps; the vertex loop (a million vertices in a big
// document) keeps them in locals and is a small function of its own, so that V8 compiles it tightly.
const keys = new WeakMap<AnySection, string>();
const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);
const lanes = new Int32Array(2);
let count = 0;

function word(w: number): void {
  lanes[0] = Math.imul(lanes[0] ^ w, 0x01000193);
  lanes[1] = Math.imul(lanes[1] ^ w, 0x5bd1e995) ^ (lanes[1] >>> 15);
  count++;
}

function num(v: number): void {
  f64[0] = v;
  word(u32[0]);
  word(u32[1]);
}

function text(t: string): void {
  word(t.length);
  for (let i = 0; i < t.length; i++) word(t.charCodeAt(i));
}

/** Hashes a run of points: its length, then each x and z as the two 32-bit halves of its float (the same words for either form of a line). */
function points(line: SectionLine): void {
  if (isFlatLine(line)) {
    word(line.xs.length);
    lanes[0] = hashFlat(line.xs, line.zs, lanes[0], lanes[1]);
    count += 4 * line.xs.length;
    return;
  }
  const pts = line;
  word(pts.length);
  let a = lanes[0];
  let b = lanes[1];
  for (let i = 0; i < pts.length; i++) {
    const p = pts[i];
    f64[0] = p[0];
    let w = u32[0];
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
    w = u32[1];
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
    f64[0] = p[1];
    w = u32[0];
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
    w = u32[1];
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
  }
  lanes[0] = a;
  lanes[1] = b;
  count += 4 * pts.length;
}

/** The points loop over coordinate arrays: returns lane 0 and leaves lane 1 in `lanes[1]`. */
function hashFlat(xs: Float64Array, zs: Float64Array, a: number, b: number): number {
  for (let i = 0; i < xs.length; i++) {
    f64[0] = xs[i];
    let w = u32[0];
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
    w = u32[1];
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
    f64[0] = zs[i];
    w = u32[0];
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
    w = u32[1];
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
  }
  lanes[1] = b;
  return a;
}

/** Returns a short text key of everything in the section the analysis depends on; equal sections give equal keys. */
export function sectionKey(section: AnySection): string {
  const hit = keys.get(section);
  if (hit) return hit;
  lanes[0] = 0x811c9dc5;
  lanes[1] = 0x01000193;
  count = 0;
  text(section.units);
  num(section.pins[0]);
  num(section.pins[1]);
  num(section.referenceElevation ?? NaN);
  num(section.resolution ?? NaN);
  for (const h of section.horizons) {
    text(h.name);
    word(h.include === false ? 0 : 1);
    const pieces = horizonPieces(h);
    word(pieces.length);
    word(h.joinFaults?.length ?? 0);
    for (const f of h.joinFaults ?? []) text(f);
    for (const pts of pieces) points(pts);
    points(h.regional);
    word(h.projected?.length ?? 0);
    for (const [from, to] of h.projected ?? []) {
      word(from);
      word(to);
    }
  }
  for (const f of section.faults ?? []) {
    text(f.name);
    points(f.line);
  }
  const key = `${(lanes[0] >>> 0).toString(16)}${(lanes[1] >>> 0).toString(16).padStart(8, '0')}-${count}`;
  keys.set(section, key);
  return key;
}

/** Whether the record was computed for a section other than the current one (its key differs). */
export function isStale(record: { sectionKey: string }, current: AnySection): boolean {
  return record.sectionKey !== sectionKey(current);
}
