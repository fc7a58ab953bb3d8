import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { faultedSection } from '../../../src/core/forward/faultedSection';
import { regimeText } from '../../../src/panels/interpretation/regimeText';
import type { XZ } from '../../../src/core/model/section';

// The forward model (vertical simple shear over a ramp-flat fault; Gibbs 1983, J. Struct. Geol. 5, for the
// construction; exactness docs/method.md §Forward models) with D > 0 is shortening, with D < 0 extension
// (Groshong 1994, Tectonics 13, recalled from memory: lost area below the regional).
const RAMP_FLAT: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];

function fit(D: number) {
  const { section } = faultedSection({ units: 'm', pins: [0, 20000], displacement: D, fault: RAMP_FLAT, horizons: [500, -1000, -2000].map((r, i) => ({ name: `L${i}`, regionalElevation: r })) });
  const out = analyseSection(section);
  if (!out.ok) throw new Error(out.problems[0].message);
  return out.analysis.areaDepth;
}

describe('regimeText', () => {
  it('names the regime with the signed displacement of the forward model', () => {
    expect(regimeText(fit(1500), 'm')).toBe('shortening (D = 1500 m)');
    expect(regimeText(fit(-1200), 'm')).toBe('extension (E = −D = 1200 m)');
  });

  it('says nothing without a detachment', () => {
    expect(regimeText(null, 'm')).toBe('—');
  });
});
