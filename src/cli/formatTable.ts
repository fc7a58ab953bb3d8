import type { AreaDepthResult, SectionAnalysis } from '../core/analysis/analyseSection';
import { terminalText } from './terminalText';
import { SECTION_CAUTION } from '../core/analysis/caution';
import { isExactFit } from '../core/analysis/isExactFit';
import { EXACT_FIT_TEXT, formatChamberlin, formatInterval, formatNumber as num, formatR2 } from '../format/formatQuantity';
import { maxOf } from '../core/stats/minMax';

// The terminal writes numbers by the one rule of src/format (as the screen, the figure and the report do).

function range(r: [number, number] | null, d: AreaDepthResult, u: string): string {
  return r ? formatInterval(r, u) : d.n === 2 ? 'none (n = 2)' : 'none';
}

/** docs/method.md §Fieller interval: an unbounded Fieller interval is reported as "unbounded", never as a number. */
function fiellerRange(d: AreaDepthResult, u: string): string {
  return d.detachmentDepthInterval.kind === 'unbounded' ? 'unbounded' : range(d.detachmentDepthCI95, d, u);
}

/** The analysis as a plain-text table for a terminal (section units, areas in units²); `source`, when given, is its first line (project and scenario). */
export function formatTable(a: SectionAnalysis, source: string | null = null): string {
  const u = a.units;
  const head = ['Horizon', 'Fit', `Excess area (${u}²)`, `Bed length (${u})`, `Regional length (${u})`, `Regional elev. (${u})`, `Depth (${u})`, `Chamberlin (${u})`, 'LPS strain (%)'];
  const rows = a.horizons.map((h) => [
    terminalText(h.name), h.included ? 'yes' : 'no', num(h.excessArea), num(h.bedLength), num(h.regionalLength),
    num(h.regionalElevation), num(h.depth), formatChamberlin(h), h.lpsStrain === null ? '—' : num(100 * h.lpsStrain),
  ]);
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
    out.push(`Area–depth line over ${d.n} horizons: A = ${num(d.intercept)} ${u}² + (${num(d.slope)} ${u}) × depth, r² = ${formatR2(d.r2, isExactFit(d))}`);
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
  for (const n of [...a.notes, SECTION_CAUTION]) out.push(`  - ${terminalText(n)}`);
  out.push('');
  return out.join('\n');
}
