import type { LengthUnit } from './section';
import { readFault, type FaultArrays } from './readFault';
import { readHorizon, type HorizonArrays, type JoinContext } from './readHorizon';
import type { Allocate } from './readPoints';
import { coordinateProblem, extentProblem, LIMITS, nameLengthProblem, tooManyMessage } from './limits';
import type { SectionProblem } from './sectionProblem';
import { formatSmallNumber } from './numberText';

// The section-level checks of a section file (units, pins, reference elevation, the horizon
// list, unique names); each horizon is read by readHorizon. Geometric checks (pins crossed once,
// self-crossing) need clipping and live in src/core/analysis.

/** A validated section whose points are typed arrays (same checks and problems as validateSection). */
export interface SectionArrays {
  units: LengthUnit;
  pins: [number, number];
  referenceElevation?: number;
  /** The digitising resolution the file states (units, positive), if it states one. */
  resolution?: number;
  horizons: HorizonArrays[];
  /** The faults as given (empty when the file has none). */
  faults: FaultArrays[];
}

/** How near a piece end must be to a fault to lie on it, as a fraction of the pin width (the app snaps ends onto faults, so its files are exact). */
export const ON_FAULT_TOLERANCE = 1e-6;

export type SectionArraysValidation = { ok: true; section: SectionArrays } | { ok: false; problems: SectionProblem[] };

const newArray: Allocate = (n) => new Float64Array(n);

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function readPins(v: unknown, out: SectionProblem[]): [number, number] | null {
  if (!Array.isArray(v) || v.length !== 2 || typeof v[0] !== 'number' || typeof v[1] !== 'number') {
    out.push({ code: 'bad-shape', message: 'Section: "pins" must be [xLeft, xRight], two numbers; add the two pin positions.' });
    return null;
  }
  const [l, r] = v as [number, number];
  if (!Number.isFinite(l) || !Number.isFinite(r)) {
    out.push({ code: 'not-finite', message: 'Section: a pin position is not a finite number; set both pins to real x values.' });
    return null;
  }
  const far = coordinateProblem(l) ?? coordinateProblem(r);
  if (far) {
    out.push({ code: 'out-of-range', message: `Section: a pin position: ${far}.` });
    return null;
  }
  const small = extentProblem(Math.abs(r - l));
  if (small) {
    out.push({ code: 'out-of-range', message: `Section: ${small}; the pins are ${formatSmallNumber(Math.abs(r - l), 3)} units apart. Give the coordinates in larger units.` });
    return null;
  }
  if (l === r) out.push({ code: 'pins-invalid', message: `Section: both pins are at x = ${l}; move them apart, left pin first.` });
  else if (l > r) out.push({ code: 'pins-invalid', message: `Section: pins are reversed (${l} > ${r}); write them as [xLeft, xRight].` });
  return l < r ? [l, r] : null;
}

/** The input as a SectionArrays (points copied into typed arrays from `allocate`, default new ones), or every structural problem found; never throws. */
export function validateSectionArrays(input: unknown, allocate: Allocate = newArray): SectionArraysValidation {
  const out: SectionProblem[] = [];
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
  const resolution = input.resolution;
  if (resolution !== undefined && (typeof resolution !== 'number' || !Number.isFinite(resolution) || resolution <= 0)) {
    out.push({ code: typeof resolution === 'number' && !Number.isFinite(resolution) ? 'not-finite' : 'bad-shape', message: 'Section: "resolution" must be a positive number, the smallest length the digitising resolves in the section\'s units; fix it or leave it out.' });
  }
  if (!Array.isArray(input.horizons)) {
    out.push({ code: 'bad-shape', message: 'Section: "horizons" must be an array of horizons; add it (it may be empty).' });
    return { ok: false, problems: out };
  }
  if (input.horizons.length > LIMITS.horizons) {
    out.push({ code: 'too-large', message: `Section: ${tooManyMessage('horizons', input.horizons.length, LIMITS.horizons)}; split the section into several files.` });
    return { ok: false, problems: out };
  }
  const faults = readFaults(input.faults, out, allocate);
  const join: JoinContext | null = pins && faults ? { faults, tolerance: ON_FAULT_TOLERANCE * (pins[1] - pins[0]) } : null;
  const horizons: HorizonArrays[] = [];
  const seen = new Set<string>();
  input.horizons.forEach((v, i) => {
    const h = readHorizon(v, i, out, allocate, join);
    const name = isObject(v) && typeof v.name === 'string' ? v.name : undefined;
    const long = name === undefined ? null : nameLengthProblem(name, 'horizon name');
    if (long) out.push({ code: 'too-large', horizon: name!.slice(0, 60), message: `Horizon #${i + 1}: ${long}; shorten it.` });
    if (name !== undefined && name.trim() !== '') {
      if (seen.has(name)) out.push({ code: 'duplicate-name', horizon: name, message: `Horizon "${name}" appears more than once; rename one of them.` });
      seen.add(name);
    }
    if (h) horizons.push(h);
  });
  let total = 0;
  for (const h of horizons) total += h.lineX.length + h.regionalX.length;
  if (total > LIMITS.totalPoints) out.push({ code: 'too-large', message: `Section: ${tooManyMessage('vertices', total, LIMITS.totalPoints)}; simplify the lines or split the section.` });
  if (out.length > 0 || !pins || !faults) return { ok: false, problems: out };
  const section: SectionArrays = { units: units as LengthUnit, pins, horizons, faults };
  if (typeof ref === 'number') section.referenceElevation = ref;
  if (typeof resolution === 'number') section.resolution = resolution;
  return { ok: true, section };
}

/** The faults list (absent: none), or null with every problem pushed (bad faults, duplicate names). */
function readFaults(v: unknown, out: SectionProblem[], allocate: Allocate): FaultArrays[] | null {
  if (v === undefined) return [];
  if (!Array.isArray(v)) {
    out.push({ code: 'bad-shape', message: 'Section: "faults" must be an array of faults, each { "name", "line" }; fix it or leave it out.' });
    return null;
  }
  const before = out.length;
  const faults: FaultArrays[] = [];
  const seen = new Set<string>();
  v.forEach((f, i) => {
    const got = readFault(f, i, out, allocate);
    const name = isObject(f) && typeof f.name === 'string' ? f.name : undefined;
    if (name !== undefined && name.trim() !== '') {
      if (seen.has(name)) out.push({ code: 'duplicate-name', fault: name, message: `Fault "${name}" appears more than once; rename one of them.` });
      seen.add(name);
    }
    if (got) faults.push(got);
  });
  return out.length > before ? null : faults;
}
