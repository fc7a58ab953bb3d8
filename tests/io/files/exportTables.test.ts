// The section file for the command line: the active scenario as a Section, with the caution.
import { describe, expect, it } from 'vitest';
import { SECTION_CAUTION } from '../../../src/core/analysis/caution';
import { validateSection } from '../../../src/core/model/validateSection';
import { sectionFileText } from '../../../src/io/exportTables';
import { parseProjectText } from '../../../src/io/projectFile';
import { selectAnalysis } from '../../../src/state/selectors';
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
    expect(section).toEqual(JSON.parse(JSON.stringify(analysis.docSection.section)));
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
