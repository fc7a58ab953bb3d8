import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../src/core/analysis/analyseSection';
import { faultedSection } from '../../src/core/forward/faultedSection';
import type { XZ } from '../../src/core/model/section';
import { formatTable } from '../../src/cli/formatTable';
import { toJsonReport } from '../../src/cli/toJsonReport';
import { columnHeader, columnsOf, csvHeader, HORIZON_COLUMNS, tableAreaUnit, type HorizonColumn } from '../../src/format/horizonColumns';
import { MINUS, plainNumber } from '../../src/format/formatQuantity';
import { parseCsvRows } from '../../src/io/csvText';
import { resultsCsv } from '../../src/io/exportTables';
import type { DocAnalysis } from '../../src/core/analysis/analyseDocSection';
import { emptyProjectDoc } from '../../src/core/model/projectDoc';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import { useDocStore } from '../../src/state/docStore';
import { HorizonTable } from '../../src/panels/interpretation/HorizonTable';
import { resultsTsv } from '../../src/panels/interpretation/resultsTsv';
import { ReportHorizonTable } from '../../src/panels/files/ReportHorizonTable';
import { expectClose } from '../expectClose';

// One faulted section read through all six per-horizon tables. The section is the faulted forward model
// (vertical simple shear, Gibbs 1983; src/core/forward/faultedSection.ts): a thrust carrying the hanging
// wall D = 1500 m over a ramp, so every horizon is in two pieces with one cutoff pair of heave D.
const fault: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];
const { section } = faultedSection({
  units: 'm', pins: [0, 20000], displacement: 1500, fault, faultName: 'Main thrust',
  horizons: [500, -500, -1500, -2500].map((r, i) => ({ name: `L${i}`, regionalElevation: r })),
});
const out = analyseSection(section);
if (!out.ok) throw new Error(out.problems[0].message);
const a: SectionAnalysis = out.analysis;
const area = tableAreaUnit(a);

interface Table { keys: string[]; rows: string[][] }

function byHeader(headers: string[], label: (c: HorizonColumn) => string): string[] {
  return headers.map((t) => {
    const c = HORIZON_COLUMNS.find((k) => label(k) === t);
    if (!c) throw new Error(`no column has the header "${t}"`);
    return c.key;
  });
}

function cellsOf(html: string, tag: 'th' | 'td'): string[] {
  return [...html.matchAll(new RegExp(`<${tag}[^>]*>(.*?)</${tag}>`, 'g'))].map((m) => m[1].replace(/<[^>]+>/g, '').replace(/&amp;/g, '&'));
}

function htmlTable(html: string, label: (c: HorizonColumn) => string): Table {
  const head = html.slice(0, html.indexOf('</thead>'));
  const body = html.slice(html.indexOf('<tbody>'));
  const rows = body.split('</tr>').filter((r) => r.includes('<td')).map((r) => cellsOf(r, 'td'));
  return { keys: byHeader(cellsOf(head, 'th'), label), rows };
}

function pane(): Table & { checked: boolean[] } {
  // The pane's numbers are live texts read from the open document (panels/liveText.tsx): the section, opened as the app opens it.
  const doc = sectionToProjectDoc(section);
  useDocStore.setState({ doc, gestureStart: null });
  const html = renderToStaticMarkup(
    <HorizonTable analysis={a} horizonIds={doc.horizons.map((h) => h.id)} flagged={new Set()} onToggle={() => {}} initialAll />,
  );
  const table = html.slice(html.indexOf('data-testid="horizon-table"'), html.indexOf('</table>'));
  // The pane's name cell is "Horizon (in fit)" with the box; a header note sits in a span after the label.
  const t = htmlTable(table, (c) => (c.key === 'name' ? 'Horizon (in fit)' : `${columnHeader(c, a.units, area, true)}${c.note?.short ?? ''}`));
  return { ...t, checked: table.split('</tr>').filter((r) => r.includes('<td')).map((r) => /checked=""/.test(r)) };
}

function report(): Table {
  const html = renderToStaticMarkup(<ReportHorizonTable analysis={a} />);
  return htmlTable(html, (c) => `${columnHeader(c, a.units, area)}${c.note ? ` (${c.note.long})` : ''}`);
}

function clipboard(): Table {
  const lines = resultsTsv(a, 'Base').split('\n').map((l) => l.split('\t'));
  const h = lines.findIndex((l) => l[0] === 'Horizon');
  return { keys: byHeader(lines[h], (c) => columnHeader(c, a.units, null)), rows: lines.slice(h + 1, h + 1 + a.horizons.length) };
}

function csv(): Table {
  const doc = emptyProjectDoc();
  const da = { outcome: out, docSection: { ok: true, section }, leftOut: [] } as unknown as DocAnalysis;
  const rows = parseCsvRows(resultsCsv(doc, da)!);
  const h = rows.findIndex((r) => r[0] === 'name');
  return { keys: byHeader(rows[h], (c) => csvHeader(c, a.units)), rows: rows.slice(h + 1, h + 1 + a.horizons.length) };
}

