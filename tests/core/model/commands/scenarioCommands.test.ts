// Pins and regionals, including the helpers (propose, parallel set) and moving regionals up in the section.
import { describe, expect, it } from 'vitest';
import { imageToSection } from '../../../../src/core/calibration/mapPoints';
import { offsetRegionals } from '../../../../src/core/model/commands/offsetRegionals';
import { parallelRegionals } from '../../../../src/core/model/commands/parallelRegionals';
import { proposeRegional, PROPOSE_WINDOW } from '../../../../src/core/model/commands/proposeRegional';
import { sectionFrame, PIXEL_FRAME } from '../../../../src/core/model/commands/sectionFrame';
import { setCalibration } from '../../../../src/core/model/commands/setCalibration';
import { setPins } from '../../../../src/core/model/commands/setPins';
import { setRegional } from '../../../../src/core/model/commands/setRegional';
import { fixtureDoc } from './docFixture';

describe('pins and regionals', () => {
  it('setPins(doc, pins) sets the active scenario\'s pins and null clears them', () => {
    const doc = fixtureDoc();
    const next = setPins(doc, [[50, 0], [950, 0]]);
    expect(next.scenarios[0].pinsPx).toEqual([[50, 0], [950, 0]]);
    expect(setPins(next, null).scenarios[0].pinsPx).toBeNull();
  });

  it('setRegional(doc, id, points) sets one regional; null removes it; fewer than two points removes it', () => {
    const doc = fixtureDoc();
    const next = setRegional(doc, 'h1', [[0, 100], [1000, 100]]);
    expect(next.scenarios[0].regionals.h1).toEqual([[0, 100], [1000, 100]]);
    expect(setRegional(next, 'h1', null).scenarios[0].regionals).toEqual({});
    expect(setRegional(doc, 'h1', null)).toBe(doc);
  });

  it('offsetRegionals(doc, ids, dz) raises regionals by dz section units (10 m per px here: 50 m = 5 px up)', () => {
    let doc = setRegional(fixtureDoc(), 'h1', [[0, 100], [1000, 110]]);
    doc = setRegional(doc, 'h2', [[0, 200], [1000, 200]]);
    const one = offsetRegionals(doc, ['h1'], 50);
    expect(one.scenarios[0].regionals.h1[0][1]).toBeCloseTo(95, 9);
    expect(one.scenarios[0].regionals.h1[1][1]).toBeCloseTo(105, 9);
    expect(one.scenarios[0].regionals.h2).toBe(doc.scenarios[0].regionals.h2);
    const all = offsetRegionals(doc, null, -100);
    expect(all.scenarios[0].regionals.h2[0][1]).toBeCloseTo(210, 9);
    // Before calibration the pixel frame stands in: dz in pixels, up is −v.
    const raw = setCalibration(doc, null);
    expect(sectionFrame(raw)).toBe(PIXEL_FRAME);
    expect(offsetRegionals(raw, ['h2'], 3).scenarios[0].regionals.h2[0][1]).toBeCloseTo(197, 9);
  });

  it('offsetRegionals moves straight up in the section on a rotated scan', () => {
    const c = Math.cos(0.1);
    const s = Math.sin(0.1);
    // x = 10 (c u − s v'), z = 10 (s u + c v') with v' = −v: a scan rotated by 0.1 rad.
    const points = [[0, 0], [1000, 0], [0, 500]].map(([u, v]) => ({ u, v, x: 10 * (c * u + s * v), z: 10 * (s * u - c * v) }));
    const doc = setRegional(setCalibration(fixtureDoc(), { kind: 'affine', points }), 'h1', [[0, 100], [1000, 100]]);
    const frame = sectionFrame(doc);
    const before = doc.scenarios[0].regionals.h1.map((p) => imageToSection(frame, p));
    const after = offsetRegionals(doc, null, 40).scenarios[0].regionals.h1.map((p) => imageToSection(frame, p));
    after.forEach((q, i) => {
      expect(q[0]).toBeCloseTo(before[i][0], 6);
      expect(q[1]).toBeCloseTo(before[i][1] + 40, 6);
    });
  });

  it('proposeRegional(doc, id) runs through the lowest vertices within the window of each pin, beyond both pins', () => {
    // Pins at x = 1000 and 9000 m (W0 = 8000 m, window ±1200 m): h2's lowest vertices there are
    // (0, 210) → z = −1100 m at x = 0 and (1000, 190)? No: x = 10000 is 1000 m from the right pin → z = −900;
    // (800, 200) → z = −1000 at x = 8000 is lower. Expected line through (0, −1100) and (8000, −1000).
    expect(PROPOSE_WINDOW).toBe(0.15);
    const doc = proposeRegional(fixtureDoc(), 'h2');
    const frame = sectionFrame(doc);
    const reg = doc.scenarios[0].regionals.h2.map((p) => imageToSection(frame, p));
    expect(reg[0][0]).toBeCloseTo(1000 - 400, 6);
    expect(reg[1][0]).toBeCloseTo(9000 + 400, 6);
    const slope = 100 / 8000;
    for (const [x, z] of reg) expect(z).toBeCloseTo(-1100 + slope * x, 6);
    expect(proposeRegional(setPins(fixtureDoc(), null), 'h2').scenarios[0].regionals).toEqual({});
  });

  it('parallelRegionals(doc, id) copies the regional to each horizon\'s own level at the pins', () => {
    // h1 at the pins: z = 0 m (v = 100) at both; h2: v = 205 and 195 at u = 100, 900 → z = −1050, −950, mean −1000.
    const doc = setRegional(fixtureDoc(), 'h1', [[0, 98], [1000, 102]]);
    const next = parallelRegionals(doc, 'h1');
    const frame = sectionFrame(next);
    const src = next.scenarios[0].regionals.h1.map((p) => imageToSection(frame, p));
    const copy = next.scenarios[0].regionals.h2.map((p) => imageToSection(frame, p));
    copy.forEach((q, i) => {
      expect(q[0]).toBeCloseTo(src[i][0], 6);
      expect(q[1]).toBeCloseTo(src[i][1] - 1000, 6);
    });
    expect(next.scenarios[0].regionals.h1).toBe(doc.scenarios[0].regionals.h1);
    expect(parallelRegionals(fixtureDoc(), 'h1')).toEqual(fixtureDoc());
  });
});
