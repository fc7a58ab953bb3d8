// A short key of everything in a section that the analysis reads, so that a result computed earlier
// (a Monte Carlo run, a sensitivity sweep) can be told apart from the current state: equal keys, same
// analysis; a different key, a stale result.
import { horizonPieces, type Section } from './section';

// The key hashes every number and name the analysis reads (units, pins, reference, each horizon's
// name, include flag, line or pieces, regional and projected runs, and every fault), so two sections with the same key give the
// same analysis; a hash of the float bits rather than of JSON text so that a drag frame costs one
// pass over the vertices. Memoised per section object (the selectors hand out the same object until
// the document changes).
const keys = new WeakMap<Section, string>();
const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);

/** Returns a short text key of everything in the section the analysis depends on; equal sections give equal keys. */
export function sectionKey(section: Section): string {
  const hit = keys.get(section);
  if (hit) return hit;
  // Two 32-bit FNV-1a style lanes with different multipliers: about 2⁻⁶⁴ odds of a chance collision.
  let a = 0x811c9dc5;
  let b = 0x01000193;
  let count = 0;
  const word = (w: number) => {
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
    count++;
  };
  const num = (v: number) => {
    f64[0] = v;
    word(u32[0]);
    word(u32[1]);
  };
  const text = (t: string) => {
    word(t.length);
    for (let i = 0; i < t.length; i++) word(t.charCodeAt(i));
  };
  text(section.units);
  num(section.pins[0]);
  num(section.pins[1]);
  num(section.referenceElevation ?? NaN);
  for (const h of section.horizons) {
    text(h.name);
    word(h.include === false ? 0 : 1);
    const pieces = horizonPieces(h);
    word(pieces.length);
    word(h.joinFaults?.length ?? 0);
    for (const f of h.joinFaults ?? []) text(f);
    for (const pts of [...pieces, h.regional]) {
      word(pts.length);
      for (const p of pts) {
        num(p[0]);
        num(p[1]);
      }
    }
    word(h.projected?.length ?? 0);
    for (const [from, to] of h.projected ?? []) {
      word(from);
      word(to);
    }
  }
  for (const f of section.faults ?? []) {
    text(f.name);
    word(f.line.length);
    for (const p of f.line) {
      num(p[0]);
      num(p[1]);
    }
  }
  const key = `${(a >>> 0).toString(16)}${(b >>> 0).toString(16).padStart(8, '0')}-${count}`;
  keys.set(section, key);
  return key;
}

/** Whether the record was computed for a section other than the current one (its key differs). */
export function isStale(record: { sectionKey: string }, current: Section): boolean {
  return record.sectionKey !== sectionKey(current);
}
