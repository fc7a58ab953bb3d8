import type { Section, SectionFault, SectionHorizon, XZ } from './section';
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
export { validateSectionArrays, ON_FAULT_TOLERANCE, type SectionArrays, type SectionArraysValidation } from './validateSectionArrays';

export type SectionValidation = { ok: true; section: Section } | { ok: false; problems: SectionProblem[] };

/** The input as a Section (copied, normalised), or every structural problem found; never throws. */
export function validateSection(input: unknown): SectionValidation {
  const v = validateSectionArrays(input);
  if (!v.ok) return v;
  const s = v.section;
  const horizons = s.horizons.map((a): SectionHorizon => {
    const h: SectionHorizon = a.pieces
      ? { name: a.name, pieces: a.pieces.map((p) => toPoints(p.xs, p.zs)), regional: toPoints(a.regionalX, a.regionalZ) }
      : { name: a.name, line: toPoints(a.lineX, a.lineZ), regional: toPoints(a.regionalX, a.regionalZ) };
    if (a.joinFaults) h.joinFaults = a.joinFaults;
    if (a.include !== undefined) h.include = a.include;
    const runs = a.pieces ? a.pieceProjected : a.projected;
    if (runs) h.projected = runs;
    return h;
  });
  const section: Section = { units: s.units, pins: s.pins, horizons };
  if (s.faults.length > 0) section.faults = s.faults.map((f): SectionFault => ({ name: f.name, line: toPoints(f.xs, f.zs) }));
  if (s.referenceElevation !== undefined) section.referenceElevation = s.referenceElevation;
  if (s.resolution !== undefined) section.resolution = s.resolution;
  return { ok: true, section };
}

function toPoints(xs: Float64Array, zs: Float64Array): XZ[] {
  const out: XZ[] = new Array<XZ>(xs.length);
  for (let i = 0; i < xs.length; i++) out[i] = [xs[i], zs[i]];
  return out;
}
