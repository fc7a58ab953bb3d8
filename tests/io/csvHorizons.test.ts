import { describe, expect, it } from 'vitest';
import { parseHorizonsCsv, writeHorizonsCsv } from '../../src/io/csvHorizons';
import { parseCsvRows } from '../../src/io/csvText';
import { SECTION_CAUTION } from '../../src/core/analysis/caution';

describe('parseHorizonsCsv', () => {
  it('reads one row per vertex, grouped by horizon name in file order, with units from the header', () => {
    const r = parseHorizonsCsv('horizon,x_m,z_m\nTop,0,10\nTop,5,12\nBase,0,-3\nTop,9,11\nBase,9,-4\n');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.units).toBe('m');
    expect(r.horizons).toEqual([
      { name: 'Top', line: [[0, 10], [5, 12], [9, 11]] },
      { name: 'Base', line: [[0, -3], [9, -4]] },
    ]);
  });

  it('takes the units from a "# units:" line or "x (ft)" columns, and none when not stated', () => {
    expect(parseHorizonsCsv('# units: ft\nname,x,z\nA,0,0\nA,1,1').ok && parseHorizonsCsv('# units: ft\nname,x,z\nA,0,0\nA,1,1')).toMatchObject({ units: 'ft' });
    expect(parseHorizonsCsv('name,x (ft),z (ft)\nA,0,0\nA,1,1')).toMatchObject({ units: 'ft' });
    expect(parseHorizonsCsv('name,x,z\nA,0,0\nA,1,1')).toMatchObject({ ok: true, units: null });
    expect(parseHorizonsCsv('name,x_m,z_ft\nA,0,0\nA,1,1').ok).toBe(false);
  });

  it('lists each bad row by line number and keeps the good ones', () => {
    const r = parseHorizonsCsv('horizon,x,z\nA,0,0\nA,abc,1\n,2,2\nA,3,1e999\nA,4,4\r\nB,1,1\n');
    expect(r.ok).toBe(true);
    expect(r.problems.map((p) => p.where)).toEqual(['line 3', 'line 4', 'line 5', 'horizon "B"']);
    expect(r.ok && r.horizons).toEqual([{ name: 'A', line: [[0, 0], [4, 4]] }]);
  });

  it('refuses a file without the needed columns', () => {
    const r = parseHorizonsCsv('a,b,c\n1,2,3');
    expect(!r.ok && r.message).toMatch(/horizon \(or name\), x and z/);
  });

  it('round-trips names with commas, quotes and line breaks', () => {
    const horizons = [{ name: 'Sand, "upper"\nunit', line: [[0.1, -2.5], [1e6, 3]] as [number, number][] }, { name: 'Plain', line: [[1, 2], [3, 4]] as [number, number][] }];
    const r = parseHorizonsCsv(writeHorizonsCsv(horizons, 'ft'));
    expect(r.ok && r.units).toBe('ft');
    expect(r.ok && r.horizons).toEqual(horizons);
  });

  it('defuses names that a spreadsheet would run as a formula', () => {
    const text = writeHorizonsCsv([{ name: '=HYPERLINK("x")', line: [[0, 0], [1, 1]] }], 'm');
    // Row 0 is the caution line, row 1 the header.
    expect(parseCsvRows(text)[2][0]).toBe('\'=HYPERLINK("x")');
  });

  it('writeHorizonsCsv starts with a "# caution:" comment line holding the whole caution, which the parser skips', () => {
    const horizons = [{ name: 'Top', line: [[0, 1], [2, 3]] as [number, number][] }];
    const text = writeHorizonsCsv(horizons, 'm');
    const first = text.split('\r\n')[0];
    expect(first).toBe(`# caution: ${SECTION_CAUTION}`);
    expect(text.split('\r\n')[1]).toBe('horizon,x_m,z_m');
    const r = parseHorizonsCsv(text);
    expect(r.ok && r.horizons).toEqual(horizons);
    expect(r.ok && r.units).toBe('m');
    expect(r.problems).toEqual([]);
    // The caution line is prose: with no unit in the header, the parser must not find one in it.
    expect(parseHorizonsCsv(`${first}\r\nname,x,z\r\nA,0,0\r\nA,1,1\r\n`)).toMatchObject({ ok: true, units: null });
  });
});
