import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { forwardSection } from '../../../src/core/forward/forwardSection';
import { demoSpec } from '../../../scripts/demo/demoSpec';
import { apply, invert, sectionToImage } from '../../../scripts/demo/layout';
import { digitiseByHand } from '../../../scripts/demo/digitiseByHand';
import { highestZAt, topography } from '../../../scripts/demo/topography';

const read = (name: string): unknown => JSON.parse(readFileSync(new URL(`../../../public/demo/${name}`, import.meta.url), 'utf8'));

describe('public/demo', () => {
  it('section.json is forwardSection(demoSpec) digitised by hand from the scan (run npm run make-demo after changing the demo)', () => {
    const exact = forwardSection(demoSpec).section;
    const t = sectionToImage();
    const surface = topography(exact.horizons[0].line, 0, 26000);
    expect(read('section.json')).toEqual(digitiseByHand(exact, t, invert(t), surface));
  });

  it('the land surface cuts the top horizon at the crest; that stretch, and only that, is marked projected', () => {
    const exact = forwardSection(demoSpec).section;
    const surface = topography(exact.horizons[0].line, 0, 26000);
    const demo = read('section.json') as ReturnType<typeof forwardSection>['section'];
    const top = demo.horizons[0];
    expect(top.projected?.length).toBe(1);
    const [from, to] = top.projected![0];
    expect(to - from).toBeGreaterThan(5);
    // Jitter can put an end vertex a few metres past the surface's ends: read the surface at the nearest end there.
    const surfaceZ = (x: number) => highestZAt(surface, Math.min(26000, Math.max(0, x)));
    // Jitter is 0.7 px (about 4.4 m in z at 0.16 px/m): inside the run the clicks are above the land
    // surface, outside it below, with the two outcrop clicks at the surface within a few jitters.
    for (let i = 0; i < top.line.length; i++) {
      const [x, z] = top.line[i];
      const dz = z - surfaceZ(x);
      if (i === from || i === to) expect(Math.abs(dz)).toBeLessThan(25);
      else if (i > from && i < to) expect(dz).toBeGreaterThan(0);
      else expect(dz).toBeLessThan(0);
    }
    // The lower horizons are nowhere eroded.
    for (const h of demo.horizons.slice(1)) {
      expect(h.projected).toBeUndefined();
      for (const [x, z] of h.line) expect(z).toBeLessThan(surfaceZ(x));
    }
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
