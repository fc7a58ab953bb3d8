import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { SECTION_CAUTION } from '../../core/analysis/caution';
import { formatNumber } from './formatValue';
import { summaryRows } from './summaryRows';

// The results table as tab-separated text for the clipboard (spreadsheets paste it into cells).
// Areas in the section unit squared, lengths in the section unit; the caution travels with it (DEVELOPERS.md §Project rules).

function clean(text: string): string {
  return text.replace(/[\t\r\n]+/g, ' ');
}

/** Tab-separated per-horizon table, summary and caution, lines joined by "\n". */
export function resultsTsv(a: SectionAnalysis, scenarioName: string): string {
  const u = a.units;
  const lines: string[][] = [
    ['Scenario', clean(scenarioName)],
    [],
    ['Horizon', 'Included', `Excess area (${u}²)`, `Regional elevation (${u})`, `Depth (${u})`, `Bed length (${u})`, `Regional length (${u})`,
      `Chamberlin depth (${u})`, 'Layer-parallel strain (%)', 'Projected share (%)', `Residual (${u}²)`],
    ...a.horizons.map((h) => [
      clean(h.name), h.included ? 'yes' : 'no', formatNumber(h.excessArea), formatNumber(h.regionalElevation, 1), formatNumber(h.depth, 1),
      formatNumber(h.bedLength, 1), formatNumber(h.regionalLength, 1), formatNumber(h.chamberlinDepth, 1),
      formatNumber(h.lpsStrain === null ? null : 100 * h.lpsStrain, 2), formatNumber(100 * h.projectedAreaShare, 1), formatNumber(h.residual),
    ]),
    [],
    ['Summary', 'Value', '95% interval'],
    ...summaryRows(a).map((r) => [r.label, r.text, r.interval]),
    [],
    ['Caution', SECTION_CAUTION],
  ];
  return lines.map((l) => l.join('\t')).join('\n');
}
