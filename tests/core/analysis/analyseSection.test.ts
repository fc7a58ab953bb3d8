import { describe, expect, it } from 'vitest';
import { analysePrepared, analyseSection, type SectionAnalysis } from '../../../src/core/analysis/analyseSection';
import { createPreparationBuffer } from '../../../src/core/analysis/preparationBuffer';
import { prepareSection, prepareSectionScratch } from '../../../src/core/analysis/prepareSection';
import type { Section, XZ } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';
import { analysisNotes } from '../../../src/format/analysisNotes';
import { methodExample, pts, triangleHorizon } from './sections';

function analysed(s: Section, options?: Parameters<typeof analyseSection>[1]): SectionAnalysis {
  const out = analyseSection(s, options);
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
  return out.analysis;
}

describe('analyseSection(section) on the synthetic example of docs/method.md §Check values', () => {
  // Source: the synthetic example of docs/method.md §Check values (our own): D = 1000 m, zd = 3000 m, h = 500…2000 m,
  // A = 2.5, 2.0, 1.5, 1.0 km²; slope −1000 m, intercept 3 km².
  const a = analysed(methodExample());

  it('returns the excess areas 2.5 … 1.0 km² and the depths 500 … 2000 m', () => {
    [2.5e6, 2.0e6, 1.5e6, 1.0e6].forEach((A, i) => expectClose(a.horizons[i].excessArea, A, 1e-12));
    [500, 1000, 1500, 2000].forEach((h, i) => expectClose(a.horizons[i].depth, h, 1e-12));
  });

  it('fits slope −1000 m, intercept 3 km², D = 1000 m, zd = 3000 m', () => {
    const d = a.areaDepth!;
    expect(d.n).toBe(4);
    expect(d.df).toBe(2);
    expectClose(d.slope, -1000, 1e-10);
    expectClose(d.intercept, 3e6, 1e-10);
    expectClose(d.displacement, 1000, 1e-10);
    expectClose(d.detachmentDepth!, 3000, 1e-10);
    expectClose(d.detachmentElevation!, -3000, 1e-10);
    expect(d.noDetachment).toBe(false);
    expectClose(d.r2, 1, 1e-12);
  });

  it('gives residuals near zero and intervals that shrink onto the exact answer', () => {
    a.horizons.forEach((h) => expect(Math.abs(h.residual!)).toBeLessThan(1e-6));
    const [lo, hi] = a.areaDepth!.detachmentDepthCI95!;
    expect(lo).toBeLessThanOrEqual(3000 + 1e-6);
    expect(hi).toBeGreaterThanOrEqual(3000 - 1e-6);
    expect(hi - lo).toBeLessThan(1e-3);
  });

  it('gives Chamberlin depth A/(L − W) and layer-parallel strain L/(W + D) − 1 per horizon', () => {
    // Source: Chamberlin (1910) H = A/(L − W); Groshong (2006) §11.4.3.2 e = L/(W + D) − 1 (docs/method.md §Chamberlin depth, §Layer-parallel strain).
    a.horizons.forEach((h, i) => {
      const A = [2.5e6, 2.0e6, 1.5e6, 1.0e6][i];
      const peak = (2 * A) / 10_000;
      const L = 2 * Math.hypot(5000, peak);
      expectClose(h.bedLength, L, 1e-12);
      expectClose(h.regionalLength, 10_000, 1e-15);
      expectClose(h.chamberlinDepth!, A / (L - 10_000), 1e-9);
      expectClose(h.lpsStrain!, L / (10_000 + 1000) - 1, 1e-9);
    });
  });

  it('keeps the detachment elevation when the reference defaults to the highest regional', () => {
    const s = methodExample();
    delete s.referenceElevation;
    const b = analysed(s);
    expect(b.referenceElevation).toBe(-500);
    expectClose(b.horizons[0].depth, 0, 0, { abs: 1e-12 });
    expectClose(b.areaDepth!.detachmentDepth!, 2500, 1e-10);
    expectClose(b.areaDepth!.detachmentElevation!, -3000, 1e-10);
  });

  it('takes the reference elevation from the options over the section', () => {
    const b = analysed(methodExample(), { referenceElevation: 1000 });
    expectClose(b.areaDepth!.detachmentDepth!, 4000, 1e-10);
    expectClose(b.areaDepth!.detachmentElevation!, -3000, 1e-10);
  });
});

