// The notes of an analysis as every view and export shows them (the pane, the report, the results CSV,
// the terminal table and the command line's JSON): the engine's notes, one note per horizon with projected
// (interpreted) stretches, then one note per reason a Chamberlin depth is missing, naming its horizons; every
// number written by the one number rule.
import type { SectionAnalysis } from '../core/analysis/analyseSection';
import { chamberlinReasonText } from './chamberlinReasonText';
import { formatLength, formatPercent } from './formatQuantity';

/**
 * Returns the analysis's notes, then "Horizon "A": 80 % of its excess area and 40 m of its bed length are projected …"
 * per horizon with a projected stretch, then "No Chamberlin depth for "A", "B": <reason>." per distinct reason, in horizon order.
 */
export function analysisNotes(a: Pick<SectionAnalysis, 'notes' | 'horizons' | 'units'>): string[] {
  const projected = a.horizons.filter((h) => h.projectedLength > 0).map((h) =>
    `Horizon "${h.name}": ${formatPercent(h.projectedAreaShare)} of its excess area and ${formatLength(h.projectedLength, a.units)} of its bed length are projected (interpreted); treat its values as projected, not measured.`);
  const byReason = new Map<string, string[]>();
  for (const h of a.horizons) {
    if (h.chamberlinReason === null) continue;
    const text = chamberlinReasonText(h.chamberlinReason, a.units);
    byReason.set(text, [...(byReason.get(text) ?? []), `"${h.name}"`]);
  }
  return [...a.notes, ...projected, ...[...byReason].map(([reason, names]) => `No Chamberlin depth for ${names.join(', ')}: ${reason}.`)];
}
