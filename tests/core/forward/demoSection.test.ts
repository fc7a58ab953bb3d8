import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { forwardSection } from '../../../src/core/forward/forwardSection';
import { demoSpec } from '../../../scripts/demo/demoSpec';
import { apply, invert, sectionToImage } from '../../../scripts/demo/layout';
import { digitiseByHand } from '../../../scripts/demo/digitiseByHand';

const read = (name: string): unknown => JSON.parse(readFileSync(new URL(`../../../public/demo/${name}`, import.meta.url), 'utf8'));

describe('public/demo', () => {
  it('section.json is forwardSection(demoSpec) digitised by hand from the scan (run npm run make-demo after changing the demo)', () => {
    const exact = forwardSection(demoSpec).section;
    const t = sectionToImage();
    expect(read('section.json')).toEqual(digitiseByHand(exact, t, invert(t)));
  });

  it('the digitised demo scatters about the truth: a real interval that holds truth.json, close to it', () => {
    const truth = read('truth.json') as { units: string; displacement: number; detachmentElevation: number };
    const outcome = analyseSection(read('section.json') as ReturnType<typeof forwardSection>['section']);
    if (!outcome.ok) throw new Error(outcome.problems.map((p) => p.message).join('; '));
    const ad = outcome.analysis.areaDepth!;
    expect(outcome.analysis.units).toBe(truth.units);
    // Not an exact fit: scatter, and a bounded Fieller interval (Fieller 1954) that contains the truth.
    expect(ad.r2).toBeLessThan(0.99999);
    expect(ad.r2).toBeGreaterThan(0.999);
    const ci = ad.detachmentDepthCI95!;
    const truthDepth = outcome.analysis.referenceElevation - truth.detachmentElevation;
    expect(ci[0]).toBeLessThan(truthDepth);
    expect(ci[1]).toBeGreaterThan(truthDepth);
    // Digitising at 0.7 px (about 4 m in z) keeps the answer within 1 % of the forward model's.
    expect(Math.abs(ad.detachmentElevation! - truth.detachmentElevation) / truthDepth).toBeLessThan(0.01);
    expect(Math.abs(ad.displacement / truth.displacement - 1)).toBeLessThan(0.01);
  });

  it('forwardSection(demoSpec) itself returns truth.json to ~1e-9 (forward-model round trip, docs/method.md §Forward models)', () => {
    const truth = read('truth.json') as { units: string; displacement: number; detachmentElevation: number };
    const outcome = analyseSection(forwardSection(demoSpec).section);
    if (!outcome.ok) throw new Error(outcome.problems.map((p) => p.message).join('; '));
    const ad = outcome.analysis.areaDepth!;
    expect(Math.abs(ad.displacement / truth.displacement - 1)).toBeLessThan(1e-9);
    expect(Math.abs(ad.detachmentElevation! / truth.detachmentElevation - 1)).toBeLessThan(1e-9);
  });

  it('calibration.json: both directions are inverse, control points agree, vertical scale is VE × horizontal', () => {
    const c = read('calibration.json') as {
      verticalExaggeration: number; sectionToImage: { u: number[]; v: number[] }; imageToSection: { x: number[]; z: number[] };
      controlPoints: { u: number; v: number; x: number; z: number }[];
    };
    const fwd = { a: c.sectionToImage.u[0], b: c.sectionToImage.u[1], c: c.sectionToImage.u[2], d: c.sectionToImage.v[0], e: c.sectionToImage.v[1], f: c.sectionToImage.v[2] };
    const inv = { a: c.imageToSection.x[0], b: c.imageToSection.x[1], c: c.imageToSection.x[2], d: c.imageToSection.z[0], e: c.imageToSection.z[1], f: c.imageToSection.z[2] };
    expect(fwd).toEqual(sectionToImage());
    for (const p of c.controlPoints) {
      const [u, v] = apply(fwd, [p.x, p.z]);
      expect(Math.hypot(u - p.u, v - p.v)).toBeLessThan(1e-9);
      const [x, z] = apply(inv, [p.u, p.v]);
      expect(Math.hypot(x - p.x, z - p.z)).toBeLessThan(1e-6);
    }
    expect(invert(fwd).a).toBeCloseTo(inv.a, 15);
    // Column norms of the affine are the per-axis scales (a rotation leaves them unchanged).
    const sx = Math.hypot(fwd.a, fwd.d);
    const sz = Math.hypot(fwd.b, fwd.e);
    expect(sz / sx).toBeCloseTo(c.verticalExaggeration, 12);
  });
});