describe('analyseSection(section) notes and degenerate fits', () => {
  it('excluded horizons are measured but left out of the fit', () => {
    const s = methodExample();
    s.horizons[3].include = false;
    s.horizons[3].line = pts(0, -2000, 5000, 0, 10_000, -2000);
    const a = analysed(s);
    expect(a.areaDepth!.n).toBe(3);
    expect(a.horizons[3].included).toBe(false);
    expect(a.horizons[3].residual).toBeNull();
    expectClose(a.areaDepth!.detachmentDepth!, 3000, 1e-10);
  });

  it('with two horizons gives the line but no intervals, and says so', () => {
    const s = methodExample();
    s.horizons = s.horizons.slice(0, 2);
    const a = analysed(s);
    expect(a.areaDepth!.n).toBe(2);
    expectClose(a.areaDepth!.detachmentDepth!, 3000, 1e-10);
    expect(a.areaDepth!.displacementCI95).toBeNull();
    expect(a.areaDepth!.detachmentDepthCI95).toBeNull();
    expect(a.notes.some((n) => n.includes('no intervals (0 degrees of freedom)'))).toBe(true);
  });

  it('with fewer than two included horizons gives areaDepth null and the reason, still ok', () => {
    const s = methodExample();
    s.horizons = s.horizons.slice(0, 1);
    const out = analyseSection(s);
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.analysis.areaDepth).toBeNull();
    expect(out.analysis.notes.some((n) => n.includes('Fewer than two usable horizons'))).toBe(true);
    expect(out.analysis.horizons[0].lpsStrain).toBeNull();
  });

  it('with all regionals at one depth gives areaDepth null and the reason, still ok', () => {
    const s: Section = { units: 'm', pins: [0, 1000], horizons: [triangleHorizon('A', 1e4, 0, 1000), triangleHorizon('B', 2e4, 0, 1000)] };
    const out = analyseSection(s);
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.analysis.areaDepth).toBeNull();
    expect(out.analysis.notes.some((n) => n.includes('lie at one depth (0 m)'))).toBe(true);
  });

  it('gives the one depth in the section unit', () => {
    // Regionals at z = −1000 ft below a reference at 0: one depth, 1000 ft.
    const s: Section = { units: 'ft', pins: [0, 1000], referenceElevation: 0, horizons: [triangleHorizon('A', 1e4, -1000, 1000), triangleHorizon('B', 2e4, -1000, 1000)] };
    const a = analysed(s);
    expect(a.areaDepth).toBeNull();
    expect(a.notes).toContain('All regionals in the fit lie at one depth (1000 ft): no area–depth line; it needs horizons at two or more depths.');
  });

  it('reports a positive slope as no detachment below these horizons, never as a depth', () => {
    // Areas grow with depth: slope +1000 m.
    const s = methodExample();
    const areas = [1e6, 1.5e6, 2.0e6, 2.5e6];
    s.horizons = [500, 1000, 1500, 2000].map((h, i) => triangleHorizon(`R${i}`, areas[i], -h, 10_000));
    const d = analysed(s).areaDepth!;
    expect(d.noDetachment).toBe(true);
    expect(d.detachmentDepth).toBeNull();
    expect(d.detachmentElevation).toBeNull();
    expect(d.detachmentDepthCI95).toBeNull();
    expect(analysed(s).notes.some((n) => n.includes('no detachment below these horizons'))).toBe(true);
    expect(analysed(s).horizons.every((h) => h.lpsStrain === null)).toBe(true);
  });

  it('reports an unbounded Fieller interval when the scatter hides the slope', () => {
    // Areas 2.0, 1.0, 2.1, 0.9 km² at 500 … 2000 m: the slope is small beside the scatter, so g ≥ 1.
    const areas = [2.0e6, 1.0e6, 2.1e6, 0.9e6];
    const s: Section = { units: 'm', pins: [0, 10_000], referenceElevation: 0, horizons: [500, 1000, 1500, 2000].map((h, i) => triangleHorizon(`U${i}`, areas[i], -h, 10_000)) };
    const a = analysed(s);
    expect(a.areaDepth!.detachmentDepthInterval.kind).toBe('unbounded');
    expect(a.areaDepth!.detachmentDepthCI95).toBeNull();
    // By hand (least squares on h = 500…2000, common practice): x̄ = 1250, Sxx = 1.25e6, b = −440,
    // SSE = 0.978e12, s² = SSE/2; t(0.975, 2) = 4.303 (NIST/SEMATECH e-Handbook §1.3.6.7.2);
    // g = t² s² / (b² Sxx) (docs/method.md §Fieller interval) = 37.4.
    const g = (4.303 ** 2 * (0.978e12 / 2)) / (440 ** 2 * 1.25e6);
    expect(g.toPrecision(3)).toBe('37.4');
    const interval = a.areaDepth!.detachmentDepthInterval;
    if (interval.kind !== 'unbounded') throw new Error('bounded');
    expectClose(interval.g, g, 2e-3);
    // The note is written from g by the one number rule (src/format/analysisNotes.ts): three figures.
    expect(analysisNotes(a).filter((n) => n.includes('unbounded'))).toEqual(['The 95% Fieller interval on the detachment depth is unbounded (g = 37.4 ≥ 1): the slope is not clearly different from zero, so the data do not bound the depth.']);
    expect(a.notes.some((n) => n.includes('unbounded'))).toBe(false);
  });

  it('gives no Chamberlin depth when the bed is no longer than its regional', () => {
    const s: Section = { units: 'ft', pins: [0, 100], horizons: [{ name: 'Flat', line: pts(0, 5, 100, 5), regional: pts(0, 0, 100, 0) }] };
    const a = analysed(s);
    expect(a.horizons[0].chamberlinDepth).toBeNull();
    expect(a.horizons[0].excessArea).toBe(500);
    expect(a.units).toBe('ft');
  });

  it('measures the regional length along an inclined regional', () => {
    // Source: Groshong (2006) §11.4.3 (docs/method.md §Lengths): W is measured parallel to the regional, W0/cos(dip).
    const s: Section = { units: 'm', pins: [0, 1000], horizons: [{ name: 'Dip', line: pts(-10, -1, 0, 0, 500, 150, 1000, 100, 1010, 101), regional: pts(-10, -1, 1010, 101) }] };
    const h = analysed(s).horizons[0];
    expectClose(h.regionalLength, 1000 * Math.hypot(1, 0.1), 1e-12);
    expectClose(h.regionalElevation, 50, 1e-12);
    // Analytic: triangle of height 150 − 50 = 100 above the regional at x = 500: ½·1000·100.
    expectClose(h.excessArea, 50_000, 1e-12);
  });
});

