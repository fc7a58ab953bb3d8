import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../src/core/analysis/analyseSection';
import { formatTable } from '../../src/cli/formatTable';
import { toJsonReport } from '../../src/cli/toJsonReport';
import type { Section } from '../../src/core/model/section';
import { methodExample, triangleHorizon } from '../core/analysis/sections';

function analysed(s: Section): SectionAnalysis {
  const out = analyseSection(s);
  if (!out.ok) throw new Error(out.problems[0].message);
  return out.analysis;
}

/** Triangle folds of the given excess areas (m²) over flat regionals at depths 500, 1000, … m, pins 0–10 000. */
function folds(areas: number[]): Section {
  return { units: 'm', pins: [0, 10_000], referenceElevation: 0, horizons: areas.map((A, i) => triangleHorizon(`F${i + 1}`, A, -500 * (i + 1), 10_000)) };
}

describe('formatTable(analysis)', () => {
  it('prints the bounded intervals as numbers for the synthetic example of docs/method.md §Check values', () => {
    // Source: the synthetic example of docs/method.md §Check values: an exact line, so both intervals close onto D = 1000 m and zd = 3000 m.
    const t = formatTable(analysed(methodExample()));
    expect(t).toContain('Displacement D = 1000 m (95%: 1000 to 1000)');
    expect(t).toContain('Detachment depth 3000 m below the reference, elevation -3000 m (95% Fieller: 3000 to 3000)');
  });

  it('prints "unbounded" when g ≥ 1, never a number (docs/method.md §Fieller interval)', () => {
    // Areas scattered about a weak slope: g = 37.4 (worked by hand in analyseSection.test.ts).
    const a = analysed(folds([2.0e6, 1.0e6, 2.1e6, 0.9e6]));
    expect(a.areaDepth!.detachmentDepthInterval.kind).toBe('unbounded');
    expect(formatTable(a)).toMatch(/Detachment depth [-\d.]+ m below the reference, elevation [-\d.]+ m \(95% Fieller: unbounded\)/);
  });

  it('prints "none (n = 2)" for both intervals with two horizons', () => {
    // docs/method.md §Fieller interval: n = 2 leaves no degrees of freedom, so no interval.
    const t = formatTable(analysed(folds([2.5e6, 2.0e6])));
    expect(t).toContain('(95%: none (n = 2))');
    expect(t).toContain('(95% Fieller: none (n = 2))');
  });

  it('prints no displacement when the line does not reach zero below the horizons, while the JSON keeps the number', () => {
    // Areas grow with depth: slope +1000 m, D = −slope = −1000 m is no displacement (docs/method.md §Area-depth line: no zero crossing below the horizons, no detachment).
    const a = analysed(folds([1.0e6, 1.5e6, 2.0e6, 2.5e6]));
    const t = formatTable(a);
    expect(t).toContain('  no zero crossing below the horizons: no displacement estimate\n  Detachment: none below these horizons');
    expect(t).not.toContain('Displacement D');
    expect(toJsonReport(a).areaDepth!.displacement).toBeCloseTo(-1000, 6);
  });

  it('starts with the source line when given one', () => {
    expect(formatTable(analysed(methodExample()), 'Project "P", scenario "S".').split('\n')[0]).toBe('Project "P", scenario "S".');
    expect(formatTable(analysed(methodExample())).split('\n')[0]).toMatch(/^Pin width/);
  });
});
