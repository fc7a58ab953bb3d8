import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { forwardSection } from '../../../src/core/forward/forwardSection';
import type { ForwardSpec } from '../../../src/core/forward/forwardSpec';

// docs/method.md §Forward models: a section built from a known D and zd (each excess area
// D·(zd − h), Epard & Groshong 1993) must give them back from the area–depth fit, to rounding.
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

function roundTrip(spec: ForwardSpec): { D: number; zd: number; depth: number; truth: ReturnType<typeof forwardSection>['truth'] } {
  const { section, truth } = forwardSection(spec);
  const outcome = analyseSection(section);
  if (!outcome.ok) throw new Error(outcome.problems.map((p) => p.message).join('; '));
  const ad = outcome.analysis.areaDepth;
  if (!ad || ad.detachmentElevation === null || ad.detachmentDepth === null) throw new Error('no area-depth result');
  return { D: ad.displacement, zd: ad.detachmentElevation, depth: ad.detachmentDepth, truth };
}

const levels = [900, 300, -400, -1100, -1700].map((r, i) => ({ name: `L${i}`, regionalElevation: r }));

const cases: Record<string, ForwardSpec> = {
  overturned: {
    units: 'm', displacement: 1100, detachmentElevation: -3200, pins: [0, 24000], horizons: levels,
    folds: [{ shape: 'box', from: 2000, to: 7000 }, { shape: 'overturned', from: 13000, to: 17000, crest: 0.7, weight: 2 }],
  },
  'inclined (dipping) regional': {
    units: 'm', displacement: 800, detachmentElevation: -2500, pins: [0, 24000], horizons: levels,
    regional: { kind: 'inclined', slope: 0.04 }, folds: [{ shape: 'asymmetric', from: 6000, to: 16000, crest: 0.65, shear: 0.3 }],
  },
  'curved regional': {
    units: 'm', displacement: 1500, detachmentElevation: -3000, pins: [0, 24000], horizons: levels,
    regional: { kind: 'curved', points: [[0, 0], [6000, 150], [12000, 220], [18000, 120], [24000, -80]] },
    folds: [{ shape: 'rounded', from: 3000, to: 10000 }, { shape: 'overturned', from: 16000, to: 20000, crest: 0.7, weight: 2 }],
  },
  feet: {
    units: 'ft', displacement: 4000, detachmentDepth: 14000, referenceElevation: 3000, pins: [0, 80000],
    horizons: [0, 2000, 4500, 7000, 9000].map((d, i) => ({ name: `F${i}`, depth: d })),
    folds: [{ shape: 'box', from: 15000, to: 45000, limb: 0.3 }],
  },
  'synclines below regional': {
    units: 'm', displacement: 600, detachmentElevation: -2000, pins: [0, 24000], horizons: levels,
    folds: [
      { shape: 'rounded', from: 3000, to: 7000, weight: -0.5 },
      { shape: 'box', from: 7000, to: 13000 },
      { shape: 'rounded', from: 13000, to: 18000, weight: -0.5 },
    ],
  },
};

describe('forwardSection → analyseSection round trip', () => {
  for (const [name, spec] of Object.entries(cases)) {
    it(`analyseSection returns D and the detachment elevation of a forward section (${name})`, () => {
      const { D, zd, depth, truth } = roundTrip(spec);
      expect(rel(D, truth.displacement)).toBeLessThan(1e-9);
      expect(rel(zd, truth.detachmentElevation)).toBeLessThan(1e-9);
      expect(rel(depth, truth.detachmentDepth)).toBeLessThan(1e-9);
    });
  }

  it('analyseSection gives each forward horizon the excess area, bed length and regional elevation the model reports', () => {
    const { section, truth } = forwardSection(cases['curved regional']);
    const outcome = analyseSection(section);
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    outcome.analysis.horizons.forEach((h, i) => {
      expect(rel(h.excessArea, truth.horizons[i].targetExcessArea)).toBeLessThan(1e-9);
      expect(rel(h.bedLength, truth.horizons[i].bedLength)).toBeLessThan(1e-9);
      expect(Math.abs(h.regionalElevation - truth.horizons[i].regionalElevation)).toBeLessThan(1e-6);
    });
  });
});
