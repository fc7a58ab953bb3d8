// The notes of an analysis as every view and export shows them (the pane, the report, the results CSV,
// the terminal table and the command line's JSON): the engine's notes, then one note per reason a
// Chamberlin depth is missing, naming its horizons, written by the one number rule.
import type { SectionAnalysis } from '../core/analysis/analyseSection';
import { chamberlinReasonText } from './chamberlinReasonText';

/** Returns the analysis's notes followed by "No Chamberlin depth for "A", "B": <reason>." per distinct reason, in horizon order. */
export function analysisNotes(a: Pick<SectionAnalysis, 'notes' | 'horizons' | 'units'>): string[] {
  const byReason = new Map<string, string[]>();
  for (const h of a.horizons) {
    if (h.chamberlinReason === null) continue;
    const text = chamberlinReasonText(h.chamberlinReason, a.units);
    byReason.set(text, [...(byReason.get(text) ?? []), `"${h.name}"`]);
  }
  return [...a.notes, ...[...byReason].map(([reason, names]) => `No Chamberlin depth for ${names.join(', ')}: ${reason}.`)];
}
