// The strip's fast path must give the engine's full answer: excess areas, detachment depth and
// displacement equal to analyseSection on the same document, before and after regionals move;
// and raising every flat regional by δ moves the detachment up by δ(1 + W0/D) (docs/method.md
// §Sensitivity to the regional, our derivation, exact for flat regionals).
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { offsetRegionals } from '../../../src/core/model/commands/offsetRegionals';
import { setRegional } from '../../../src/core/model/commands/setRegional';
import { docToSection } from '../../../src/core/model/docToSection';
import { emptyProjectDoc, type ProjectDoc } from '../../../src/core/model/projectDoc';
import { liveResults } from '../../../src/panels/workspace/liveResults';
import { formatArea } from '../../../src/format/formatQuantity';
import { tableAreaUnit } from '../../../src/format/horizonColumns';

/** 12 horizons × 2000 vertices over a 4000 × 2000 px scan at 2.5 m/px; detachment-fold bumps shrinking with depth. */
function bigDoc(): ProjectDoc {
  const doc = emptyProjectDoc();
  doc.calibration = { kind: 'axes', xPoints: [{ u: 0, v: 0, value: 0 }, { u: 4000, v: 0, value: 10_000 }], zPoints: [{ u: 0, v: 0, value: 0 }, { u: 0, v: 2000, value: -5000 }] };
  for (let k = 0; k < 12; k++) {
    const pointsPx: [number, number][] = [];
    for (let i = 0; i < 2000; i++) {
      const u = 100 + i * 1.9;
      pointsPx.push([u, 200 + k * 120 - (300 - 20 * k) * Math.sin((Math.PI * (u - 100)) / 3800) ** 2 + 0.5 * Math.sin(i)]);
    }
    doc.horizons.push({ id: `h${k + 1}`, name: `H${k + 1}`, colour: '#000000', visible: true, locked: false, pointsPx, projected: [], joins: [] });
    doc.scenarios[0].regionals[`h${k + 1}`] = [[50, 200 + k * 120], [3950, 200 + k * 120]];
  }
  doc.scenarios[0].pinsPx = [[150, 0], [3800, 0]];
  return doc;
}

function full(doc: ProjectDoc) {
  const ds = docToSection(doc);
  if (!ds.ok) throw new Error(ds.message);
  const out = analyseSection(ds.section);
  if (!out.ok) throw new Error(out.problems[0].message);
  return out.analysis;
}

function expectSame(doc: ProjectDoc) {
  const live = liveResults(doc);
  const a = full(doc);
  expect(live.ready).toBe(true);
  if (!live.ready || !a.areaDepth) return;
  live.horizons.forEach((h, i) => expect(h.excessArea! / a.horizons[i].excessArea).toBeCloseTo(1, 9));
  expect(live.detachmentDepth! / a.areaDepth.detachmentDepth!).toBeCloseTo(1, 9);
  expect(live.detachmentElevation! / a.areaDepth.detachmentElevation!).toBeCloseTo(1, 9);
  expect(live.displacement! / a.areaDepth.displacement).toBeCloseTo(1, 9);
  expect(live.referenceElevation).toBeCloseTo(a.referenceElevation, 9);
}

describe('liveResults', () => {
  it('liveResults(doc) equals analyseSection for 12 horizons × 2000 vertices', () => {
    expectSame(bigDoc());
  });

  it('liveResults(doc) still equals analyseSection after regionals are raised, tilted and bent', () => {
    const doc = bigDoc();
    liveResults(doc);
    let moved = offsetRegionals(doc, null, 37.5);
    expectSame(moved);
    moved = setRegional(moved, 'h3', [[50, 430], [3950, 455]]);
    expectSame(moved);
    moved = setRegional(moved, 'h7', [[50, 910], [2000, 925], [3950, 915]]);
    expectSame(moved);
  });

  it('raising every flat regional by δ raises the detachment by δ(1 + W0/D)', () => {
    const doc = bigDoc();
    const before = liveResults(doc);
    const delta = 25;
    const after = liveResults(offsetRegionals(doc, null, delta));
    expect(before.ready && after.ready).toBe(true);
    if (!before.ready || !after.ready) return;
    const w0 = (3800 - 150) * 2.5;
    const expected = before.detachmentElevation! + delta * (1 + w0 / before.displacement!);
    expect(after.detachmentElevation!).toBeCloseTo(expected, 6);
    // With the reference following the highest regional, the depth below it shrinks by δ·W0/D.
    expect(after.detachmentDepth!).toBeCloseTo(before.detachmentDepth! - (delta * w0) / before.displacement!, 6);
  });

  it('writes every area in the one unit of the pane\'s table, small ones included', () => {
    // A horizon with a bump of 2 px (5 m) beside bumps of hundreds of metres: its area is far below 10⁵ m², the others
    // above, so a unit chosen per value would write it in m² while the table writes it in km² (src/format/formatQuantity.ts).
    const doc = bigDoc();
    const h = doc.horizons[11];
    h.pointsPx = h.pointsPx.map(([u], i) => [u, 200 + 11 * 120 - (i > 900 && i < 1100 ? 2 : 0)]);
    const live = liveResults(doc);
    if (!live.ready) throw new Error(live.message);
    const unit = tableAreaUnit(full(doc));
    expect(unit.label).toBe('km²');
    expect(live.areaUnit).toEqual(unit);
    const small = live.horizons[11].excessArea as number;
    expect(Math.abs(small)).toBeLessThan(1e5);
    expect(formatArea(small, live.units, live.areaUnit)).toMatch(/ km²$/);
  });

  it('liveResults says what is missing before the section can be analysed', () => {
    const doc = emptyProjectDoc();
    expect(liveResults(doc)).toMatchObject({ ready: false, message: expect.stringMatching(/Calibrate/) });
    const noPins = { ...bigDoc(), scenarios: [{ ...bigDoc().scenarios[0], pinsPx: null }] };
    expect(liveResults(noPins)).toMatchObject({ ready: false, message: expect.stringMatching(/pins/) });
  });
});
