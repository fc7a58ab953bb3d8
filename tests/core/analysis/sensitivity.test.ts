import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { prepareSection, type PreparedSection } from '../../../src/core/analysis/prepareSection';
import { regionalAmplification, regionalSensitivity } from '../../../src/core/analysis/sensitivity';
import type { Section } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';
import { methodExample, triangleHorizon } from './sections';

function prepared(s: Section): PreparedSection {
  const p = prepareSection(s);
  if (!p.ok) throw new Error(p.problems.map((q) => q.message).join('\n'));
  return p.prepared;
}

/** The synthetic example (docs/method.md §Check values) with the areas nudged off the line, so the check is not only for perfect data. */
function noisyExample(): Section {
  const s = methodExample();
  const nudges = [40_000, -25_000, 30_000, -10_000];
  s.horizons = s.horizons.map((h, i) => triangleHorizon(h.name, 1000 * (3000 - 500 * (i + 1)) + nudges[i], -500 * (i + 1), 10_000));
  return s;
}

describe('regionalSensitivity(prepared, sweeps) for flat regionals', () => {
  // Source: docs/method.md §Sensitivity to the regional (our derivation, exact for flat regionals):
  // zd' = zd − δ(1 + W0/D).
  for (const [label, make] of [['on the line', methodExample], ['off the line', noisyExample]] as const) {
    it(`follows zd' = zd − δ(1 + W0/D) for a common offset (${label})`, () => {
      const p = prepared(make());
      // Offsets that keep the zero crossing below the deepest horizon (h drops by δ too), where it is a detachment.
      const offsets = [-200, -50, 0, 25, 80];
      const sweep = regionalSensitivity(p, { offsets, tilts: [] });
      const zd = sweep.base!.detachmentDepth!;
      const D = sweep.base!.displacement;
      sweep.offsets.forEach((pt, i) => expectClose(pt.depth!, zd - offsets[i] * (1 + p.pinWidth / D), 1e-10, { abs: 1e-9 }));
    });
  }

  it('gives the amplification 1 + W0/D = 11 for W0 = 10 km and D = 1000 m (synthetic example, docs/method.md §Check values)', () => {
    const sweep = regionalSensitivity(prepared(methodExample()), { offsets: [0], tilts: [] });
    expectClose(sweep.amplification!, 11, 1e-10);
  });

  it('agrees with a full re-analysis of a section whose regionals were really moved up by δ', () => {
    // Independent path: move every regional vertex by δ and run analyseSection from scratch.
    const delta = 80;
    const s = noisyExample();
    const moved: Section = { ...s, horizons: s.horizons.map((h) => ({ ...h, regional: h.regional.map(([x, z]) => [x, z + delta]) })) };
    const full = analyseSection(moved, { referenceElevation: 0 });
    if (!full.ok) throw new Error('moved section failed');
    const sweep = regionalSensitivity(prepared(s), { offsets: [delta], tilts: [] });
    expectClose(sweep.offsets[0].depth!, full.analysis.areaDepth!.detachmentDepth!, 1e-10);
  });

  it('treats a tilt t about the left pin as its mean offset t·W0/2 (flat regionals)', () => {
    // A tilt t about x = pL raises the regional's mean over the pins by t·W0/2 (our derivation).
    const p = prepared(noisyExample());
    const tilts = [-0.01, 0.004];
    const sweep = regionalSensitivity(p, { offsets: tilts.map((t) => (t * p.pinWidth) / 2), tilts });
    sweep.tilts.forEach((pt, i) => expectClose(pt.depth!, sweep.offsets[i].depth!, 1e-10, { abs: 1e-9 }));
    const right = regionalSensitivity(p, { offsets: [], tilts, tiltPivot: 'right' });
    expect(right.tiltPivotX).toBe(p.pins[1]);
    // About the right pin the same tilt lowers the mean by t·W0/2: the opposite shift.
    const opposite = regionalSensitivity(p, { offsets: tilts.map((t) => (-t * p.pinWidth) / 2), tilts: [] });
    right.tilts.forEach((pt, i) => expectClose(pt.depth!, opposite.offsets[i].depth!, 1e-10, { abs: 1e-9 }));
  });

  it('adds per-horizon offsets under every sweep point', () => {
    const p = prepared(noisyExample());
    const per = [10, 0, 0, 0];
    const sweep = regionalSensitivity(p, { offsets: [0], tilts: [], base: { regionalOffsets: per } });
    const s = noisyExample();
    s.horizons[0] = { ...s.horizons[0], regional: s.horizons[0].regional.map(([x, z]) => [x, z + 10]) };
    const full = analyseSection(s, { referenceElevation: 0 });
    if (!full.ok) throw new Error('moved section failed');
    expectClose(sweep.offsets[0].depth!, full.analysis.areaDepth!.detachmentDepth!, 1e-10);
  });

  it('reports null depths and no amplification when the slope is not negative', () => {
    const s = methodExample();
    s.horizons = s.horizons.map((h, i) => triangleHorizon(h.name, 1e6 * (1 + i), -500 * (i + 1), 10_000));
    const sweep = regionalSensitivity(prepared(s), { offsets: [0, 10], tilts: [0.001] });
    expect(sweep.amplification).toBeNull();
    expect(sweep.offsets.every((o) => o.depth === null)).toBe(true);
    expect(regionalAmplification(10_000, null)).toBeNull();
  });
});
