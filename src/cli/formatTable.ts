import type { AreaDepthResult, SectionAnalysis } from '../core/analysis/analyseSection';
import { SECTION_CAUTION } from '../core/analysis/caution';
import { maxOf } from '../core/stats/minMax';

function num(v: number | null, digits = 4): string {
  if (v === null || !Number.isFinite(v)) return '—';
  return Math.abs(v) >= 1e7 || (Math.abs(v) < 1e-3 && v !== 0) ? v.toExponential(digits - 1) : Number(v.toPrecision(Math.max(digits, 6))).toString();
}

function range(r: [number, number] | null, n: number): string {
  return r ? `${num(r[0])} to ${num(r[1])}` : n === 2 ? 'none (n = 2)' : 'none';
}

/** docs/method.md §Fieller interval: an unbounded Fieller interval is reported as "unbounded", never as a number. */
function fiellerRange(d: AreaDepthResult): string {
  return d.detachmentDepthInterval.kind === 'unbounded' ? 'unbounded' : range(d.detachmentDepthCI95, d.n);
}

/** The analysis as a plain-text table for a terminal (section units, areas in units²); `source`, when given, is its first line (project and scenario). */
export function formatTable(a: SectionAnalysis, source: string | null = null): string {
  const u = a.units;
  const head = ['Horizon', 'Fit', `Excess area (${u}²)`, `Bed length (${u})`, `Regional length (${u})`, `Regional elev. (${u})`, `Depth (${u})`, `Chamberlin (${u})`, 'LPS strain'];
  const rows = a.horizons.map((h) => [
    h.name, h.included ? 'yes' : 'no', num(h.excessArea), num(h.bedLength), num(h.regionalLength),
    num(h.regionalElevation), num(h.depth), num(h.chamberlinDepth), h.lpsStrain === null ? '—' : h.lpsStrain.toFixed(4),
  ]);
  const widths = head.map((t, c) => maxOf(rows.map((r) => r[c].length), t.length));
  const line = (r: string[]) => r.map((cell, c) => (c === 0 ? cell.padEnd(widths[c]) : cell.padStart(widths[c]))).join('  ');
  const out = [
    ...(source ? [source] : []),
    `Pin width ${num(a.pinWidth)} ${u}; reference elevation ${num(a.referenceElevation)} ${u} (depths below it).`,
    '',
    line(head),
    line(widths.map((w) => '-'.repeat(w))),
    ...rows.map(line),
    '',
  ];
  const d = a.areaDepth;
  if (d) {
    out.push(`Area–depth line over ${d.n} horizons: A = ${num(d.intercept)} ${u}² + (${num(d.slope)} ${u}) × depth, r² = ${d.r2.toFixed(4)}`);
    // D = −slope is a displacement only when the line reaches zero below the horizons (docs/method.md
    // §Area-depth line): D > 0 shortening, D < 0 extension; the JSON keeps the number either way.
    out.push(d.noDetachment
      ? '  no zero crossing below the horizons: no displacement estimate'
      : `  Displacement D = ${num(d.displacement)} ${u} (95%: ${range(d.displacementCI95, d.n)}), ${d.regime === 'extension' ? `extension (${num(-d.displacement)} ${u})` : 'shortening'}`);
    out.push(d.detachmentDepth === null
      ? '  Detachment: none below these horizons'
      : `  Detachment depth ${num(d.detachmentDepth)} ${u} below the reference, elevation ${num(d.detachmentElevation)} ${u} (95% Fieller: ${fiellerRange(d)})`);
  } else {
    out.push('Area–depth line: none (see notes).');
  }
  out.push('', 'Notes:');
  for (const n of [...a.notes, SECTION_CAUTION]) out.push(`  - ${n}`);
  out.push('');
  return out.join('\n');
}
