import type { LengthUnit, Section, SectionHorizon, XZ } from './section';

// Structural validation of unknown JSON (a section file, the CLI's input, a pasted document)
// into a Section. Every problem is returned as data with a message that names the horizon and
// says how to fix it; nothing here throws. Geometric checks (pins crossed once, self-crossing)
// need clipping and live in src/core/analysis.

export type SectionProblemCode = 'empty-section' | 'too-few-points' | 'not-finite' | 'pins-invalid' | 'misses-pin'
  | 'crosses-pin-twice' | 'self-intersecting' | 'duplicate-name' | 'bad-projected-run' | 'bad-units' | 'bad-shape';

/** One input problem; `message` names the horizon (if any) and how to fix it. */
export interface SectionProblem { code: SectionProblemCode; horizon?: string; message: string }

export type SectionValidation = { ok: true; section: Section } | { ok: false; problems: SectionProblem[] };

type Problems = SectionProblem[];

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function label(name: string | undefined, index: number): string {
  return name !== undefined ? `Horizon "${name}"` : `Horizon #${index + 1}`;
}

/** A line's points as typed arrays (section units), in input order. */
interface PointArrays { xs: Float64Array; zs: Float64Array }

/** Gives a Float64Array of length n for the points (its contents are overwritten). */
export type Allocate = (n: number) => Float64Array;

const newArray: Allocate = (n) => new Float64Array(n);

/** Points as typed arrays or null (problems pushed); `what` is e.g. 'line' or 'regional'. */
function readPoints(v: unknown, who: string, what: string, horizon: string | undefined, out: Problems, allocate: Allocate): PointArrays | null {
  if (!Array.isArray(v)) {
    out.push({ code: 'bad-shape', horizon, message: `${who}: "${what}" must be an array of [x, z] points; add it.` });
    return null;
  }
  const n = v.length;
  const xs = allocate(n);
  const zs = allocate(n);
  // One pass over every point: this loop reads each vertex of the section, so it is kept lean.
  for (let i = 0; i < n; i++) {
    // Step 1: the point must be an [x, z] pair of numbers.
    const p: unknown = v[i];
    if (!Array.isArray(p) || p.length !== 2) return badPoint(who, what, horizon, i, out);
    const x: unknown = p[0];
    const z: unknown = p[1];
    if (typeof x !== 'number' || typeof z !== 'number') return badPoint(who, what, horizon, i, out);
    // Step 2: finite: x − x is 0 for every finite x, NaN for NaN and ±Infinity (as Number.isFinite).
    if (x - x !== 0 || z - z !== 0) {
      out.push({ code: 'not-finite', horizon, message: `${who}: ${what} point ${i} is not a finite number (NaN or Infinity); fix or delete that point.` });
      return null;
    }
    // Step 3: copy into the typed arrays the analysis runs on.
    xs[i] = x;
    zs[i] = z;
  }
  if (n < 2) {
    out.push({ code: 'too-few-points', horizon, message: `${who}: ${what} has ${n} point${n === 1 ? '' : 's'}; digitise at least 2 points.` });
    return null;
  }
  return { xs, zs };
}

function badPoint(who: string, what: string, horizon: string | undefined, i: number, out: Problems): null {
  out.push({ code: 'bad-shape', horizon, message: `${who}: ${what} point ${i} is not an [x, z] pair of numbers; write it as [x, z].` });
  return null;
}

function readRuns(v: unknown, nPoints: number, who: string, horizon: string | undefined, out: Problems): [number, number][] | null {
  const bad = (detail: string) => {
    out.push({ code: 'bad-projected-run', horizon, message: `${who}: projected run ${detail}; give runs as [fromIndex, toIndex] with 0 ≤ from < to ≤ ${nPoints - 1}, not overlapping.` });
    return null;
  };
  if (!Array.isArray(v)) return bad('list is not an array');
  const runs: [number, number][] = [];
  for (const r of v) {
    if (!Array.isArray(r) || r.length !== 2 || !Number.isInteger(r[0]) || !Number.isInteger(r[1])) return bad(`${JSON.stringify(r)} is not a pair of integer indices`);
    const [from, to] = r as [number, number];
    if (from < 0 || to > nPoints - 1) return bad(`[${from}, ${to}] is outside the line's vertices`);
    if (from >= to) return bad(`[${from}, ${to}] does not span a segment`);
    runs.push([from, to]);
  }
  const sorted = [...runs].sort((a, b) => a[0] - b[0]);
  for (let i = 1; i < sorted.length; i++) {
    if (sorted[i][0] < sorted[i - 1][1]) return bad(`[${sorted[i][0]}, ${sorted[i][1]}] overlaps [${sorted[i - 1][0]}, ${sorted[i - 1][1]}]`);
  }
  return runs;
}

