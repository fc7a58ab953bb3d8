import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { SECTION_CAUTION } from '../../../src/core/analysis/caution';
import { resultsTsv } from '../../../src/panels/interpretation/resultsTsv';
import { summaryRows } from '../../../src/panels/interpretation/summaryRows';
import { methodExample } from '../../core/analysis/sections';

function analysis() {
  const out = analyseSection(methodExample());
  if (!out.ok) throw new Error('analysis failed');
  return out.analysis;
}

describe('resultsTsv(analysis, scenarioName)', () => {
  // the synthetic example of docs/method.md §Check values (our own): D = 1000 m, zd = 3000 m, W0 = 10 km, A = 2.5 … 1.0 km².
  const tsv = resultsTsv(analysis(), 'Base\tcase');
  const rows = tsv.split('\n').map((l) => l.split('\t'));

  it('has one row per horizon with the same number of cells as the header', () => {
    const header = rows.findIndex((r) => r[0] === 'Horizon');
    expect(rows[header]).toHaveLength(16);
    const body = rows.slice(header + 1, header + 5);
    expect(body.map((r) => r[0])).toEqual(['H1', 'H2', 'H3', 'H4']);
    for (const r of body) expect(r).toHaveLength(16);
    expect(body.map((r) => Number(r[2]))).toEqual([2.5e6, 2e6, 1.5e6, 1e6]);
    expect(body.map((r) => Number(r[4]))).toEqual([500, 1000, 1500, 2000]);
  });

  it('carries the summary with units and the caution, and keeps tabs out of names', () => {
    expect(rows[0]).toEqual(['Scenario', 'Base case']);
    const get = (label: string) => rows.find((r) => r[0] === label)!;
    expect(get('Displacement D').slice(1, 3)).toEqual(['1000', 'm']);
    expect(get('Detachment depth below reference').slice(1, 3)).toEqual(['3000', 'm']);
    // Plain numbers, as in the data files: an ASCII minus a spreadsheet reads as negative.
    expect(get('Detachment elevation').slice(1, 3)).toEqual(['-3000', 'm']);
    // Shortening D / (W0 + D) = 1000 / 11000 = 9.090909… %.
    expect(Number(get('Shortening D / (W0 + D)')[1])).toBeCloseTo(100 / 11, 8);
    expect(get('Shortening D / (W0 + D)')[2]).toBe('%');
    expect(rows[rows.length - 1]).toEqual(['Caution', SECTION_CAUTION]);
  });

  it('summaryRows reports an exact line as an exact fit with no interval, not as a zero-width one', () => {
    const d = summaryRows(analysis()).find((r) => r.key === 'detachment-depth')!;
    expect(d.interval).toBe('');
    expect(rows.find((r) => r[0] === 'r²')![5]).toBe('exact fit: no interval');
  });
});
