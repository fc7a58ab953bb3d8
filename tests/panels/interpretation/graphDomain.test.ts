// The area–depth graph's axes: one horizon, or all points at one depth or area, gets a readable span
// (not a depth axis of 0 to 0.06 m); a normal fit is shown with its detachment.
import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../../src/core/analysis/analyseSection';
import type { Section } from '../../../src/core/model/section';
import { areaDepthSeries } from '../../../src/panels/interpretation/areaDepthSeries';
import { graphDomain } from '../../../src/panels/interpretation/graphDomain';
import { methodExample, triangleHorizon } from '../../core/analysis/sections';

function analyse(s: Section): SectionAnalysis {
  const out = analyseSection(s);
  if (!out.ok) throw new Error('analysis failed');
  return out.analysis;
}

const series = (s: Section) => {
  const a = analyse(s);
  return areaDepthSeries(a, a.horizons.map((_, i) => `h${i}`));
};

describe('graphDomain(series, dataOnly, units)', () => {
  it('one horizon at the reference (depth 0): the depth axis spans at least 200 m from 0, the area axis 0 to its area', () => {
    const s: Section = { units: 'm', pins: [0, 10_000], horizons: [triangleHorizon('H1', 2.028e6, 0, 10_000)] };
    for (const dataOnly of [false, true]) {
      const d = graphDomain([series(s)], dataOnly, 'm')!;
      expect(d.depth[0]).toBe(0);
      expect(d.depth[1] - d.depth[0]).toBeGreaterThanOrEqual(200);
      expect(d.area[0]).toBeLessThanOrEqual(dataOnly ? 2.028e6 : 0);
      expect(d.area[1]).toBeGreaterThanOrEqual(2.028e6);
      // Some span around a single area too: at least 10% of it.
      expect(d.area[1] - d.area[0]).toBeGreaterThanOrEqual(0.1 * 2.028e6);
    }
  });

  it('all horizons at one depth: a depth span of at least 10% of the depth (or 200 m), in feet at least 500 ft', () => {
    const at = (units: 'm' | 'ft'): Section => ({
      units, pins: [0, 10_000], referenceElevation: 0,
      horizons: [triangleHorizon('H1', 1e6, -3000, 10_000), triangleHorizon('H2', 2e6, -3000, 10_000)],
    });
    const m = graphDomain([series(at('m'))], true, 'm')!;
    expect(m.depth[0]).toBeLessThanOrEqual(3000);
    expect(m.depth[1]).toBeGreaterThanOrEqual(3000);
    expect(m.depth[1] - m.depth[0]).toBeGreaterThanOrEqual(300);
    const ft = graphDomain([series({ ...at('ft'), horizons: at('ft').horizons.map((h) => ({ ...h, line: h.line!.map(([x, z]) => [x, z / 100]), regional: h.regional.map(([x, z]) => [x, z / 100]) })) })], true, 'ft')!;
    expect(ft.depth[1] - ft.depth[0]).toBeGreaterThanOrEqual(500);
  });

  it('the synthetic example of docs/method.md §Check values: the points and the detachment at 3000 m, from the reference down', () => {
    const d = graphDomain([series(methodExample())], false, 'm')!;
    expect(d.depth[0]).toBe(0);
    expect(d.depth[1]).toBeGreaterThanOrEqual(3000);
    expect(d.depth[1]).toBeLessThan(4000);
    expect(d.area[0]).toBeLessThanOrEqual(0);
    expect(d.area[1]).toBeGreaterThanOrEqual(2.5e6);
  });
});

describe('areaDepthSeries(analysis, ids, referenceElevation)', () => {
  it('below another reference: depths shift by the difference, the detachment elevation stays (the synthetic example of docs/method.md §Check values)', () => {
    // zref 0 → −500: h' = h − 500, so zd' = 3000 − 500 = 2500 m and the elevation −500 − 2500 = −3000 m as before.
    const a = analyse(methodExample());
    const s = areaDepthSeries(a, ['a', 'b', 'c', 'd'], -500);
    expect(s.referenceElevation).toBe(-500);
    expect(s.points.map((p) => p.depth)).toEqual([0, 500, 1000, 1500]);
    expect(s.fit.result!.detachmentDepth!).toBeCloseTo(2500, 6);
    expect(s.fit.result!.detachmentElevation!).toBeCloseTo(-3000, 6);
    expect(s.fit.result!.displacement).toBeCloseTo(1000, 6);
  });
});
