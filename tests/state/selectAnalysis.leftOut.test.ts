// One unfinished horizon must not block the analysis of the others in the app: the
// selector leaves out the horizons the engine reports a problem of their own for, names them with the
// engine's reason, and analyses the rest; a problem of the whole section still stops it, and the engine
// itself (what the command line runs) stays strict.
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../src/core/analysis/analyseSection';
import { docToSection } from '../../src/core/model/docToSection';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
import { selectAnalysis, selectLiveAnalysis } from '../../src/state/selectors';
import { forwardModelDoc, px } from '../fixtures/forwardModel/forwardModel';

/**
 * The forward model (tests/fixtures/forwardModel/forwardModel.ts: A = D·(zd − h) = 3.0, 2.5, 2.0, 1.5 km²).
 * `shortRegional`: that horizon's regional stops at x = 9500 m, short of the right pin.
 */
function doc(shortRegional: number | null): ProjectDoc {
  const d = forwardModelDoc();
  if (shortRegional !== null) {
    const r = -500 * (shortRegional + 1);
    d.scenarios[0].regionals[`h${shortRegional + 1}`] = [px(-800, r), px(9500, r)];
  }
  return d;
}

describe('selectAnalysis(doc) with a horizon the engine cannot analyse', () => {
  it('analyses the others and lists the left-out one with the engine’s reason', () => {
    const d = doc(3);
    const out = selectAnalysis(d);
    expect(out.outcome?.ok).toBe(true);
    if (!out.outcome?.ok) return;
    const a = out.outcome.analysis;
    expect(a.horizons.map((h) => h.name)).toEqual(['H1', 'H2', 'H3']);
    expect(out.docSection.ok && out.docSection.horizonIds).toEqual(['h1', 'h2', 'h3']);
    expect(out.leftOut).toHaveLength(1);
    expect(out.leftOut[0].id).toBe('h4');
    expect(out.leftOut[0].name).toBe('H4');
    expect(out.leftOut[0].reason).toMatch(/regional does not reach the right pin/);
    // The reason does not repeat the horizon's name: the pane writes "left out: H4 — <reason>".
    expect(out.leftOut[0].reason).not.toMatch(/^Horizon/);
    // The three remaining horizons still lie on the forward model's line: D = 1000 m, zd = 3000 m below −500 m.
    const ad = a.areaDepth!;
    expect(a.referenceElevation).toBeCloseTo(-500, 6);
    expect(ad.displacement).toBeCloseTo(1000, 6);
    expect(ad.detachmentDepth!).toBeCloseTo(3000, 6);
    expect(ad.detachmentElevation!).toBeCloseTo(-3500, 6);
  });

  it('gives the same numbers as the engine on the section without that horizon', () => {
    const out = selectAnalysis(doc(1));
    const ds = docToSection(doc(1));
    if (!ds.ok || !out.outcome?.ok) throw new Error('not analysed');
    const reduced = analyseSection({ ...ds.section, horizons: ds.section.horizons.filter((h) => h.name !== 'H2') });
    if (!reduced.ok) throw new Error('reduced section failed');
    expect(out.leftOut.map((h) => h.name)).toEqual(['H2']);
    expect(out.outcome.analysis.areaDepth!.detachmentElevation).toBe(reduced.analysis.areaDepth!.detachmentElevation);
    expect(out.outcome.analysis.horizons.map((h) => h.excessArea)).toEqual(reduced.analysis.horizons.map((h) => h.excessArea));
    // The live selector outside a gesture is the same.
    expect(selectLiveAnalysis(doc(1), null).leftOut.map((h) => h.name)).toEqual(['H2']);
  });

  it('the engine (what the command line runs) still refuses the whole section', () => {
    const ds = docToSection(doc(3));
    if (!ds.ok) throw new Error(ds.message);
    const strict = analyseSection(ds.section);
    expect(strict.ok).toBe(false);
    if (!strict.ok) expect(strict.problems.map((p) => p.horizon)).toEqual(['H4']);
  });

  it('leaves nothing out when every horizon is fine', () => {
    const out = selectAnalysis(doc(null));
    expect(out.leftOut).toEqual([]);
    expect(out.outcome?.ok && out.outcome.analysis.horizons).toHaveLength(4);
  });

  it('a problem of the whole section (both pins at one x) still stops the analysis', () => {
    const d = doc(3);
    d.scenarios[0].pinsPx = [px(5000, 0), px(5000, 0)];
    const out = selectAnalysis(d);
    expect(out.outcome?.ok).toBe(false);
    expect(out.leftOut).toEqual([]);
  });

  it('every horizon unfinished: reports the problems, leaves none out silently', () => {
    const d = doc(null);
    for (const h of d.horizons) d.scenarios[0].regionals[h.id] = [d.scenarios[0].regionals[h.id][0], px(9500, -500)];
    const out = selectAnalysis(d);
    expect(out.outcome?.ok).toBe(false);
    if (out.outcome && !out.outcome.ok) expect(out.outcome.problems).toHaveLength(4);
    expect(out.leftOut).toEqual([]);
  });
});
