// The Chamberlin reason is data in the engine and words in one place (src/format/chamberlinReasonText.ts,
// numbers by formatQuantity.ts): the pane's diagnostics, the results CSV, the terminal table and the command
// line's JSON show the same note. Check value: a triangle fold of base 1000 m and height 22 m over a flat
// regional has L − W = 2·√(500² + 22²) − 1000 = 0.9675 m (plane geometry), below the 1 m resolution of a
// 10 km section that states none (docs/method.md §Digitising resolution).
import { describe, expect, it } from 'vitest';
import { formatTable } from '../../src/cli/formatTable';
import { toJsonReport } from '../../src/cli/toJsonReport';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import type { Section } from '../../src/core/model/section';
import { analysisNotes } from '../../src/format/analysisNotes';
import { resultsCsv } from '../../src/io/exportTables';
import { diagnostics } from '../../src/panels/interpretation/diagnostics';
import { selectAnalysis } from '../../src/state/selectors';

const fold = (name: string, z0: number, h: number) => ({
  name, line: [[-100, z0], [4500, z0], [5000, z0 + h], [5500, z0], [10_100, z0]] as [number, number][], regional: [[-100, z0], [10_100, z0]] as [number, number][],
});
const section: Section = { units: 'm', pins: [0, 10_000], horizons: [fold('Gentle', 0, 22), fold('Also gentle', -1000, 22), fold('Steep', -2000, 300)] };
const NOTE = 'No Chamberlin depth for "Gentle", "Also gentle": not meaningful: the bed is only 0.97 m longer than its regional, less than the 1 m the digitising resolves.';

describe('analysisNotes', () => {
  it('names the horizons sharing one reason once, its lengths written by the one number rule', () => {
    const doc = sectionToProjectDoc(section);
    const da = selectAnalysis(doc);
    if (!da.outcome?.ok) throw new Error('no analysis');
    const a = da.outcome.analysis;
    expect(analysisNotes(a).filter((n) => n.startsWith('No Chamberlin depth'))).toEqual([NOTE]);
    expect(diagnostics(da.docSection, da.outcome).map((d) => d.text)).toContain(NOTE);
    expect(resultsCsv(doc, da)!).toContain(`# note,"${NOTE.replace(/"/g, '""')}"`);
    expect(formatTable(a, null)).toContain(`  - ${NOTE}`);
    expect(toJsonReport(a).notes).toContain(NOTE);
    // The engine's own notes carry no Chamberlin words: the reason is data on the horizon.
    expect(a.notes.some((n) => n.includes('Chamberlin'))).toBe(false);
    expect(a.horizons[0].chamberlinReason?.kind).toBe('not-meaningful');
  });
});
