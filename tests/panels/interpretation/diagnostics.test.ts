// The pane's plain-word diagnostics name a horizon left out for its own problem, with the reason, and write
// their numbers as the pane's summary does (src/format/formatQuantity.ts).
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { diagnostics } from '../../../src/panels/interpretation/diagnostics';
import { lineArrays, type FlatSection } from '../../../src/core/model/section';
import { methodExample, triangleHorizon } from '../../core/analysis/sections';
import { expectClose } from '../../expectClose';
import { summaryRows } from '../../../src/panels/interpretation/summaryRows';
import type { Section } from '../../../src/core/model/section';
import type { LeftOutHorizon } from '../../../src/core/analysis/analyseDocSection';
import { sectionToProjectDoc } from '../../../src/core/model/migrations/sectionToProjectDoc';
import { selectAnalysis } from '../../../src/state/selectors';

describe('diagnostics(docSection, outcome, leftOut)', () => {
  it('lists each left-out horizon as "left out: <name> — <reason>"', () => {
    const section = methodExample();
    const fit = null as never;
    // As the app hands it over (docToSection): the lines as coordinate arrays.
    const flat: FlatSection = { ...section, horizons: section.horizons.map(({ line, pieces: _pieces, ...h }) => ({ ...h, line: lineArrays(line) })), faults: [] };
    const docSection = { ok: true as const, section: flat, fit, horizonIds: ['a', 'b', 'c', 'd'], skipped: [], skippedFaults: [] };
    const out = diagnostics(docSection, analyseSection(section), [{ id: 'e', name: 'Top E', reason: 'the regional does not reach the right pin (x = 10000); extend it across the pin or move the pin.' }]);
    expect(out.map((d) => d.text)).toContain('left out: Top E — the regional does not reach the right pin (x = 10000); extend it across the pin or move the pin.');
    expect(out.find((d) => d.text.startsWith('left out'))!.level).toBe('warning');
  });

  it('writes r² of a poor fit as the summary row does', () => {
    // Hand-computed: areas 3.0, 1.4, 2.2, 0.6 × 10⁶ m² at depths 500, 1000, 1500, 2000 m give
    // Sxy = −1.6e9, Sxx = 1.25e6, Syy = 3.2e12, so r² = Sxy² / (Sxx·Syy) = 0.64 (with a detachment at 2656 m).
    const w = 10_000;
    const section = { units: 'm' as const, pins: [0, w] as [number, number], referenceElevation: 0,
      horizons: [[500, 3e6], [1000, 1.4e6], [1500, 2.2e6], [2000, 0.6e6]].map(([h, a], i) => triangleHorizon(`H${i + 1}`, a, -h, w)) };
    const outcome = analyseSection(section);
    if (!outcome.ok) throw new Error('no analysis');
    const flat: FlatSection = { ...section, horizons: section.horizons.map(({ line, pieces: _pieces, ...h }) => ({ ...h, line: lineArrays(line) })), faults: [] };
    const docSection = { ok: true as const, section: flat, fit: null as never, horizonIds: ['a', 'b', 'c', 'd'], skipped: [], skippedFaults: [] };
    const r2 = summaryRows(outcome.analysis).find((r) => r.key === 'r2')!;
    expectClose(r2.value!, 0.64, 1e-12);
    const poor = diagnostics(docSection, outcome).find((d) => d.text.startsWith('Poor fit'))!;
    expect(poor.text).toContain(`r² = ${r2.text}.`);
    expect(r2.text).toBe('0.6400');
  });
});

describe('diagnostic keys', () => {
  // A box fold whose crest is projected (the analytic case of tests/format/analysisNotes.test.ts: 100·40 of the
  // 5000 m² excess area, 80 %); widening the crest to 50 m changes the share (5000 of 5500 m², 90.9 %) and the
  // length, and a horizon left out adds a
  // diagnostic above the note. The note's key must stay the same, so the pane's live text follows its own note.
  const box = (flank: number): Section => ({ units: 'm', pins: [0, 100], horizons: [
    { name: 'Eroded', line: [[0, 0], [20, 0], [20 + flank, 100], [80 - flank, 100], [80, 0], [100, 0]], regional: [[0, 0], [100, 0]], projected: [[2, 3]] },
    { name: 'Lower', line: [[0, -200], [40, -200], [50, -150], [60, -200], [100, -200]], regional: [[0, -200], [100, -200]] },
  ] });
  const projectedNote = (s: Section, leftOut: LeftOutHorizon[] = []) => {
    const da = selectAnalysis(sectionToProjectDoc(s));
    const all = diagnostics(da.docSection, da.outcome, leftOut);
    expect(new Set(all.map((d) => d.key)).size).toBe(all.length);
    const i = all.findIndex((d) => d.text.includes('projected (interpreted)'));
    return { i, d: all[i] };
  };

  it('a note keeps its key while its numbers change and when a diagnostic appears before it', () => {
    const before = projectedNote(box(10));
    const raised = projectedNote(box(5), [{ id: 'x', name: 'Top X', reason: 'the regional misses the left pin' }]);
    expect(before.d.text).toContain('80 %');
    expect(raised.d.text).toContain('90.9 %');
    expect(raised.i).toBe(before.i + 1);
    expect(raised.d.key).toBe(before.d.key);
  });
});
