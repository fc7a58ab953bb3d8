// The pane's plain-word diagnostics name a horizon left out for its own problem, with the reason.
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { diagnostics } from '../../../src/panels/interpretation/diagnostics';
import { lineArrays, type FlatSection } from '../../../src/core/model/section';
import { methodExample } from '../../core/analysis/sections';

describe('diagnostics(docSection, outcome, leftOut)', () => {
  it('lists each left-out horizon as "left out: <name> — <reason>"', () => {
    const section = methodExample();
    const fit = null as never;
    // As the app hands it over (docToSection): the lines as coordinate arrays.
    const flat: FlatSection = { ...section, horizons: section.horizons.map(({ line, pieces: _pieces, ...h }) => ({ ...h, line: lineArrays(line) })), faults: [] };
    const docSection = { ok: true as const, section: flat, fit, horizonIds: ['a', 'b', 'c', 'd'], skipped: [], skippedFaults: [] };
    const out = diagnostics(docSection, analyseSection(section), [{ id: 'e', name: 'Top E', reason: 'the regional does not reach the right pin (x = 10000); extend it across the pin or move the pin.' }]);
    expect(out.map((d) => d.text)).toContain('left out: Top E — the regional does not reach the right pin (x = 10000); extend it across the pin or move the pin.');
    expect(out.find((d) => d.text.startsWith('left out'))!.level).toBe('warning');
  });
});
