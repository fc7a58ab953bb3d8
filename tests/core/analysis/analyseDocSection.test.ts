// The analysis of a document keeps the preparation it was computed from, so that a gesture's start and the
// sensitivity sweeps do not prepare the same section again: that preparation must be the one prepareSection
// gives for the analysed section, bit for bit, and the outcome the one analyseSection gives.
// Check values: an analytic forward model (Epard & Groshong, 1993: each excess area is D·(r − zd)), with
// D = 2000 m and the detachment at −4000 m, digitised through sectionToProjectDoc as a section file opens.
import { describe, expect, it } from 'vitest';
import { analyseDoc, prepareDocGesture } from '../../../src/core/analysis/analyseDocGesture';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { prepareSection } from '../../../src/core/analysis/prepareSection';
import { forwardSection } from '../../../src/core/forward/forwardSection';
import { setRegional } from '../../../src/core/model/commands/setRegional';
import { sectionToProjectDoc } from '../../../src/core/model/migrations/sectionToProjectDoc';
import { isFlatLine, linePoints, type Section } from '../../../src/core/model/section';
import { sectionKey } from '../../../src/core/model/sectionKey';
import { expectClose } from '../../expectClose';

const D = 2000;
const ZD = -4000;

function forwardDoc() {
  const { section } = forwardSection({
    units: 'm', displacement: D, detachmentElevation: ZD, pins: [1000, 9000], extent: [0, 10_000], samplesPerFold: 200,
    horizons: [0, 1, 2, 3].map((i) => ({ name: `H${i + 1}`, regionalElevation: -500 * i })),
    folds: [{ shape: 'rounded', from: 2000, to: 5000, weight: 1 }, { shape: 'box', from: 5500, to: 8500, limb: 0.25, weight: 0.6 }],
  });
  return sectionToProjectDoc(section, 'forward');
}

describe('analyseDocSection', () => {
  it('keeps the preparation of the analysed section, the same as preparing it again, and the gesture start reuses it', () => {
    const doc = forwardDoc();
    const a = analyseDoc(doc);
    if (!a.docSection.ok || !a.outcome?.ok || !a.prepared) throw new Error('no analysis');
    const again = prepareSection(a.docSection.section);
    if (!again.ok) throw new Error(again.problems[0].message);
    expect(Array.from(a.prepared.areas)).toEqual(Array.from(again.prepared.areas));
    expect(Array.from(a.prepared.regionalElevations)).toEqual(Array.from(again.prepared.regionalElevations));
    a.prepared.horizons.forEach((h, i) => {
      expect(Array.from(h.line.xs)).toEqual(Array.from(again.prepared.horizons[i].line.xs));
      expect(Array.from(h.line.zs)).toEqual(Array.from(again.prepared.horizons[i].line.zs));
    });
    const direct = analyseSection(a.docSection.section);
    if (!direct.ok) throw new Error(direct.problems[0].message);
    expect(a.outcome.analysis).toEqual(direct.analysis);
    // The forward model's excess areas, D·(r − zd) (the digitising in scan pixels rounds nothing away).
    a.outcome.analysis.horizons.forEach((h, i) => expectClose(h.excessArea, D * (-500 * i - ZD), 1e-6, { label: h.name }));
    const base = prepareDocGesture(doc, a);
    expect(base?.prepared).toBe(a.prepared);
  });

  it('keeps the preparation of the reduced section when a horizon is left out', () => {
    const doc = forwardDoc();
    const id = doc.horizons[3].id;
    const regional = doc.scenarios[0].regionals[id];
    // The deepest regional stopped short of the right pin (x = 9000 m is at 90 % of the width).
    const short = setRegional(doc, id, [regional[0], [regional[0][0] + 0.5 * (regional[1][0] - regional[0][0]), regional[1][1]]]);
    const a = analyseDoc(short);
    if (!a.docSection.ok || !a.outcome?.ok || !a.prepared) throw new Error('no analysis');
    expect(a.leftOut.map((h) => h.id)).toEqual([id]);
    expect(a.prepared.horizons.map((h) => h.name)).toEqual(['H1', 'H2', 'H3']);
    expect(a.docSection.section.horizons.map((h) => h.name)).toEqual(['H1', 'H2', 'H3']);
  });

  it('reads the lines as coordinate arrays and gives the numbers of the same lines as points, to the last bit', () => {
    const doc = forwardDoc();
    const a = analyseDoc(doc);
    if (!a.docSection.ok || !a.outcome?.ok) throw new Error('no analysis');
    const flat = a.docSection.section;
    expect(flat.horizons.every((h) => h.line && isFlatLine(h.line))).toBe(true);
    // The same section with every line as [x, z] points, the form of a section file.
    const points: Section = { ...flat, horizons: flat.horizons.map(({ line, pieces: _pieces, ...h }) => ({ ...h, line: linePoints(line!) })), faults: [] };
    const fromPoints = analyseSection(points);
    if (!fromPoints.ok) throw new Error(fromPoints.problems[0].message);
    expect(a.outcome.analysis).toEqual(fromPoints.analysis);
    a.outcome.analysis.horizons.forEach((h, i) => {
      expect(Object.is(h.excessArea, fromPoints.analysis.horizons[i].excessArea)).toBe(true);
      expect(Object.is(h.depth, fromPoints.analysis.horizons[i].depth)).toBe(true);
    });
    // A result kept with the key of one form is not stale for the other.
    expect(sectionKey(flat)).toBe(sectionKey(points));
  });

  it('carries no preparation when there is nothing to analyse', () => {
    const doc = forwardDoc();
    doc.calibration = null;
    const a = analyseDoc(doc);
    expect(a.outcome).toBeNull();
    expect(a.prepared).toBeUndefined();
  });
});
