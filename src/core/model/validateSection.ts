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

/** Points as XZ[] or null (problems pushed); `what` is e.g. 'line' or 'regional'. */
function readPoints(v: unknown, who: string, what: string, horizon: string | undefined, out: Problems): XZ[] | null {
  if (!Array.isArray(v)) {
    out.push({ code: 'bad-shape', horizon, message: `${who}: "${what}" must be an array of [x, z] points; add it.` });
    return null;
  }
  const points: XZ[] = [];
  for (let i = 0; i < v.length; i++) {
    const p = v[i];
    if (!Array.isArray(p) || p.length !== 2 || typeof p[0] !== 'number' || typeof p[1] !== 'number') {
      out.push({ code: 'bad-shape', horizon, message: `${who}: ${what} point ${i} is not an [x, z] pair of numbers; write it as [x, z].` });
      return null;
    }
    if (!Number.isFinite(p[0]) || !Number.isFinite(p[1])) {
      out.push({ code: 'not-finite', horizon, message: `${who}: ${what} point ${i} is not a finite number (NaN or Infinity); fix or delete that point.` });
      return null;
    }
    points.push([p[0], p[1]]);
  }
  if (points.length < 2) {
    out.push({ code: 'too-few-points', horizon, message: `${who}: ${what} has ${points.length} point${points.length === 1 ? '' : 's'}; digitise at least 2 points.` });
    return null;
  }
  return points;
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

function readHorizon(v: unknown, index: number, out: Problems): SectionHorizon | null {
  if (!isObject(v)) {
    out.push({ code: 'bad-shape', message: `Horizon #${index + 1} is not an object; write it as { "name", "line", "regional" }.` });
    return null;
  }
  const name = typeof v.name === 'string' && v.name.trim() !== '' ? v.name : undefined;
  const who = label(name, index);
  const before = out.length;
  if (name === undefined) out.push({ code: 'bad-shape', message: `${who} has no name; give it a non-empty "name".` });
  const line = readPoints(v.line, who, 'line', name, out);
  const regional = readPoints(v.regional, who, 'regional', name, out);
  if (v.include !== undefined && typeof v.include !== 'boolean') {
    out.push({ code: 'bad-shape', horizon: name, message: `${who}: "include" must be true or false.` });
  }
  const runs = v.projected !== undefined && line ? readRuns(v.projected, line.length, who, name, out) : undefined;
  if (out.length > before || !line || !regional || name === undefined) return null;
  const h: SectionHorizon = { name, line, regional };
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

/** The input as a Section (copied, normalised), or every structural problem found; never throws. */
export function validateSection(input: unknown): SectionValidation {
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
  const horizons: SectionHorizon[] = [];
  const seen = new Set<string>();
  input.horizons.forEach((v, i) => {
    const h = readHorizon(v, i, out);
    const name = isObject(v) && typeof v.name === 'string' ? v.name : undefined;
    if (name !== undefined && name.trim() !== '') {
      if (seen.has(name)) out.push({ code: 'duplicate-name', horizon: name, message: `Horizon "${name}" appears more than once; rename one of them.` });
      seen.add(name);
    }
    if (h) horizons.push(h);
  });
  if (out.length > 0 || !pins) return { ok: false, problems: out };
  const section: Section = { units: units as LengthUnit, pins, horizons };
  if (typeof ref === 'number') section.referenceElevation = ref;
  return { ok: true, section };
}
