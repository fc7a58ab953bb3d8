import { describe, expect, it } from 'vitest';
import { validateSection } from '../../../src/core/model/validateSection';

// The section file's faults and horizons in pieces: every bad input gets one problem that names the
// horizon or the fault and says how to fix it (the file format is documented in src/io/README-formats.md).

const fault = { name: 'F1', line: [[3, -1], [7, 3]] };
/** A Z-shaped thrust repeat: hanging-wall piece ending up the fault at (6, 2), footwall piece from (4, 0). */
const zHorizon = () => ({ name: 'A', pieces: [[[-1, 1], [4, 2], [6, 2]], [[4, 0], [11, 0]]], regional: [[-1, 0], [11, 0]] });
const section = (over: Record<string, unknown> = {}, horizon: Record<string, unknown> = {}) => ({
  units: 'm', pins: [0, 10], faults: [fault], horizons: [{ ...zHorizon(), ...horizon }], ...over,
});

function problems(input: unknown) {
  const v = validateSection(input);
  expect(v.ok).toBe(false);
  return v.ok ? [] : v.problems;
}

describe('validateSection with faults and pieces', () => {
  it('reads faults and pieces back as given (JSON round trip)', () => {
    const v = validateSection(JSON.parse(JSON.stringify(section({}, { projected: [[0, 1]], joinFaults: ['F1'] }))));
    expect(v.ok).toBe(true);
    if (!v.ok) return;
    expect(v.section.faults).toEqual([fault]);
    expect(v.section.horizons[0].pieces).toEqual(zHorizon().pieces);
    expect(v.section.horizons[0].line).toBeUndefined();
    expect(v.section.horizons[0].projected).toEqual([[0, 1]]);
    expect(v.section.horizons[0].joinFaults).toEqual(['F1']);
  });

  it('accepts a piece end within 1e-6 × the pin width of the fault and refuses one just beyond', () => {
    // Pin width 10: tolerance 1e-5. The fault is z = x − 4; move the footwall cutoff off it perpendicularly.
    const off = (d: number) => [[[-1, 1], [4, 2], [6, 2]], [[4 + d / Math.SQRT2, -d / Math.SQRT2], [11, 0]]];
    expect(validateSection(section({}, { pieces: off(0.9e-5) })).ok).toBe(true);
    const p = problems(section({}, { pieces: off(1.1e-5) }));
    expect(p.map((q) => q.code)).toEqual(['not-on-fault']);
    expect(p[0].horizon).toBe('A');
    expect(p[0].message).toContain('Horizon "A"');
    expect(p[0].message).toContain('piece 1');
  });

  it('names the horizon that has both "line" and "pieces"', () => {
    const p = problems(section({}, { line: [[0, 0], [10, 0]] }));
    expect(p).toHaveLength(1);
    expect(p[0].message).toMatch(/^Horizon "A" has both "line" and "pieces"/);
  });

  it('names the horizon and the piece with fewer than two points', () => {
    const p = problems(section({}, { pieces: [[[-1, 1], [4, 2], [6, 2]], [[4, 0]]] }));
    expect(p.map((q) => q.code)).toEqual(['too-few-points']);
    expect(p[0].message).toBe('Horizon "A": piece 2 has 1 point; digitise at least 2 points.');
  });

  it('names the horizon whose consecutive pieces do not end on one common fault', () => {
    // Two faults, each holding one of the two ends only.
    const other = { name: 'F2', line: [[5, 5], [7, 1]] };
    const p = problems(section({ faults: [{ name: 'F1', line: [[3, -1], [5, 1]] }, other] }));
    expect(p.map((q) => q.code)).toEqual(['not-on-fault']);
    expect(p[0].message).toContain('do not both lie on one common fault');
  });

  it('names a fault with fewer than two points, and one that crosses itself', () => {
    const short = problems(section({ faults: [fault, { name: 'F2', line: [[1, 1]] }] }));
    expect(short.map((q) => [q.code, q.fault])).toEqual([['too-few-points', 'F2']]);
    expect(short[0].message).toBe('Fault "F2": line has 1 point; digitise at least 2 points.');
    const bow = problems(section({ faults: [fault, { name: 'F3', line: [[0, 0], [2, 2], [2, 0], [0, 2]] }] }));
    expect(bow.map((q) => [q.code, q.fault])).toEqual([['self-intersecting', 'F3']]);
    expect(bow[0].message).toMatch(/^Fault "F3": the line crosses itself \(segments 0–1 and 2–3\)/);
  });

  it('names a duplicate fault name and a join that names an unknown fault', () => {
    const dup = problems(section({ faults: [fault, fault] }));
    expect(dup.map((q) => q.code)).toEqual(['duplicate-name']);
    expect(dup[0].message).toBe('Fault "F1" appears more than once; rename one of them.');
    const unknown = problems(section({}, { joinFaults: ['F9'] }));
    expect(unknown.map((q) => q.code)).toEqual(['unknown-fault']);
    expect(unknown[0].message).toContain('names fault "F9", which the section does not have');
  });

  it('names a fault without a name by its position', () => {
    const p = problems(section({ faults: [{ line: [[0, 0], [1, 1]] }] }));
    expect(p[0].message).toBe('Fault #1 has no name; give it a non-empty "name".');
  });

  it('refuses a projected run that spans the cut between two pieces (indices count along the pieces)', () => {
    // Pieces of 3 and 2 points: vertices 0–2 and 3–4; [2, 3] would run across the fault.
    expect(validateSection(section({}, { projected: [[3, 4]] })).ok).toBe(true);
    const p = problems(section({}, { projected: [[2, 3]] }));
    expect(p.map((q) => q.code)).toEqual(['bad-projected-run']);
    expect(p[0].message).toContain('must lie within one piece');
  });
});
