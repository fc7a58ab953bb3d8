import type { Section, SectionHorizon, XZ } from './section';
import type { SectionProblem } from './sectionProblem';
import { validateSectionArrays } from './validateSectionArrays';

// Structural validation of unknown JSON (a section file, the CLI's input, a pasted document)
// into a Section. Every problem is returned as data with a message that names the horizon and
// says how to fix it; nothing here throws. The checks live in validateSectionArrays (section
// level), readHorizon, readPoints and readProjectedRuns; this file gives them as plain points.
// Geometric checks (pins crossed once, self-crossing) need clipping and live in src/core/analysis.

export type { SectionProblem, SectionProblemCode } from './sectionProblem';
export type { Allocate } from './readPoints';
export type { HorizonArrays } from './readHorizon';
export { validateSectionArrays, type SectionArrays, type SectionArraysValidation } from './validateSectionArrays';

export type SectionValidation = { ok: true; section: Section } | { ok: false; problems: SectionProblem[] };

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
