import type { LengthUnit } from './section';
import { readHorizon, type HorizonArrays } from './readHorizon';
import type { Allocate } from './readPoints';
import type { SectionProblem } from './sectionProblem';

// The section-level checks of a section file (units, pins, reference elevation, the horizon
// list, unique names); each horizon is read by readHorizon. Geometric checks (pins crossed once,
// self-crossing) need clipping and live in src/core/analysis.

/** A validated section whose points are typed arrays (same checks and problems as validateSection). */
export interface SectionArrays {
  units: LengthUnit;
  pins: [number, number];
  referenceElevation?: number;
  horizons: HorizonArrays[];
}

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
