// The gesture fast path of the selectors must give the engine's full answer: every per-horizon value
// and the area–depth fit equal analyseSection on the same document while regionals are raised, tilted
// and bent (docs/method.md §Sensitivity to the regional: moving a regional changes the loop area by −W0·Δr, our derivation), including a
// horizon with a projected run; anything else changed takes the full analysis.
import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../src/core/analysis/analyseSection';
import { offsetRegionals } from '../../src/core/model/commands/offsetRegionals';
import { setRegional } from '../../src/core/model/commands/setRegional';
import { docToSection } from '../../src/core/model/docToSection';
import { emptyProjectDoc, type ProjectDoc } from '../../src/core/model/projectDoc';
import { selectAnalysis, selectLiveAnalysis } from '../../src/state/selectors';

/** 6 horizons × 800 vertices over a 4000 × 2000 px scan at 2.5 m/px; the third has a projected run. */
function doc(): ProjectDoc {
  const d = emptyProjectDoc();
  d.calibration = { kind: 'axes', xPoints: [{ u: 0, v: 0, value: 0 }, { u: 4000, v: 0, value: 10_000 }], zPoints: [{ u: 0, v: 0, value: 0 }, { u: 0, v: 2000, value: -5000 }] };
  for (let k = 0; k < 6; k++) {
    const pointsPx: [number, number][] = [];
    for (let i = 0; i < 800; i++) {
      const u = 100 + i * 4.75;
      pointsPx.push([u, 300 + k * 200 - (400 - 40 * k) * Math.sin((Math.PI * (u - 100)) / 3800) ** 2 + 0.5 * Math.sin(i)]);
    }
    d.horizons.push({ id: `h${k + 1}`, name: `H${k + 1}`, colour: '#000000', visible: true, locked: false, pointsPx, projected: k === 2 ? [[300, 420]] : [], joins: [] });
    d.scenarios[0].regionals[`h${k + 1}`] = [[50, 300 + k * 200], [3950, 300 + k * 200]];
  }
  d.scenarios[0].pinsPx = [[150, 0], [3800, 0]];
  return d;
}

function full(d: ProjectDoc): SectionAnalysis {
  const ds = docToSection(d);
  if (!ds.ok) throw new Error(ds.message);
  const out = analyseSection(ds.section);
  if (!out.ok) throw new Error(out.problems[0].message);
  return out.analysis;
}

/** Equal to float noise, relative to `scale` (residuals are small differences of areas, so they take the area's). */
const close = (a: number | null, b: number | null, scale = b ?? 0) => {
  if (a === null || b === null) return expect(a).toBe(b);
  expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(scale)));
};

function expectSame(moved: ProjectDoc, start: ProjectDoc) {
  const live = selectLiveAnalysis(moved, start);
  expect(live.outcome?.ok).toBe(true);
  if (!live.outcome?.ok) return;
  const a = live.outcome.analysis;
  const b = full(moved);
  close(a.referenceElevation, b.referenceElevation);
  a.horizons.forEach((h, i) => {
    const g = b.horizons[i];
    for (const k of ['excessArea', 'bedLength', 'regionalLength', 'regionalElevation', 'depth', 'chamberlinDepth', 'lpsStrain', 'projectedAreaShare', 'projectedLength'] as const) close(h[k], g[k]);
    close(h.residual, g.residual, g.excessArea);
  });
  for (const k of ['displacement', 'detachmentDepth', 'detachmentElevation', 'r2'] as const) close(a.areaDepth![k], b.areaDepth![k]);
  expect(a.notes.length).toBe(b.notes.length);
  // The section handed to the pane (sensitivity, detachment trace) carries the moved regionals.
  const ds = docToSection(moved);
  if (live.docSection.ok && ds.ok) live.docSection.section.horizons.forEach((h, i) => h.regional.forEach((p, j) => { close(p[0], ds.section.horizons[i].regional[j][0]); close(p[1], ds.section.horizons[i].regional[j][1]); }));
}

describe('selectLiveAnalysis', () => {
  it('selectLiveAnalysis(doc, start) equals analyseSection while regionals are raised, tilted and bent', () => {
    const start = doc();
    let moved = offsetRegionals(start, null, 37.5);
    expectSame(moved, start);
    moved = setRegional(moved, 'h3', [[50, 700], [3950, 735]]);
    expectSame(moved, start);
    moved = setRegional(moved, 'h5', [[50, 1100], [2000, 1125], [3950, 1110]]);
    expectSame(moved, start);
  });

  it('selectLiveAnalysis(doc, null) and changes other than regionals give selectAnalysis itself', () => {
    const start = doc();
    const moved = offsetRegionals(start, null, 10);
    expect(selectLiveAnalysis(moved, null)).toBe(selectAnalysis(moved));
    const pinsMoved = { ...moved, scenarios: [{ ...moved.scenarios[0], pinsPx: [[160, 0], [3800, 0]] as [[number, number], [number, number]] }] };
    expect(selectLiveAnalysis(pinsMoved, start)).toBe(selectAnalysis(pinsMoved));
    // A regional that no longer reaches the right pin: the full analysis, which leaves that horizon out and says why.
    const short = setRegional(start, 'h2', [[50, 500], [3000, 500]]);
    const r = selectLiveAnalysis(short, start);
    expect(r).toBe(selectAnalysis(short));
    expect(r.leftOut.map((h) => h.id)).toEqual(['h2']);
    expect(r.leftOut[0].reason).toMatch(/does not reach the right pin/);
  });
});
