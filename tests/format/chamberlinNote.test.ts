// The note beside the Chamberlin column, on sections whose numbers are analytic.
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../src/core/analysis/analyseSection';
import type { Section } from '../../src/core/model/section';
import { chamberlinNote } from '../../src/format/chamberlinNote';

/** Three triangular anticlines 1000 wide, 400, 350 and 300 high above regionals at z = 500, 250 and 0. */
const TRIANGLES: Section = {
  units: 'm',
  pins: [0, 1000],
  horizons: [
    { name: 'Upper', line: [[-100, 500], [0, 500], [500, 900], [1000, 500], [1100, 500]], regional: [[-100, 500], [1100, 500]] },
    { name: 'Middle', line: [[-100, 250], [0, 250], [500, 600], [1000, 250], [1100, 250]], regional: [[-100, 250], [1100, 250]] },
    { name: 'Lower', line: [[-100, 0], [0, 0], [500, 300], [1000, 0], [1100, 0]], regional: [[-100, 0], [1100, 0]] },
  ],
};

describe('chamberlinNote', () => {
  it('says bed length was not conserved, and how far the depths are off, when the difference is large', () => {
    const r = analyseSection(TRIANGLES);
    if (!r.ok) throw new Error('analysis failed');
    // Analytic: A = 100 (2000 − h), so D = 100 m and the detachment is at −1500 m. The upper bed is
    // 2·√(500² + 400²) = 1280.6 m long: Chamberlin H = 200 000 / 280.6 = 712.7 m against a height of
    // 2000 m (ratio 0.356); the lower bed, 2·√(500² + 300²) = 1166.2 m: H = 150 000 / 166.2 = 902.5 m
    // against 1500 m (0.60). Strain of the upper bed 1280.6 / 1100 − 1 = +16.4 %.
    const note = chamberlinNote(r.analysis)!;
    expect(note.large).toBe(true);
    expect(note.text).toContain('assumes bed length is conserved');
    expect(note.text).toContain('The layer-parallel strain column shows it was not');
    expect(note.text).toContain('up to 16 % longer along the layer');
    expect(note.text).toContain('down to 0.36 of the heights above the area–depth detachment');
  });

  it('says the assumption cannot be checked without an area–depth detachment', () => {
    // Three equal box folds (1000 wide, 100 high, limbs 10 m wide): equal areas at every depth (analytic).
    const box = (z: number, hgt: number) => ({ name: `H${z}`, line: [[0, z], [10, z + hgt], [990, z + hgt], [1000, z]] as [number, number][], regional: [[0, z], [1000, z]] as [number, number][] });
    const r = analyseSection({ units: 'm', pins: [0, 1000], horizons: [box(300, 100), box(200, 100), box(100, 100)] });
    if (!r.ok) throw new Error('analysis failed');
    // Equal areas at every depth: no detachment below, so the assumption cannot be checked.
    const note = chamberlinNote(r.analysis)!;
    expect(note.large).toBe(false);
    expect(note.text).toContain('cannot be checked');
  });

  it('gives nothing when no horizon has a Chamberlin depth', () => {
    const flat: Section = { units: 'm', pins: [0, 1000], horizons: [{ name: 'F', line: [[0, 0], [1000, 0]], regional: [[0, 0], [1000, 0]] }] };
    const r = analyseSection(flat);
    if (!r.ok) throw new Error('analysis failed');
    expect(chamberlinNote(r.analysis)).toBeNull();
  });
});
