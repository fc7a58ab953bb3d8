import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../../src/core/analysis/analyseSection';
import { evaluateShifted } from '../../../src/core/analysis/evaluateShifted';
import { prepareSection } from '../../../src/core/analysis/prepareSection';
import { regionalAmplification, regionalSensitivity } from '../../../src/core/analysis/sensitivity';
import type { Section } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';
import { methodExample, triangleHorizon } from './sections';

// Extension (Groshong 1994, Tectonics 13: "lost area" below the regional): A = D·(zd − h) with D < 0.
// Our own synthetic check, the mirror of the shortening example: D = −1000 m, zd = 3000 m,
// h = 500…2000 m gives A = −2.5, −2.0, −1.5, −1.0 km² (slope +1000 m, intercept −3 km²).
function extensionExample(nudges = [0, 0, 0, 0]): Section {
  const s = methodExample();
  s.horizons = [500, 1000, 1500, 2000].map((h, i) => triangleHorizon(`E${i + 1}`, -1000 * (3000 - h) + nudges[i], -h, 10_000));
  return s;
}

function analysed(s: Section): SectionAnalysis {
  const out = analyseSection(s);
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
  return out.analysis;
}

describe('extension: negative areas and D < 0', () => {
  it('gives D = −1000 m and zd = 3000 m, the regime "extension", and says so in the notes', () => {
    const a = analysed(extensionExample());
    const d = a.areaDepth!;
    expectClose(d.slope, 1000, 1e-12);
    expectClose(d.intercept, -3e6, 1e-12);
    expectClose(d.displacement, -1000, 1e-12);
    expectClose(d.detachmentDepth!, 3000, 1e-12);
    expect(d.noDetachment).toBe(false);
    expect(d.regime).toBe('extension');
    expect(a.regime).toBe('extension');
    expect(a.notes.some((n) => n.startsWith('Extension:'))).toBe(true);
  });

  it('gives the regime "shortening" for the shortening example', () => {
    expect(analysed(methodExample()).regime).toBe('shortening');
  });

  it('leaves Fieller\'s interval unchanged: mirrored areas give the same interval on zd', () => {
    // Fieller (1954): the set {x : (a + b x)² ≤ t² s² (1/n + (x − x̄)²/Sxx)} is unchanged when every
    // y changes sign (a, b → −a, −b; s unchanged), so the mirrored, noisy example keeps its interval.
    const nudges = [40_000, -25_000, 30_000, -10_000];
    const ext = analysed(extensionExample(nudges)).areaDepth!;
    const s = methodExample();
    s.horizons = [500, 1000, 1500, 2000].map((h, i) => triangleHorizon(`S${i + 1}`, 1000 * (3000 - h) - nudges[i], -h, 10_000));
    const sho = analysed(s).areaDepth!;
    expect(ext.detachmentDepthCI95).not.toBeNull();
    expectClose(ext.detachmentDepthCI95![0], sho.detachmentDepthCI95![0], 1e-9);
    expectClose(ext.detachmentDepthCI95![1], sho.detachmentDepthCI95![1], 1e-9);
    expectClose(ext.displacementCI95![0], -sho.displacementCI95![1], 1e-9);
    expectClose(ext.displacementCI95![1], -sho.displacementCI95![0], 1e-9);
  });

  it('follows zd\' = zd − δ(1 + W0/D) for either sign of D (amplification 1 + W0/D = −9 for D = −1000 m)', () => {
    // Closed form of docs/method.md §Sensitivity to the regional (our derivation, exact for flat regionals).
    for (const [make, D] of [[extensionExample, -1000], [methodExample, 1000]] as const) {
      const p = prepareSection(make());
      if (!p.ok) throw new Error('unexpected problems');
      const offsets = [-50, 0, 40, 80];
      const sweep = regionalSensitivity(p.prepared, { offsets, tilts: [] });
      sweep.offsets.forEach((pt, i) => expectClose(pt.depth!, 3000 - offsets[i] * (1 + 10_000 / D), 1e-10, { abs: 1e-9 }));
      expectClose(regionalAmplification(10_000, sweep.base)!, 1 + 10_000 / D, 1e-12);
    }
  });
});

describe('the detachment is the zero crossing only below the deepest horizon in the fit', () => {
  it('reports no detachment when a shortening line crosses zero above the deepest horizon', () => {
    // Slope −1000, zd = 1200 m, but the deepest horizon is at 2000 m: A < 0 below 1200 m.
    const s = methodExample();
    s.horizons = [500, 1000, 1500, 2000].map((h, i) => triangleHorizon(`H${i}`, 1000 * (1200 - h), -h, 10_000));
    const d = analysed(s).areaDepth!;
    expect(d.noDetachment).toBe(true);
    expect(d.detachmentDepth).toBeNull();
    expect(d.regime).toBeNull();
    expect(analysed(s).notes.some((n) => n.includes('no detachment below these horizons'))).toBe(true);
  });

  it('reports no detachment for a zero slope, in the full analysis and the fast path alike', () => {
    const s = methodExample();
    s.horizons = [500, 1000, 1500].map((h, i) => triangleHorizon(`Z${i}`, 1e6, -h, 10_000));
    expect(analysed(s).areaDepth!.noDetachment).toBe(true);
    const p = prepareSection(s);
    if (!p.ok) throw new Error('unexpected problems');
    expect(evaluateShifted(p.prepared)!.noDetachment).toBe(true);
  });

  it('the fast path agrees with the full analysis on an extensional section', () => {
    const p = prepareSection(extensionExample([40_000, -25_000, 30_000, -10_000]));
    if (!p.ok) throw new Error('unexpected problems');
    const q = evaluateShifted(p.prepared)!;
    const d = analysed(extensionExample([40_000, -25_000, 30_000, -10_000])).areaDepth!;
    expectClose(q.detachmentDepth!, d.detachmentDepth!, 1e-12);
    expectClose(q.displacement, d.displacement, 1e-12);
  });
});