function terminal(): Table {
  const lines = formatTable(a).split('\n');
  const h = lines.findIndex((l) => l.startsWith('Horizon '));
  const split = (l: string) => l.trim().split(/ {2,}/);
  return { keys: byHeader(split(lines[h]), (c) => columnHeader(c, a.units, area)), rows: lines.slice(h + 2, h + 2 + a.horizons.length).map(split) };
}

const json = toJsonReport(a);

/** A number as a screen table writes it, back to section units (areas in units², shares as fractions). */
function screenNumber(text: string, c: HorizonColumn): number {
  const v = Number(text.replace(MINUS, '-'));
  return c.unit === 'area' ? v / area.factor : c.unit === 'share' ? v / 100 : v;
}

describe('the per-horizon columns (src/format/horizonColumns.ts) in all six tables', () => {
  const tables = { pane: pane(), report: report(), terminal: terminal(), clipboard: clipboard(), csv: csv() };
  // Every table, written out: a table that drops, adds or reorders a column fails here.
  const all = ['name', 'included', 'excessArea', 'regionalElevation', 'depth', 'chamberlinDepth', 'lpsStrain', 'pieces',
    'bedLength', 'regionalLength', 'projectedAreaShare', 'residual', 'fault', 'slip', 'heave', 'throw'];

  it('every table has the same columns in the same order (the pane ticks "in fit" in the name cell; the JSON adds the cutoff points)', () => {
    for (const t of ['report', 'terminal', 'clipboard', 'csv'] as const) expect(tables[t].keys, t).toEqual(all);
    expect(tables.pane.keys).toEqual(all.filter((k) => k !== 'included'));
    const horizonKeys = Object.keys(json.horizons[0]);
    expect(horizonKeys).toEqual([...all.filter((k) => !['fault', 'slip', 'heave', 'throw'].includes(k)), 'cutoffs']);
    expect(Object.keys(json.horizons[0].cutoffs[0])).toEqual(['fault', 'from', 'to', 'slip', 'heave', 'throw']);
  });

  it('the pane hides the expanded columns until "All columns", keeping the others in order', () => {
    expect(columnsOf('pane', false).map((c) => c.key)).toEqual(['name', 'excessArea', 'regionalElevation', 'depth', 'chamberlinDepth', 'lpsStrain']);
  });

  it('every table has the same numbers: screen tables the same text, data tables the same plain numbers, each the other to four figures', () => {
    const screen = ['pane', 'report', 'terminal'] as const;
    const data = ['clipboard', 'csv'] as const;
    const cols = columnsOf('clipboard');
    for (let i = 0; i < a.horizons.length; i++) {
      const row = (t: keyof typeof tables) => {
        const r = [...tables[t].rows[i]];
        if (t === 'pane') r.splice(1, 0, tables.pane.checked[i] ? 'yes' : 'no');
        return r;
      };
      for (const t of screen) expect(row(t), `${t} row ${i}`).toEqual(row('pane'));
      for (const t of data) expect(row(t), `${t} row ${i}`).toEqual(row('clipboard'));
      const jh = json.horizons[i];
      cols.forEach((c, k) => {
        const shown = row('pane')[k];
        const plain = row('clipboard')[k];
        // The JSON's value written as the data files write it: plain numbers (plainNumber), yes/no.
        const asData = (v: unknown) => (typeof v === 'boolean' ? (v ? 'yes' : 'no') : typeof v === 'number' ? plainNumber(v) : v === null ? '' : String(v));
        expect(c.kind === 'horizon' ? asData(jh[c.key]) : jh.cutoffs.map((o) => asData(o[c.key])).join('; '), `${c.key} of row ${i}`).toBe(plain);
        // Screen text is the data value to about four significant figures and at most six decimals (src/format/formatQuantity.ts).
        const shownValues = shown.split('; ');
        const plainValues = plain.split('; ');
        expect(shownValues).toHaveLength(plainValues.length);
        shownValues.forEach((s, j) => {
          if (c.unit === 'text' || c.unit === 'yes-no') expect(s).toBe(plainValues[j]);
          else if (s === '—' || s === 'not meaningful') expect(plainValues[j]).toBe('');
          else expectClose(screenNumber(s, c), Number(plainValues[j]), 5e-4, { abs: c.unit === 'area' ? 1e-6 / area.factor : 1e-6, label: `${c.key} of row ${i}` });
        });
      });
    }
  });

  it('carries the model\'s faulted columns: two pieces and one cutoff on the fault, heave D = 1500 m (Gibbs 1983 construction)', () => {
    const keyAt = (k: string) => all.indexOf(k);
    for (const r of tables.clipboard.rows) {
      expect(r[keyAt('pieces')]).toBe('2');
      expect(r[keyAt('fault')]).toBe('Main thrust');
      expectClose(Number(r[keyAt('heave')]), 1500, 1e-9);
      // Slip along the fault is at least the straight distance between the cutoffs.
      expect(Number(r[keyAt('slip')])).toBeGreaterThanOrEqual(Math.hypot(1500, Number(r[keyAt('throw')])) * (1 - 1e-12));
    }
  });
});
