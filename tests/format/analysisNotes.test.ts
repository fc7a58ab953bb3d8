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

  it('writes a projected stretch\'s share and length by the one number rule in every view', () => {
    // Analytic: a box fold whose crest (40 m of the 100 m pin width, vertices 2..3) is projected carries
    // 100·40 = 4000 of the 5000 m² excess area, a share of 80 %.
    const box: Section = { units: 'm', pins: [0, 100], horizons: [
      { name: 'Eroded', line: [[0, 0], [20, 0], [30, 100], [70, 100], [80, 0], [100, 0]], regional: [[0, 0], [100, 0]], projected: [[2, 3]] },
      { name: 'Lower', line: [[0, -200], [40, -200], [50, -150], [60, -200], [100, -200]], regional: [[0, -200], [100, -200]] },
    ] };
    const doc = sectionToProjectDoc(box);
    const da = selectAnalysis(doc);
    if (!da.outcome?.ok) throw new Error('no analysis');
    const a = da.outcome.analysis;
    const said = 'Horizon "Eroded": 80 % of its excess area and 40 m of its bed length are projected (interpreted); treat its values as projected, not measured.';
    expect(analysisNotes(a)).toContain(said);
    expect(diagnostics(da.docSection, da.outcome).map((d) => d.text)).toContain(said);
    expect(resultsCsv(doc, da)!).toContain(`# note,"${said.replace(/"/g, '""')}"`);
    expect(formatTable(a, null)).toContain(`  - ${said}`);
    expect(toJsonReport(a).notes).toContain(said);
  });
});
