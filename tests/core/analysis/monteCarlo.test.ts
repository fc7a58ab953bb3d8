import { describe, expect, it } from 'vitest';
import { areaVertexCoefficients } from '../../../src/core/analysis/areaVertexCoefficients';
import { createEvaluationScratch, evaluateShifted } from '../../../src/core/analysis/evaluateShifted';
import { monteCarlo, type MonteCarloOptions, type MonteCarloResult } from '../../../src/core/analysis/monteCarlo';
import { prepareHorizon } from '../../../src/core/analysis/prepareHorizon';
import { prepareSection } from '../../../src/core/analysis/prepareSection';
import { forwardSection } from '../../../src/core/forward/forwardSection';
import { toCoordinateArrays } from '../../../src/core/geometry/toCoordinateArrays';
import type { Section } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';

// A forward-modelled section (docs/method.md §Forward models): D = 800 m above a detachment 3000 m below
// the top regional, four horizons over rounded and box folds; pins away from the ends of the lines.
function section(): Section {
  return forwardSection({
    units: 'm', displacement: 800, detachmentDepth: 3000, referenceElevation: 0, pins: [1000, 11_000],
    extent: [0, 12_000], samplesPerFold: 40,
    horizons: [0, 500, 1000, 1600].map((d, i) => ({ name: `H${i + 1}`, depth: d })),
    folds: [{ shape: 'rounded', from: 2000, to: 6000 }, { shape: 'box', from: 6500, to: 10_000, weight: 0.6 }],
  }).section;
}

function run(options: MonteCarloOptions, s = section()): MonteCarloResult {
  const out = monteCarlo(s, options);
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
  return out.result;
}

describe('monteCarlo(section, options)', () => {
  it('returns the point estimate in every run when every σ is 0', () => {
    const r = run({ runs: 50, seed: 7 });
    const prep = prepareSection(section());
    if (!prep.ok) throw new Error('prepare failed');
    const point = evaluateShifted(prep.prepared)!;
    expect(r.valid).toBe(50);
    expect(r.failedShare).toBe(0);
    for (const d of r.depths) expectClose(d, point.detachmentDepth!, 1e-12);
    expectClose(r.depth!.p10, point.detachmentDepth!, 1e-12);
    expectClose(r.depth!.p90, point.detachmentDepth!, 1e-12);
    expectClose(r.displacement!.p50, point.displacement, 1e-12);
    expect(r.depth!.sd).toBeLessThan(1e-9 * point.detachmentDepth!);
  });

  it('gives identical output for the same seed and different output for another seed', () => {
    const o: MonteCarloOptions = { runs: 300, seed: 12345, sigmaVertex: 20, sigmaOffset: 15, sigmaTilt: 0.002, sigmaScale: 0.01, sigmaHorizonOffset: 5 };
    const a = run(o);
    const b = run(o);
    expect(Array.from(a.depths)).toEqual(Array.from(b.depths));
    expect(a.depth).toEqual(b.depth);
    const c = run({ ...o, seed: 54321 });
    expect(Array.from(c.depths)).not.toEqual(Array.from(a.depths));
  });

  it('narrows the spread as σ shrinks', () => {
    const sds = [40, 20, 10, 5].map((s) => {
      const r = run({ runs: 400, seed: 3, sigmaVertex: s, sigmaOffset: s / 2 });
      return r.depth!.p90 - r.depth!.p10;
    });
    for (let i = 1; i < sds.length; i++) expect(sds[i]).toBeLessThan(sds[i - 1]);
    // Linear propagation for small σ (our derivation): halving σ about halves the spread.
    expectClose(sds[3] / sds[2], 0.5, 0.15);
  });

  it('spreads the depth by σ·(1 + W0/D) for a common regional offset alone (docs/method.md §Sensitivity to the regional)', () => {
    const prep = prepareSection(section());
    if (!prep.ok) throw new Error('prepare failed');
    const D = evaluateShifted(prep.prepared)!.displacement;
    const r = run({ runs: 4000, seed: 99, sigmaOffset: 10 });
    // The depth is linear in δ, so its SD is 10·(1 + W0/D) up to sampling error (~2.5% for 4000 runs).
    expectClose(r.depth!.sd, 10 * (1 + prep.prepared.pinWidth / D), 0.06);
  });

  it('agrees in distribution between the analytic area noise and brute-force vertex noise', () => {
    // docs/method.md §Area variance of a horizon: with independent vertical noise σ the area change is normal with variance σ² Σ cᵢ².
    const o: MonteCarloOptions = { runs: 1500, seed: 2024, sigmaVertex: 25 };
    const analytic = run({ ...o, method: 'analytic' });
    const brute = run({ ...o, seed: 4048, method: 'vertices' });
    expect(brute.valid).toBe(1500);
    expectClose(brute.depth!.mean, analytic.depth!.mean, 0.01);
    expectClose(brute.depth!.sd, analytic.depth!.sd, 0.1);
    expectClose(brute.displacement!.sd, analytic.displacement!.sd, 0.1);
  });

  it('counts runs without a detachment as failed and leaves them out of the percentiles', () => {
    // Two horizons with nearly equal areas: a large offset σ on each often makes the slope non-negative.
    const s = section();
    s.horizons = s.horizons.slice(0, 2);
    const r = run({ runs: 500, seed: 5, sigmaHorizonOffset: 200 });
    expect(r.failedShare).toBeGreaterThan(0);
    expect(r.failedShare).toBeLessThan(1);
    expect(r.valid).toBe(Array.from(r.depths).filter((d) => Number.isFinite(d)).length);
  });

  it('reports progress up to the total and input problems as data', () => {
    const seen: number[] = [];
    monteCarlo(section(), { runs: 200, seed: 1 }, (done) => seen.push(done));
    expect(seen[seen.length - 1]).toBe(200);
    const bad = monteCarlo({ units: 'm', pins: [0, 10], horizons: [] }, { runs: 10, seed: 1 });
    expect(bad.ok).toBe(false);
  });
});

