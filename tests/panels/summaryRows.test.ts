// The summary rows of the pane and the copied table: an exact line has no interval to show (a zero-width
// 95% interval reads like certainty); a scattered one shows the engine's intervals; the
// pane writes lengths as the results strip does.
import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../src/core/analysis/analyseSection';
import type { Section } from '../../src/core/model/section';
import { screenLength, SCREEN_FORMAT } from '../../src/panels/interpretation/screenQuantity';
import { summaryRows } from '../../src/panels/interpretation/summaryRows';
import { EXACT_FIT_TEXT, isExactFit } from '../../src/core/analysis/isExactFit';
import { methodExample, triangleHorizon } from '../core/analysis/sections';

function analyse(s: Section): SectionAnalysis {
  const out = analyseSection(s);
  if (!out.ok) throw new Error('analysis failed');
  return out.analysis;
}

const row = (a: SectionAnalysis, key: string, fmt = SCREEN_FORMAT) => summaryRows(a, fmt).find((r) => r.key === key)!;

/** the synthetic example of docs/method.md §Check values (our own) with the second horizon's area 0.1 km² too large: the points scatter. */
function scattered(): Section {
  const s = methodExample();
  s.horizons[1] = triangleHorizon('H2', 2.1e6, -1000, 10_000);
  return s;
}

describe('summaryRows(analysis, format)', () => {
  it('an exact line (the synthetic example of docs/method.md §Check values: s = 0, r² = 1) says "exact fit" once, beside r², and no zero-width interval', () => {
    const a = analyse(methodExample());
    expect(isExactFit(a.areaDepth)).toBe(true);
    expect(row(a, 'r2').interval).toBe(EXACT_FIT_TEXT);
    for (const key of ['displacement', 'detachment-depth', 'detachment-elevation']) expect(row(a, key).interval).toBe('');
  });

  it('a scattered line shows the engine’s Fieller and slope intervals, rounded as the strip rounds', () => {
    const a = analyse(scattered());
    const ad = a.areaDepth!;
    expect(isExactFit(ad)).toBe(false);
    const f = ad.detachmentDepthInterval;
    if (f.kind !== 'bounded') throw new Error(`expected a bounded interval, got ${f.kind}`);
    expect(row(a, 'detachment-depth').interval).toBe(`${SCREEN_FORMAT.num(f.lo)} to ${SCREEN_FORMAT.num(f.hi)} m`);
    expect(row(a, 'detachment-elevation').interval).toBe(`${SCREEN_FORMAT.num(a.referenceElevation - f.hi)} to ${SCREEN_FORMAT.num(a.referenceElevation - f.lo)} m`);
    expect(row(a, 'displacement').interval).toBe(`${SCREEN_FORMAT.num(ad.displacementCI95![0])} to ${SCREEN_FORMAT.num(ad.displacementCI95![1])} m`);
    // The interval brackets the estimate (Fieller's interval contains x̂0 when bounded).
    expect(f.lo).toBeLessThan(ad.detachmentDepth!);
    expect(f.hi).toBeGreaterThan(ad.detachmentDepth!);
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
    expect(row(a, 'detachment-elevation').text).toBe(screenLength(-3000, 'm'));
    expect(row(a, 'displacement').text).toBe('1000 m');
    expect(screenLength(711.83, 'm')).toBe('711.8 m');
    expect(screenLength(null, 'm')).toBe('—');
  });
});
