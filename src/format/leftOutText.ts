import type { LeftOutHorizon } from '../core/analysis/analyseDocSection';

// A horizon left out of the analysis for a problem of its own reads the same in the pane, the figure, the report,
// the results table and the copied table: its name, then the engine's reason.

/** Returns "name — reason" for a horizon left out of the analysis (the reason as the engine gives it). */
export function leftOutText(h: Pick<LeftOutHorizon, 'name' | 'reason'>): string {
  return `${h.name} — ${h.reason}`;
}
