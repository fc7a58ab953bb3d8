import type { AnalysisOutcome } from '../../core/analysis/analyseSection';
import type { DocSection } from '../../core/model/docToSection';
import type { LeftOutHorizon } from '../../core/analysis/analyseDocSection';
import { leftOutText } from '../../format/leftOutText';
import { analysisNotes } from '../../format/analysisNotes';
import { formatR2 } from '../../format/formatQuantity';

// What the pane says about the fit, in plain words (the pane speaks in plain words). r² below 0.9 is
// called a poor fit: our threshold, a common rule of thumb for area–depth lines.

/** A diagnostic: its level, its words, and a key naming which one it is (the same while its numbers change). */
export interface Diagnostic { level: 'error' | 'warning' | 'info'; text: string; key: string }

export const POOR_FIT_R2 = 0.9;

/** Plain-word diagnostics for the scenario's analysis: not ready, input problems, horizons left out for a problem of their own, fit quality, intervals, skipped horizons. */
export function diagnostics(docSection: DocSection, outcome: AnalysisOutcome | null, leftOut: readonly LeftOutHorizon[] = []): Diagnostic[] {
  if (!docSection.ok) return [{ level: 'info', text: docSection.message, key: 'not-ready' }];
  const out: Diagnostic[] = docSection.skipped.map((s, i) => ({ level: 'info' as const, text: `Horizon "${s.name}" is left out: ${s.reason}.`, key: `skipped ${i} ${s.name}` }));
  for (const [i, f] of docSection.skippedFaults.entries()) out.push({ level: 'info', text: `Fault "${f.name}" is left out: ${f.reason}.`, key: `skipped fault ${i} ${f.name}` });
  // The others are analysed without them (selectors: analyseLenient); the reason is the engine's.
  for (const h of leftOut) out.push({ level: 'warning', text: `left out: ${leftOutText(h)}`, key: `left out ${h.id}` });
  if (!outcome) return [...out, { level: 'info', text: 'Draw a regional for at least two horizons to see the area–depth line.', key: 'no regionals' }];
  if (!outcome.ok) return [...out, ...outcome.problems.map((p, i) => ({ level: 'error' as const, text: p.message, key: `problem ${i} ${p.code}` }))];
  const a = outcome.analysis;
  const ad = a.areaDepth;
  const n = a.horizons.filter((h) => h.included).length;
  if (!ad) {
    out.push({ level: 'error', text: `Too few horizons: ${n} in the fit. Include at least two horizons at different depths (three or more for intervals).`, key: 'too few' });
  } else if (ad.noDetachment) {
    out.push({ level: 'error', text: 'The area–depth line does not reach zero area below the deepest horizon in the fit (or it is flat), so there is no detachment below these horizons. Check the regionals and the included horizons.', key: 'no detachment' });
  } else {
    if (ad.n === 2) out.push({ level: 'warning', text: 'Too few horizons for intervals: with two, the line passes through both exactly. Include a third horizon.', key: 'two horizons' });
    if (ad.n >= 3 && ad.r2 < POOR_FIT_R2) out.push({ level: 'warning', text: `Poor fit: r² = ${formatR2(ad.r2)}. The points scatter about one straight line; look at the flagged horizons, or fit a subset or a second segment.`, key: 'poor fit' });
    if (ad.detachmentDepthInterval.kind === 'unbounded') out.push({ level: 'warning', text: 'The 95% interval on the detachment depth is unbounded: the slope is not clearly different from zero, so the data do not pin the depth down.', key: 'unbounded' });
  }
  // A note's key is its words without its numbers, so a drag that changes a share or a length keeps the key.
  for (const note of analysisNotes(a)) {
    if (/projected|Chamberlin|above the deepest/.test(note)) out.push({ level: 'info', text: note, key: `note ${note.replace(/[\d.,\u2212-]+/g, '#')}` });
  }
  return out;
}
