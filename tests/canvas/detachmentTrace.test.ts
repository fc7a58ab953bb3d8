import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../src/core/analysis/analyseSection';
import type { Section } from '../../src/core/model/section';
import { detachmentTrace } from '../../src/canvas/detachmentTrace';
import { methodExample } from '../core/analysis/sections';
import { expectClose } from '../expectClose';

function trace(s: Section) {
  const out = analyseSection(s);
  if (!out.ok) throw new Error('analysis failed');
  return detachmentTrace(s, out.analysis);
}

describe('detachmentTrace(section, analysis)', () => {
  it('draws the synthetic example’s (docs/method.md §Check values) detachment flat at −3000 m over the pins widened a little', () => {
    // Source: the synthetic example of docs/method.md §Check values (our own): zd = 3000 m below a reference at 0 m, flat regionals.
    const t = trace(methodExample())!;
    expect(t.trend).toBe(0);
    for (const [, z] of t.line) expectClose(z, -3000, 1e-10);
    expect(t.line[0][0]).toBeLessThan(0);
    expect(t.line[1][0]).toBeGreaterThan(10_000);
    // The example is an exact line through four points: no scatter, so no zero-width interval to show.
    expect(t.elevationInterval).toBe('exact');
    // The label's anchor: on the line where it crosses the left pin.
    expect(t.atLeftPin[0]).toBe(0);
    expectClose(t.atLeftPin[1], -3000, 1e-10);
  });

  it('follows the mean regional dip and keeps the estimate at the middle of the pins', () => {
    // Tilt every regional (and its horizon) by 0.01 about the pins' middle: areas and mean elevations are unchanged.
    const s = methodExample();
    const tilt = (x: number) => 0.01 * (x - 5000);
    s.horizons = s.horizons.map((h) => ({ ...h, line: h.line!.map(([x, z]) => [x, z + tilt(x)]), regional: h.regional.map(([x, z]) => [x, z + tilt(x)]) }));
    const t = trace(s)!;
    expectClose(t.trend, 0.01, 1e-12);
    const [[x0, z0], [x1, z1]] = t.line;
    expectClose(z0 + ((z1 - z0) * (5000 - x0)) / (x1 - x0), -3000, 1e-9);
    // At the left pin (x = 0) the line is 0.01 · 5000 m below its middle.
    expectClose(t.atLeftPin[1], -3050, 1e-9);
  });

  it('returns null when there is no detachment', () => {
    const s = methodExample();
    s.horizons = s.horizons.slice(0, 1);
    expect(trace(s)).toBeNull();
  });
});
