// The section file for the command line: the active scenario as a Section, with the caution.
import { describe, expect, it } from 'vitest';
import { SECTION_CAUTION } from '../../src/core/analysis/caution';
import { linePoints } from '../../src/core/model/section';
import { validateSection } from '../../src/core/model/validateSection';
import { sectionFileText } from '../../src/io/exportTables';
import { parseProjectText } from '../../src/io/projectFile';
import { analyseSection } from '../../src/core/analysis/analyseSection';
import { selectAnalysis } from '../../src/state/selectors';
import { sampleDoc } from './sampleDoc';

describe('sectionFileText', () => {
  it('carries the caution in a "caution" key that validateSection ignores', () => {
    const analysis = selectAnalysis(sampleDoc());
    const r = sectionFileText(analysis);
    expect(r.ok).toBe(true);
    if (!r.ok || !analysis.docSection.ok) return;
    const file = JSON.parse(r.text);
    expect(file.caution).toBe(SECTION_CAUTION);
    // The section read back with the caution is the one read back without it.
    const { caution: _caution, ...section } = file;
    const withCaution = validateSection(file);
    const without = validateSection(section);
    expect(withCaution.ok && without.ok).toBe(true);
    if (!withCaution.ok || !without.ok) return;
    expect(withCaution.section).toEqual(without.section);
    // The written section is the analysed one to the file resolution (1e-6 unit, cleanCoordinate).
    const src = analysis.docSection.section;
    expect(section.pins[0]).toBeCloseTo(src.pins[0], 6);
    expect(section.pins[1]).toBeCloseTo(src.pins[1], 6);
    src.horizons.forEach((h, i) => linePoints(h.line!).forEach((p, j) => {
      expect(section.horizons[i].line![j][0]).toBeCloseTo(p[0], 6);
      expect(section.horizons[i].line![j][1]).toBeCloseTo(p[1], 6);
    }));
  });

  it('writes no float noise: pins typed as 1000 stay 1000, tiny residues are 0, never -0', () => {
    const doc = sampleDoc();
    const analysis = selectAnalysis(doc);
    if (!analysis.docSection.ok) throw new Error('sample has no section');
    // A section as the calibration hands it over: tails from the affine arithmetic.
    const noisy = { ...analysis.docSection.section, pins: [-9.79e-13, 1000.0000000000001] as [number, number] };
    noisy.horizons = noisy.horizons.map((h) => ({ ...h, line: { xs: h.line!.xs.map((x) => x + 2.27e-13), zs: h.line!.zs.map((z) => (z === 0 ? -0 : z - 1e-12)) } }));
    const r = sectionFileText({ ...analysis, docSection: { ...analysis.docSection, section: noisy } });
    if (!r.ok) throw new Error(r.message);
    expect(r.text).not.toMatch(/\de-\d/);
    expect(r.text).not.toMatch(/\d{7,}/);
    expect(r.text).not.toMatch(/-0[,\s\]]/);
    const back = JSON.parse(r.text);
    expect(back.pins).toEqual([0, 1000]);
    expect(Object.is(back.pins[0], -0)).toBe(false);
    // The cleaned file analyses to the same detachment as the noisy section (to far below display precision).
    const a = analyseSection(noisy), b = analyseSection(back);
    expect(a.ok && b.ok).toBe(true);
    if (!a.ok || !b.ok) return;
    expect(b.analysis.areaDepth!.detachmentDepth!).toBeCloseTo(a.analysis.areaDepth!.detachmentDepth!, 4);
  });

  it('opens in the app again as a section file with the same horizons', () => {
    const r = sectionFileText(selectAnalysis(sampleDoc()));
    if (!r.ok) throw new Error(r.message);
    const opened = parseProjectText(r.text, 'fold-section.json');
    expect(opened.ok && opened.kind).toBe('section');
    expect(opened.ok && opened.doc.horizons.map((h) => h.name)).toEqual(sampleDoc().horizons.map((h) => h.name));
  });

  it('says what is missing when there is no section yet', () => {
    const doc = { ...sampleDoc(), calibration: null };
    const r = sectionFileText(selectAnalysis(doc));
    expect(r.ok).toBe(false);
  });
});
