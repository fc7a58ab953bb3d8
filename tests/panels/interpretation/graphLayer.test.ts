// The graph's canvas layer during a gesture: the axes it keeps and when it must render instead, checked on the
// synthetic example of docs/method.md §Check values (detachment 3000 m below the reference).
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { areaDepthSeries, type AreaDepthSeries } from '../../../src/panels/interpretation/areaDepthSeries';
import { detachmentLabels, graphFit, graphFrame, graphShape, unionFrame, type GraphSeriesSpec } from '../../../src/panels/interpretation/graphLayer';
import { methodExample } from '../../core/analysis/sections';

function exampleSeries(): AreaDepthSeries {
  const out = analyseSection(methodExample());
  if (!out.ok) throw new Error('analysis failed');
  return areaDepthSeries(out.analysis, out.analysis.horizons.map((_, i) => `h${i}`));
}

const spec = (series: AreaDepthSeries): GraphSeriesSpec[] => [{ key: 's', label: 'Base', colour: '#1f6f8b', series }];

/** The same series with every excess area scaled: its points leave axes made for the original. */
const scaled = (s: AreaDepthSeries, k: number): AreaDepthSeries => ({ ...s, points: s.points.map((p) => ({ ...p, area: p.area * k })) });

/** Whether the ticks step evenly by 1, 2 or 5 times a power of ten (the 1-2-5 rule, common practice) inside [lo, hi]. */
function isOneTwoFive(ticks: number[], lo: number, hi: number): boolean {
  if (ticks.length < 2) return false;
  const step = ticks[1] - ticks[0];
  const mantissa = step / 10 ** Math.floor(Math.log10(step));
  const even = ticks.every((t, i) => i === 0 || Math.abs(t - ticks[i - 1] - step) <= 1e-9 * step);
  return even && [1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-9) && ticks[0] >= lo - 1e-9 * step && ticks[ticks.length - 1] <= hi + 1e-9 * step;
}

describe('graphShape(series, frame, dataOnly, units)', () => {
  it('in its own axes a series fits; with its areas four times as large it does not, and only the fit changes', () => {
    const s = exampleSeries();
    const frame = graphFrame(spec(s), false, 'm', 300)!;
    expect(graphFit(spec(s), frame, false, 'm')!.within).toBe(true);
    const bigger = graphFit(spec(scaled(s, 4)), frame, false, 'm')!;
    expect(bigger.within).toBe(false);
    expect(bigger.parts).toBe(graphFit(spec(s), frame, false, 'm')!.parts);
    expect(graphShape(spec(scaled(s, 4)), frame, false, 'm')).not.toBe(graphShape(spec(s), frame, false, 'm'));
    // Smaller areas still fit the axes kept: the graph holds them rather than rendering.
    expect(graphShape(spec(scaled(s, 0.9)), frame, false, 'm')).toBe(graphShape(spec(s), frame, false, 'm'));
  });
});

describe('unionFrame(a, b, height)', () => {
  it('spans both axes, so both series fit, with 1-2-5 ticks inside its domain', () => {
    const s = exampleSeries();
    const a = graphFrame(spec(s), false, 'm', 300)!;
    const b = graphFrame(spec(scaled(s, 4)), false, 'm', 300)!;
    const u = unionFrame(a, b, 300);
    for (const f of [a, b]) {
      expect(u.domain.area[0]).toBeLessThanOrEqual(f.domain.area[0]);
      expect(u.domain.area[1]).toBeGreaterThanOrEqual(f.domain.area[1]);
      expect(u.domain.depth[0]).toBeLessThanOrEqual(f.domain.depth[0]);
      expect(u.domain.depth[1]).toBeGreaterThanOrEqual(f.domain.depth[1]);
    }
    expect(graphFit(spec(s), u, false, 'm')!.within).toBe(true);
    expect(graphFit(spec(scaled(s, 4)), u, false, 'm')!.within).toBe(true);
    const f = u.domain.unit.factor;
    expect(isOneTwoFive(u.domain.areaTicks, u.domain.area[0] * f, u.domain.area[1] * f)).toBe(true);
    expect(isOneTwoFive(u.domain.depthTicks, u.domain.depth[0], u.domain.depth[1])).toBe(true);
    // The scales map the domain's ends to the plot's edges.
    expect(u.ys.map(u.domain.depth[0])).toBeCloseTo(14, 9);
    expect(u.ys.map(u.domain.depth[1])).toBeCloseTo(300 - 40, 9);
  });
});

describe('detachmentLabels(series, units, interactive)', () => {
  it('the label the SVG keeps reads the detachment of the example, 3000 m (docs/method.md §Check values)', () => {
    const labels = detachmentLabels(spec(exampleSeries()), 'm', true);
    expect(labels).toHaveLength(1);
    expect(labels[0]).toMatch(/^detachment 3000 m/);
  });
});