describe('areaVertexCoefficients(line, n, pins)', () => {
  it('predicts the exact change of excess area when one input vertex moves vertically', () => {
    // The shoelace area is linear in z for fixed x (docs/method.md §Area variance of a horizon), so the prediction is exact.
    const s = section();
    const h = s.horizons[1];
    const line = toCoordinateArrays(h.line!);
    const reg = toCoordinateArrays(h.regional);
    const base = prepareHorizon(h.name, line.xs, line.zs, reg.xs, reg.zs, s.pins);
    if (!base.ok) throw new Error('prepare failed');
    const c = areaVertexCoefficients(base.horizon.line, h.line!.length, s.pins);
    const crossing = h.line!.findIndex(([x]) => x > s.pins[0]);
    for (const i of [0, crossing - 1, crossing, crossing + 1, 17, 30, h.line!.length - 2, h.line!.length - 1]) {
      const zs = Float64Array.from(line.zs);
      zs[i] += 3.5;
      const moved = prepareHorizon(h.name, line.xs, zs, reg.xs, reg.zs, s.pins);
      if (!moved.ok) throw new Error('moved prepare failed');
      expectClose(moved.horizon.excessArea - base.horizon.excessArea, 3.5 * c[i], 1e-7, { abs: 1e-6 });
    }
  });
});

describe('evaluateShifted with caller-held scratch', () => {
  it('two sections evaluated in turn, each with its own scratch, give what each gives alone', () => {
    const s1 = section();
    const s2 = { ...section(), horizons: section().horizons.slice(0, 3) };
    const p1 = prepareSection(s1), p2 = prepareSection(s2);
    if (!p1.ok || !p2.ok) throw new Error('sections rejected');
    const w1 = createEvaluationScratch(p1.prepared), w2 = createEvaluationScratch(p2.prepared);
    const adj = (k: number) => ({ regionalOffset: 10 * k, regionalTilt: 1e-5 * k });
    for (let k = 0; k < 5; k++) {
      const a = evaluateShifted(p1.prepared, adj(k), w1);
      const b = evaluateShifted(p2.prepared, adj(-k), w2);
      expect(a).toEqual(evaluateShifted(p1.prepared, adj(k)));
      expect(b).toEqual(evaluateShifted(p2.prepared, adj(-k)));
    }
  });
});
