import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { monteCarlo, type MonteCarloOptions, type MonteCarloResult } from '../../../src/core/analysis/monteCarlo';
import { sectionPerturbation } from '../../../src/core/analysis/perturbSection';
import { faultedSection } from '../../../src/core/forward/faultedSection';
import { nearestOnPolyline } from '../../../src/core/geometry/nearestOnPolyline';
import type { Section, XZ } from '../../../src/core/model/section';
import { validateSectionArrays } from '../../../src/core/model/validateSectionArrays';
import { seededRandom } from '../../../src/core/stats/seededRandom';
import { expectClose } from '../../expectClose';

// The vertex method of the Monte Carlo on a faulted section. The source is the faulted forward model
// (vertical simple shear, Gibbs 1983; src/core/forward/faultedSection.ts), whose detachment depth is
// known analytically: a thrust carrying the hanging wall D = 1500 m over a ramp, so every horizon is in
// two pieces whose ends (the cutoffs) lie on the fault.
const RAMP: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];
const LEVELS = [500, -500, -1500, -2500].map((r, i) => ({ name: `L${i}`, regionalElevation: r }));

function model(rightToLeft = false) {
  return faultedSection({ units: 'm', pins: [0, 20000], displacement: 1500, fault: RAMP, faultName: 'Main thrust', horizons: LEVELS, rightToLeft });
}

function run(section: Section, options: MonteCarloOptions): MonteCarloResult {
  const out = monteCarlo(section, options);
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
  return out.result;
}

const VERTICES: MonteCarloOptions = { runs: 300, seed: 11, sigmaVertex: 5, method: 'vertices' };

describe('monteCarlo vertex method on a faulted section', () => {
  it('succeeds in every realisation, digitised either way, and brackets the analytic depth', () => {
    for (const rightToLeft of [false, true]) {
      const { section, truth } = model(rightToLeft);
      const r = run(section, VERTICES);
      expect(r.valid).toBe(VERTICES.runs);
      expect(r.failedShare).toBe(0);
      // The unperturbed estimate is the forward model's analytic detachment depth.
      expectClose(r.pointEstimate!.detachmentDepth!, truth.detachmentDepth, 1e-9);
      expect(r.depth!.p10).toBeLessThan(truth.detachmentDepth);
      expect(r.depth!.p90).toBeGreaterThan(truth.detachmentDepth);
      expect(r.depth!.sd).toBeGreaterThan(0);
    }
  });

  it('with zero error the perturbed section analyses exactly as the section itself', () => {
    const { section } = model();
    const perturb = sectionPerturbation(section);
    const rng = seededRandom(3);
    const same = perturb(0, rng.normal);
    expect(same.faults).toEqual(section.faults);
    expect(same.horizons).toEqual(section.horizons);
    const a = analyseSection(section), b = analyseSection(same);
    if (!a.ok || !b.ok) throw new Error('analysis failed');
    expect(b.analysis).toEqual(a.analysis);
    expect(b.analysis.horizons.map((h) => h.excessArea)).toEqual(a.analysis.horizons.map((h) => h.excessArea));
    // And the Monte Carlo with every σ at zero returns the unperturbed analysis in every run.
    const r = run(section, { runs: 20, seed: 5, sigmaVertex: 0, method: 'vertices' });
    expect(r.valid).toBe(20);
    const point = r.pointEstimate!.detachmentDepth!;
    expect(Number.isFinite(point)).toBe(true);
    for (const d of r.depths) expect(d).toBe(point);
  });

  it('perturbs the fault vertices by σ and keeps every cutoff on the perturbed fault', () => {
    const { section } = model();
    const sigma = 5;
    const perturb = sectionPerturbation(section);
    const rng = seededRandom(21);
    const shifts: number[] = [];
    for (let draw = 0; draw < 200; draw++) {
      const s = perturb(sigma, rng.normal);
      expect(validateSectionArrays(s).ok).toBe(true);
      const fault = s.faults![0].line;
      fault.forEach(([x, z], i) => {
        expect(x).toBe(RAMP[i][0]);
        shifts.push(z - RAMP[i][1]);
      });
      const xs = fault.map((p) => p[0]), zs = fault.map((p) => p[1]);
      for (const h of s.horizons) {
        const [a, b] = h.pieces!;
        for (const [x, z] of [a[a.length - 1], b[0]]) expect(nearestOnPolyline(xs, zs, x, z)!.distance).toBeLessThan(1e-9);
      }
    }
    // The shifts are N(0, σ²): 1,200 draws give the sample SD within a few per cent of σ.
    const mean = shifts.reduce((t, v) => t + v, 0) / shifts.length;
    const sd = Math.sqrt(shifts.reduce((t, v) => t + (v - mean) ** 2, 0) / (shifts.length - 1));
    expect(Math.abs(mean)).toBeLessThan(0.5);
    expect(Math.abs(sd / sigma - 1)).toBeLessThan(0.1);
  });

  it('carries the drawn fault vertices into every joined line between the cutoffs', () => {
    // A realisation checked directly: the joined line's stretch along the fault passes through the
    // perturbed fault's own vertices, not the digitised ones.
    const { section } = model();
    const s = sectionPerturbation(section)(5, seededRandom(8).normal);
    const v = validateSectionArrays(s);
    if (!v.ok) throw new Error('perturbed section did not validate');
    const fault = s.faults![0].line;
    let checked = 0;
    for (const h of v.section.horizons) {
      const seg = h.faultSegments!;
      // A vertex with fault segments on both sides is a fault vertex strictly between the cutoffs.
      for (let i = 1; i + 1 < h.lineX.length; i++) {
        if (!seg[i - 1] || !seg[i]) continue;
        const k = fault.findIndex(([x]) => x === h.lineX[i]);
        expect(k).toBeGreaterThanOrEqual(0);
        expect(h.lineZ[i]).toBe(fault[k][1]);
        expect(h.lineZ[i]).not.toBe(RAMP[k][1]);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(0);
  });

  it('is reproducible for a seed and differs between seeds', () => {
    const { section } = model();
    const a = run(section, VERTICES), b = run(section, VERTICES), c = run(section, { ...VERTICES, seed: 12 });
    expect(Array.from(b.depths)).toEqual(Array.from(a.depths));
    expect(Array.from(c.depths)).not.toEqual(Array.from(a.depths));
  });
});
