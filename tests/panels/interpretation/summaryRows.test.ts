// The summary rows of the pane and the copied table: an exact line has no interval to show (a zero-width
// 95% interval reads like certainty); a scattered one shows the engine's intervals; the
// pane writes lengths as the results strip does.
import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { analyseSection, type SectionAnalysis } from '../../../src/core/analysis/analyseSection';
import type { Section } from '../../../src/core/model/section';
import { formatLength } from '../../../src/format/formatQuantity';
import { summaryRows } from '../../../src/panels/interpretation/summaryRows';
import { EXACT_FIT_TEXT, isExactFit } from '../../../src/core/analysis/isExactFit';
import { methodExample, triangleHorizon } from '../../core/analysis/sections';

function analyse(s: Section): SectionAnalysis {
  const out = analyseSection(s);
  if (!out.ok) throw new Error('analysis failed');
  return out.analysis;
}

const row = (a: SectionAnalysis, key: string) => summaryRows(a).find((r) => r.key === key)!;

/** the synthetic example of docs/method.md §Check values (our own) with the second horizon's area 0.1 km² too large: the points scatter. */
function scattered(): Section {
  const s = methodExample();
  s.horizons[1] = triangleHorizon('H2', 2.1e6, -1000, 10_000);
  return s;
}

describe('summaryRows(analysis)', () => {
  it('an exact line (the synthetic example of docs/method.md §Check values: s = 0, r² = 1) says "exact fit" once, beside r², and no zero-width interval', () => {
    const a = analyse(methodExample());
    expect(isExactFit(a.areaDepth)).toBe(true);
    expect(row(a, 'r2').interval).toBe(EXACT_FIT_TEXT);
    for (const key of ['displacement', 'detachment-depth', 'detachment-elevation']) expect(row(a, key).interval).toBe('');
  });

  it('a scattered line shows the Fieller and slope intervals of the data, rounded for the screen', () => {
    const a = analyse(scattered());
    expect(isExactFit(a.areaDepth)).toBe(false);
    // Independent of the engine: the scattered data (analytic triangle areas, depths 500…2000 m), the least-
    // squares line by its textbook sums, t from the registry package jstat 1.9.6, and the interval as the two
    // roots of (a + b x)² = t² s² (1/n + (x − x̄)²/Sxx) (Fieller 1954; docs/method.md §Fieller interval) and
    // D ± t s/√Sxx (docs/method.md §Slope interval).
    const h = [500, 1000, 1500, 2000];
    const A = [2.5e6, 2.1e6, 1.5e6, 1.0e6];
    const n = h.length;
    const hBar = h.reduce((s, v) => s + v, 0) / n;
    const aBar = A.reduce((s, v) => s + v, 0) / n;
    const sxx = h.reduce((s, v) => s + (v - hBar) ** 2, 0);
    const b = h.reduce((s, v, i) => s + (v - hBar) * (A[i] - aBar), 0) / sxx;
    const a0 = aBar - b * hBar;
    const s2 = A.reduce((s, v, i) => s + (v - a0 - b * h[i]) ** 2, 0) / (n - 2);
    const t = jStat.studentt.inv(0.975, n - 2);
    // (a0 + b x)² − t² s² (1/n + (x − x̄)²/Sxx) = 0 as q2 x² + q1 x + q0 = 0.
    const k = t * t * s2;
    const q2 = b * b - k / sxx;
    const q1 = 2 * a0 * b + (2 * k * hBar) / sxx;
    const q0 = a0 * a0 - k / n - (k * hBar * hBar) / sxx;
    const root = Math.sqrt(q1 * q1 - 4 * q2 * q0);
    const lo = (-q1 - root) / (2 * q2);
    const hi = (-q1 + root) / (2 * q2);
    const numbers = (text: string) => (text.match(/[−-]?[\d,.]+/g) ?? []).map((x) => Number(x.replace('−', '-').replace(/,/g, '')));
    const close = (shown: number[], expected: number[]) => expected.forEach((e, i) => expect(Math.abs(shown[i] - e)).toBeLessThanOrEqual(Math.abs(e) * 1e-3));
    close(numbers(row(a, 'detachment-depth').interval), [lo, hi]);
    close(numbers(row(a, 'detachment-elevation').interval), [-hi, -lo]);
    const half = (t * Math.sqrt(s2)) / Math.sqrt(sxx);
    close(numbers(row(a, 'displacement').interval), [-b - half, -b + half]);
    expect(lo).toBeLessThan(-a0 / b);
    expect(hi).toBeGreaterThan(-a0 / b);
  });

  it('two horizons: no interval (n = 2), which is not called an exact fit', () => {
    const s = methodExample();
    s.horizons = s.horizons.slice(0, 2);
    const a = analyse(s);
    expect(isExactFit(a.areaDepth)).toBe(false);
    expect(row(a, 'detachment-depth').interval).toBe('none (n = 2)');
  });

  it('the pane’s lengths are the strip’s: typographic minus, about four significant figures', () => {
    const a = analyse(methodExample());
    expect(row(a, 'detachment-elevation').text).toBe('−3000 m');
    expect(row(a, 'detachment-elevation').text).toBe(formatLength(-3000, 'm'));
    expect(row(a, 'displacement').text).toBe('1000 m');
    expect(formatLength(711.83, 'm')).toBe('711.8 m');
    expect(formatLength(null, 'm')).toBe('—');
  });
});
