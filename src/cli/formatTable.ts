import type { AreaDepthResult, SectionAnalysis } from '../core/analysis/analyseSection';
import { terminalText } from './terminalText';
import { SECTION_CAUTION } from '../core/analysis/caution';
import { isExactFit } from '../core/analysis/isExactFit';
import { EXACT_FIT_TEXT, formatArea, formatInterval, formatNumber as num, formatR2 } from '../format/formatQuantity';
import { maxOf } from '../core/stats/minMax';
import { columnHeader, columnsOf, screenCell, tableAreaUnit } from '../format/horizonColumns';
import { analysisNotes } from '../format/analysisNotes';

// The terminal writes numbers by the one rule of src/format (as the screen, the figure and the report do).

function range(r: [number, number] | null, d: AreaDepthResult, u: string): string {
  return r ? formatInterval(r, u) : d.n === 2 ? 'none (n = 2)' : 'none';
}

/** docs/method.md §Fieller interval: an unbounded Fieller interval is reported as "unbounded", never as a number. */
function fiellerRange(d: AreaDepthResult, u: string): string {
  return d.detachmentDepthInterval.kind === 'unbounded' ? 'unbounded' : range(d.detachmentDepthCI95, d, u);
}

/** The analysis as a plain-text table for a terminal (columns of src/format/horizonColumns.ts; section units, one area unit for the table); `source`, when given, is its first line (project and scenario). */
export function formatTable(a: SectionAnalysis, source: string | null = null): string {
  const u = a.units;
  const area = tableAreaUnit(a);
  const cols = columnsOf('terminal');
  const head = cols.map((c) => columnHeader(c, u, area));
  const rows = a.horizons.map((h) => cols.map((c) => terminalText(screenCell(c, h, area))));
  const widths = head.map((t, c) => maxOf(rows.map((r) => r[c].length), t.length));
  const line = (r: string[]) => r.map((cell, c) => (c === 0 ? cell.padEnd(widths[c]) : cell.padStart(widths[c]))).join('  ');
  const out = [
    ...(source ? [terminalText(source)] : []),
    `Pin width ${num(a.pinWidth)} ${u}; reference elevation ${num(a.referenceElevation)} ${u} (depths below it).`,
    '',
    line(head),
    line(widths.map((w) => '-'.repeat(w))),
    ...rows.map(line),
    '',
  ];
  const d = a.areaDepth;
  if (d) {
    out.push(`Area–depth line over ${d.n} horizons: A = ${formatArea(d.intercept, u, area)} + (${num(d.slope)} ${u}) × depth, r² = ${formatR2(d.r2, isExactFit(d))}`);
    // D = −slope is a displacement only when the line reaches zero below the horizons (docs/method.md
    // §Area-depth line): D > 0 shortening, D < 0 extension; the JSON keeps the number either way.
    out.push(d.noDetachment
      ? '  no zero crossing below the horizons: no displacement estimate'
      : `  Displacement D = ${num(d.displacement)} ${u} (${isExactFit(d) ? EXACT_FIT_TEXT : `95%: ${range(d.displacementCI95, d, u)}`}), ${d.regime === 'extension' ? `extension (${num(-d.displacement)} ${u})` : 'shortening'}`);
    out.push(d.detachmentDepth === null
      ? '  Detachment: none below these horizons'
      : `  Detachment depth ${num(d.detachmentDepth)} ${u} below the reference, elevation ${num(d.detachmentElevation)} ${u} (${isExactFit(d) ? EXACT_FIT_TEXT : `95% Fieller: ${fiellerRange(d, u)}`})`);
  } else {
    out.push('Area–depth line: none (see notes).');
  }
  out.push('', 'Notes:');
  for (const n of [...analysisNotes(a), SECTION_CAUTION]) out.push(`  - ${terminalText(n)}`);
  out.push('');
  return out.join('\n');
}
