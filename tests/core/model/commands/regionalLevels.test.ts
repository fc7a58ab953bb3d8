// Typed regionals: elevations at the pins, or a point and a dip; and the levels read back from a regional.
// Checked by plane trigonometry (tan of the dip times the horizontal distance) and the trapezoid mean.
import { describe, expect, it } from 'vitest';
import { imageToSection } from '../../../../src/core/calibration/mapPoints';
import { regionalLevels } from '../../../../src/core/model/commands/regionalLevels';
import { sectionFrame } from '../../../../src/core/model/commands/sectionFrame';
import { setRegional } from '../../../../src/core/model/commands/setRegional';
import { setRegionalLevels, setRegionalThrough } from '../../../../src/core/model/commands/setRegionalLevels';
import { setPins } from '../../../../src/core/model/commands/setPins';
import { fixtureDoc } from './docFixture';

// fixtureDoc: 10 m per pixel, z = 1000 − 10 v, pins at u = 100 and 900 (x = 1000 and 9000 m, W₀ = 8000 m).
describe('typed regionals', () => {
  it('setRegionalLevels puts a straight regional through the two elevations, 5 % beyond each pin', () => {
    const doc = setRegionalLevels(fixtureDoc(), 'h1', -200, -600);
    const frame = sectionFrame(doc);
    const reg = doc.scenarios[0].regionals.h1.map((p) => imageToSection(frame, p));
    expect(reg).toHaveLength(2);
    expect(reg[0][0]).toBeCloseTo(600, 6);
    expect(reg[1][0]).toBeCloseTo(9400, 6);
    // Slope −400 / 8000 = −0.05: z(600) = −200 + 20 = −180, z(9400) = −600 − 20 = −620 (arithmetic).
    expect(reg[0][1]).toBeCloseTo(-180, 6);
    expect(reg[1][1]).toBeCloseTo(-620, 6);
    const lv = regionalLevels(doc, 'h1')!;
    expect(lv.zLeft).toBeCloseTo(-200, 6);
    expect(lv.zRight).toBeCloseTo(-600, 6);
    expect(lv.mean).toBeCloseTo(-400, 6);
    // atan(400 / 8000) = 2.862405°, down to the right: positive.
    expect(lv.dipDeg).toBeCloseTo((Math.atan(0.05) * 180) / Math.PI, 9);
    expect(lv.dipDeg).toBeCloseTo(2.862405, 5);
    expect(setRegionalLevels(setPins(fixtureDoc(), null), 'h1', 0, 0).scenarios[0].regionals).toEqual({});
    expect(setRegionalLevels(fixtureDoc(), 'h1', Number.NaN, 0)).toEqual(fixtureDoc());
  });

  it('setRegionalThrough passes through the point at the dip (45° drops 1 m per metre to the right)', () => {
    const doc = setRegionalThrough(fixtureDoc(), 'h2', 3000, -500, 45);
    const lv = regionalLevels(doc, 'h2')!;
    // At the left pin, 2000 m left of the point: −500 + 2000; at the right pin, 6000 m right: −500 − 6000.
    expect(lv.zLeft).toBeCloseTo(1500, 6);
    expect(lv.zRight).toBeCloseTo(-6500, 6);
    expect(lv.dipDeg).toBeCloseTo(45, 9);
    const flat = regionalLevels(setRegionalThrough(fixtureDoc(), 'h2', 3000, -500, 0), 'h2')!;
    expect([flat.zLeft, flat.zRight, flat.mean, flat.dipDeg]).toEqual([expect.closeTo(-500, 6), expect.closeTo(-500, 6), expect.closeTo(-500, 6), expect.closeTo(0, 9)]);
    expect(setRegionalThrough(fixtureDoc(), 'h2', 3000, -500, 90)).toEqual(fixtureDoc());
  });

  it('regionalLevels reads a bent regional: levels at the pins by its end segments, mean by the trapezoid rule', () => {
    // Through (0, 0), (5000, −1000), (10000, 0) m: at x = 1000, −200; at 9000, −200; mean over [1000, 9000]
    // = (1/8000)·(2·(−200 − 1000)/2·4000) = −600 (trapezoids).
    const doc = setRegional(fixtureDoc(), 'h1', [[0, 100], [500, 200], [1000, 100]]);
    const lv = regionalLevels(doc, 'h1')!;
    expect(lv.zLeft).toBeCloseTo(-200, 6);
    expect(lv.zRight).toBeCloseTo(-200, 6);
    expect(lv.mean).toBeCloseTo(-600, 6);
    expect(lv.straight).toBe(false);
    expect(regionalLevels(fixtureDoc(), 'h1')).toBeNull();
  });
});