describe('analyseSection(section) projected runs', () => {
  // A box fold whose crest (vertices 2..3) is projected: the crest carries 100·40 = 4000 of the 5000 (analytic).
  const s: Section = { units: 'm', pins: [0, 100], horizons: [{ name: 'Eroded', line: pts(0, 0, 20, 0, 30, 100, 70, 100, 80, 0, 100, 0), regional: pts(0, 0, 100, 0), projected: [[2, 3]] }] };

  it('gives the projected length and the share of area the projected run carries, and flags it', () => {
    const a = analysed(s);
    expect(a.horizons[0].projectedLength).toBe(40);
    expectClose(a.horizons[0].projectedAreaShare, 0.8, 1e-15);
    // The share and length are data; src/format/analysisNotes.ts writes the note (tests/format/analysisNotes.test.ts).
    expect(a.notes.some((n) => n.includes('projected'))).toBe(false);
  });

  it('keeps the projected share when the horizon is given right to left', () => {
    const r = structuredClone(s);
    r.horizons[0].line!.reverse();
    r.horizons[0].projected = [[2, 3]];
    const a = analysed(r);
    expect(a.horizons[0].projectedLength).toBe(40);
    expectClose(a.horizons[0].projectedAreaShare, 0.8, 1e-15);
  });

  it('counts only the part of a projected run between the pins', () => {
    // The projected run (-50, 0)-(50, 100) is cut at x = 0, z = 50: inside it carries ∫₀⁵⁰ (50 + x) dx = 3750.
    const t: Section = { units: 'm', pins: [0, 100], horizons: [{ name: 'Cut', line: pts(-50, 0, 50, 100, 100, 0), regional: pts(-50, 0, 100, 0), projected: [[0, 1]] }] };
    const h = analysed(t).horizons[0];
    expectClose(h.projectedLength, Math.hypot(50, 50), 1e-14);
    // Total A = 3750 + ½·50·100 = 6250; share = 3750 / 6250.
    expectClose(h.excessArea, 6250, 1e-14);
    expectClose(h.projectedAreaShare, 0.6, 1e-14);
  });
});

