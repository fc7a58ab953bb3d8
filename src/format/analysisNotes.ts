// The notes of an analysis as every view and export shows them (the pane, the report, the results CSV,
// the terminal table and the command line's JSON): the engine's notes, one note per horizon with projected
// (interpreted) stretches, then one note per reason a Chamberlin depth is missing, naming its horizons; every
// number written by the one number rule.
import type { SectionAnalysis } from '../core/analysis/analyseSection';
import type { AreaDepthResult } from '../core/analysis/fitAreaDepth';
import { chamberlinReasonText } from './chamberlinReasonText';
import { formatLength, formatNumber, formatPercent } from './formatQuantity';

/** Returns the note on an unbounded 95% Fieller interval (with its g, three figures), or none, for an area–depth line. */
export function fitNotes(ad: Pick<AreaDepthResult, 'detachmentDepthInterval'> | null): string[] {
  const interval = ad?.detachmentDepthInterval;
  if (interval?.kind !== 'unbounded') return [];
  return [`The 95% Fieller interval on the detachment depth is unbounded (g = ${formatNumber(interval.g, 3)} ≥ 1): the slope is not clearly different from zero, so the data do not bound the depth.`];
}

/**
 * Returns the analysis's notes, the note on an unbounded Fieller interval (fitNotes), then "Horizon "A": 80 % of its excess area and 40 m of its bed length are projected …"
 * per horizon with a projected stretch, then "No Chamberlin depth for "A", "B": <reason>." per distinct reason, in horizon order.
 */
export function analysisNotes(a: Pick<SectionAnalysis, 'notes' | 'horizons' | 'units' | 'areaDepth'>): string[] {
  const projected = a.horizons.filter((h) => h.projectedLength > 0).map((h) =>
    `Horizon "${h.name}": ${formatPercent(h.projectedAreaShare)} of its excess area and ${formatLength(h.projectedLength, a.units)} of its bed length are projected (interpreted); treat its values as projected, not measured.`);
  const byReason = new Map<string, string[]>();
  for (const h of a.horizons) {
    if (h.chamberlinReason === null) continue;
    const text = chamberlinReasonText(h.chamberlinReason, a.units);
    byReason.set(text, [...(byReason.get(text) ?? []), `"${h.name}"`]);
  }
  return [...a.notes, ...fitNotes(a.areaDepth), ...projected, ...[...byReason].map(([reason, names]) => `No Chamberlin depth for ${names.join(', ')}: ${reason}.`)];
}
