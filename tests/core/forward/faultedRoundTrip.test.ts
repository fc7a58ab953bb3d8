import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { faultedSection, type FaultedSpec } from '../../../src/core/forward/faultedSection';
import type { XZ } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';

// Forward model of a faulted section (vertical simple shear over a ramp-flat fault; Gibbs 1983,
// J. Struct. Geol. 5, for the construction; exactness our derivation, docs/method.md §Forward models):
// every horizon's excess area is D·(z_r − zd), so the area–depth line must return D and zd (Epard &
// Groshong 1993 for shortening, Groshong 1994 for extension) to rounding.

const rampFlat: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];
const levels = [500, -500, -1500, -2500].map((r, i) => ({ name: `L${i}`, regionalElevation: r }));

function spec(D: number, rightToLeft: boolean): FaultedSpec {
  return { units: 'm', pins: [0, 20000], displacement: D, fault: rampFlat, horizons: levels, rightToLeft };
}

describe('faulted forward model, round trip through the analysis', () => {
  for (const [label, D] of [['thrust', 1500], ['normal fault', -1200]] as const) {
    for (const rightToLeft of [false, true]) {
      it(`returns D and zd to 1e-9 for a ${label} with four cut horizons (${rightToLeft ? 'right to left' : 'left to right'})`, () => {
        const { section, truth } = faultedSection(spec(D, rightToLeft));
        const out = analyseSection(section);
        if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
        const a = out.analysis;
        a.horizons.forEach((h, i) => {
          expectClose(h.excessArea, truth.horizons[i].excessArea, 1e-9);
          expect(h.pieces).toBe(2);
          expect(h.cutoffs).toHaveLength(1);
          // Heave and throw between the two cutoffs the model put on the fault (either digitising order).
          const [fw, hw] = [truth.horizons[i].footwallCutoff, truth.horizons[i].hangingWallCutoff];
          expectClose(h.cutoffs[0].heave, Math.abs(hw[0] - fw[0]), 1e-12);
          expectClose(h.cutoffs[0].throw, Math.abs(hw[1] - fw[1]), 1e-12, { abs: 1e-9 });
        });
        expectClose(a.areaDepth!.displacement, D, 1e-9);
        expectClose(a.areaDepth!.detachmentElevation!, truth.detachmentElevation, 1e-9);
        expectClose(a.areaDepth!.detachmentDepth!, truth.detachmentDepth, 1e-9);
        expect(a.regime).toBe(D > 0 ? 'shortening' : 'extension');
      });
    }
  }

  it('puts the cut horizons\' piece ends on the fault: the heave of a thrust cutoff is D', () => {
    // Footwall cutoff at x_c, hanging-wall cutoff carried to x_c + D.
    const { truth } = faultedSection(spec(1500, false));
    for (const h of truth.horizons) expectClose(h.hangingWallCutoff[0] - h.footwallCutoff[0], 1500, 1e-12);
  });

  it('refuses a spec whose left pin is not on the lower flat at pL and pL − D', () => {
    expect(() => faultedSection({ ...spec(1500, false), pins: [7000, 20000] })).toThrow(/lower flat at the left pin/);
  });

  it('holds for random ramps, displacements and horizons (property)', () => {
    // A ramp of 1–3 rising segments from the lower flat at zd to a top flat; D of either sign.
    const arb = fc.record({
      zd: fc.double({ min: -5000, max: -1000, noNaN: true }),
      rises: fc.array(fc.record({ dx: fc.double({ min: 300, max: 3000, noNaN: true }), dz: fc.double({ min: 200, max: 2000, noNaN: true }) }), { minLength: 1, maxLength: 3 }),
      D: fc.double({ min: 200, max: 2500, noNaN: true }),
      normal: fc.boolean(),
      fractions: fc.uniqueArray(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { minLength: 2, maxLength: 4, comparator: (a, b) => Math.abs(a - b) < 0.01 }),
      rightToLeft: fc.boolean(),
    });
    fc.assert(fc.property(arb, ({ zd, rises, D, normal, fractions, rightToLeft }) => {
      const fault: XZ[] = [[-20000, zd], [8000, zd]];
      for (const r of rises) fault.push([fault[fault.length - 1][0] + r.dx, fault[fault.length - 1][1] + r.dz]);
      const top = fault[fault.length - 1][1];
      fault.push([60000, top]);
      const disp = normal ? -D : D;
      const horizons = fractions.map((f, i) => ({ name: `H${i}`, regionalElevation: zd + f * (top - zd) }));
      const { section, truth } = faultedSection({ units: 'm', pins: [0, 30000], displacement: disp, fault, horizons, rightToLeft });
      const out = analyseSection(section);
      if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
      out.analysis.horizons.forEach((h, i) => expectClose(h.excessArea, truth.horizons[i].excessArea, 1e-9, { abs: 1e-6 }));
      expectClose(out.analysis.areaDepth!.displacement, disp, 1e-8);
      expectClose(out.analysis.areaDepth!.detachmentElevation!, zd, 1e-8);
    }));
  });
});