describe('analyseSection(section) called again and again', () => {
  it('leaves an earlier analysis and its prepared lines untouched by a later one with the same buffer', () => {
    // The validated points are written into the caller's buffer; the results must not share it.
    const buffer = createPreparationBuffer();
    const first = analysed(methodExample(), { buffer });
    const prepared = prepareSection(methodExample(), {}, buffer);
    const before = JSON.stringify([first, prepared], (_k, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v));
    const other = methodExample();
    other.horizons.forEach((h) => h.line.forEach((p) => { p[1] -= 777; }));
    analysed(other, { buffer });
    prepareSection(other, {}, buffer);
    expect(JSON.stringify([first, prepared], (_k, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v))).toBe(before);
  });
});


describe('analyseSection and prepareSection share a caller-held buffer safely', () => {
  it('analyseSection(s2) leaves the arrays of an earlier prepareSection(s1) untouched, and gives the same numbers as analysePrepared', () => {
    // Our own check of the buffer's lifetime: prepareSection's lines are kept by the live view, analyseSection's are scratch.
    const buffer = createPreparationBuffer();
    const s1 = methodExample();
    const kept = prepareSection(s1, {}, buffer);
    if (!kept.ok) throw new Error('methodExample rejected');
    const before = kept.prepared.horizons.map((h) => [Array.from(h.line.xs), Array.from(h.line.zs), Array.from(h.regional.zs)]);
    const s2: Section = { ...s1, horizons: s1.horizons.map((h) => ({ ...h, line: h.line.map(([x, z]): XZ => [x, z + 123]) })) };
    const scratch = analyseSection(s2, { buffer });
    analyseSection(s1, { buffer });
    expect(kept.prepared.horizons.map((h) => [Array.from(h.line.xs), Array.from(h.line.zs), Array.from(h.regional.zs)])).toEqual(before);
    const fresh = prepareSection(s2);
    if (!scratch.ok || !fresh.ok) throw new Error('s2 rejected');
    expect(scratch.analysis).toEqual(analysePrepared(fresh.prepared));
  });
});

describe('prepareSectionScratch(section, options, buffer) and prepareSection(section)', () => {
  it('scratch lines come from the caller-held buffer, kept lines from buffers of their own', () => {
    // Our own check of where the arrays live (the buffer grows to fit, then is reused).
    const s = methodExample();
    const buffer = createPreparationBuffer(16);
    for (let k = 0; k < 3; k++) prepareSectionScratch(s, {}, buffer);
    const a = prepareSectionScratch(s, {}, buffer);
    const b = prepareSectionScratch(s, {}, buffer);
    const kept = prepareSection(s, {}, buffer);
    if (!a.ok || !b.ok || !kept.ok) throw new Error('methodExample rejected');
    expect(a.prepared.horizons[0].line.xs.buffer).toBe(b.prepared.horizons[0].line.xs.buffer);
    expect(a.prepared.horizons[0].line.xs.buffer).toBe(a.prepared.horizons[3].regional.zs.buffer);
    expect(kept.prepared.horizons[0].line.xs.buffer).not.toBe(a.prepared.horizons[0].line.xs.buffer);
    expect(kept.prepared.horizons[0].line.xs.buffer).not.toBe(kept.prepared.horizons[1].line.xs.buffer);
  });
});