function readHorizon(v: unknown, index: number, out: Problems, allocate: Allocate): HorizonArrays | null {
  if (!isObject(v)) {
    out.push({ code: 'bad-shape', message: `Horizon #${index + 1} is not an object; write it as { "name", "line", "regional" }.` });
    return null;
  }
  const name = typeof v.name === 'string' && v.name.trim() !== '' ? v.name : undefined;
  const who = label(name, index);
  const before = out.length;
  if (name === undefined) out.push({ code: 'bad-shape', message: `${who} has no name; give it a non-empty "name".` });
  const line = readPoints(v.line, who, 'line', name, out, allocate);
  const regional = readPoints(v.regional, who, 'regional', name, out, allocate);
  if (v.include !== undefined && typeof v.include !== 'boolean') {
    out.push({ code: 'bad-shape', horizon: name, message: `${who}: "include" must be true or false.` });
  }
  const runs = v.projected !== undefined && line ? readRuns(v.projected, line.xs.length, who, name, out) : undefined;
  if (out.length > before || !line || !regional || name === undefined) return null;
  const h: HorizonArrays = { name, lineX: line.xs, lineZ: line.zs, regionalX: regional.xs, regionalZ: regional.zs };
  if (typeof v.include === 'boolean') h.include = v.include;
  if (runs) h.projected = runs;
  return h;
}

function readPins(v: unknown, out: Problems): [number, number] | null {
  if (!Array.isArray(v) || v.length !== 2 || typeof v[0] !== 'number' || typeof v[1] !== 'number') {
    out.push({ code: 'bad-shape', message: 'Section: "pins" must be [xLeft, xRight], two numbers; add the two pin positions.' });
    return null;
  }
  const [l, r] = v as [number, number];
  if (!Number.isFinite(l) || !Number.isFinite(r)) {
    out.push({ code: 'not-finite', message: 'Section: a pin position is not a finite number; set both pins to real x values.' });
    return null;
  }
  if (l === r) out.push({ code: 'pins-invalid', message: `Section: both pins are at x = ${l}; move them apart, left pin first.` });
  else if (l > r) out.push({ code: 'pins-invalid', message: `Section: pins are reversed (${l} > ${r}); write them as [xLeft, xRight].` });
  return l < r ? [l, r] : null;
}

/** A validated horizon with its points as typed arrays (section units), the form the analysis reads. */
export interface HorizonArrays {
  name: string;
  include?: boolean;
  projected?: [number, number][];
  lineX: Float64Array;
  lineZ: Float64Array;
  regionalX: Float64Array;
  regionalZ: Float64Array;
}

/** A validated section whose points are typed arrays (same checks and problems as validateSection). */
export interface SectionArrays {
  units: LengthUnit;
  pins: [number, number];
  referenceElevation?: number;
  horizons: HorizonArrays[];
}

export type SectionArraysValidation = { ok: true; section: SectionArrays } | { ok: false; problems: SectionProblem[] };

/** The input as a Section (copied, normalised), or every structural problem found; never throws. */
export function validateSection(input: unknown): SectionValidation {
  const v = validateSectionArrays(input);
  if (!v.ok) return v;
  const s = v.section;
  const horizons = s.horizons.map((a): SectionHorizon => {
    const h: SectionHorizon = { name: a.name, line: toPoints(a.lineX, a.lineZ), regional: toPoints(a.regionalX, a.regionalZ) };
    if (a.include !== undefined) h.include = a.include;
    if (a.projected) h.projected = a.projected;
    return h;
  });
  const section: Section = { units: s.units, pins: s.pins, horizons };
  if (s.referenceElevation !== undefined) section.referenceElevation = s.referenceElevation;
  return { ok: true, section };
}

function toPoints(xs: Float64Array, zs: Float64Array): XZ[] {
  const out: XZ[] = new Array<XZ>(xs.length);
  for (let i = 0; i < xs.length; i++) out[i] = [xs[i], zs[i]];
  return out;
}

/** The input as a SectionArrays (points copied into typed arrays from `allocate`, default new ones), or every structural problem found; never throws. */
export function validateSectionArrays(input: unknown, allocate: Allocate = newArray): SectionArraysValidation {
  const out: Problems = [];
  if (!isObject(input)) {
    return { ok: false, problems: [{ code: 'bad-shape', message: 'The section must be a JSON object with "units", "pins" and "horizons".' }] };
  }
  const units = input.units;
  if (units !== 'm' && units !== 'ft') {
    out.push({ code: 'bad-units', message: `Section: "units" must be "m" or "ft" (got ${JSON.stringify(units) ?? 'nothing'}); convert the coordinates and set the units.` });
  }
  const pins = readPins(input.pins, out);
  const ref = input.referenceElevation;
  if (ref !== undefined && (typeof ref !== 'number' || !Number.isFinite(ref))) {
    out.push({ code: typeof ref === 'number' ? 'not-finite' : 'bad-shape', message: 'Section: "referenceElevation" must be a finite number; fix it or leave it out.' });
  }
  if (!Array.isArray(input.horizons)) {
    out.push({ code: 'bad-shape', message: 'Section: "horizons" must be an array of horizons; add it (it may be empty).' });
    return { ok: false, problems: out };
  }
  const horizons: HorizonArrays[] = [];
  const seen = new Set<string>();
  input.horizons.forEach((v, i) => {
    const h = readHorizon(v, i, out, allocate);
    const name = isObject(v) && typeof v.name === 'string' ? v.name : undefined;
    if (name !== undefined && name.trim() !== '') {
      if (seen.has(name)) out.push({ code: 'duplicate-name', horizon: name, message: `Horizon "${name}" appears more than once; rename one of them.` });
      seen.add(name);
    }
    if (h) horizons.push(h);
  });
  if (out.length > 0 || !pins) return { ok: false, problems: out };
  const section: SectionArrays = { units: units as LengthUnit, pins, horizons };
  if (typeof ref === 'number') section.referenceElevation = ref;
  return { ok: true, section };
}
