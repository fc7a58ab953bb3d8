// A faulted section in the project document: faults, horizons in pieces (one list of vertices and its
// joins), and the way back to the engine's section (docToSection). Checked against the faulted forward
// model (vertical simple shear over a ramp-flat fault; Gibbs 1983, J. Struct. Geol. 5, for the
// construction; exact areas D·(z_r − zd), our derivation, docs/method.md §Forward models).
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { analyseDoc } from '../../../src/core/analysis/analyseDocGesture';
import { faultedSection, type FaultedSpec } from '../../../src/core/forward/faultedSection';
import { docToSection } from '../../../src/core/model/docToSection';
import { sectionToProjectDoc } from '../../../src/core/model/migrations/sectionToProjectDoc';
import type { ProjectDoc } from '../../../src/core/model/projectDoc';
import { checkProjectDoc } from '../../../src/core/model/projectSchema';
import type { XZ } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';

const rampFlat: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];
const levels = [500, -500, -1500].map((r, i) => ({ name: `Marker ${i + 1}`, regionalElevation: r }));
const spec = (D: number, rightToLeft = false): FaultedSpec => ({ units: 'm', pins: [0, 20000], displacement: D, fault: rampFlat, faultName: 'Ramp', horizons: levels, rightToLeft });

describe('a faulted section as a project document', () => {
  for (const [label, D] of [['thrust', 1500], ['normal fault', -1200]] as const) {
    for (const rightToLeft of [false, true]) {
      it(`keeps D and zd of a ${label} through the document (${rightToLeft ? 'right to left' : 'left to right'})`, () => {
        const { section, truth } = faultedSection(spec(D, rightToLeft));
        const doc = sectionToProjectDoc(section, 'Forward');
        expect(checkProjectDoc(doc).ok).toBe(true);
        expect(doc.faults.map((f) => [f.id, f.name])).toEqual([['fault-1', 'Ramp']]);
        // One flat list per horizon, the second piece starting where the first ends.
        doc.horizons.forEach((h, i) => {
          const [first, second] = section.horizons[i].pieces!;
          expect(h.joins).toEqual([{ at: first.length, faultId: 'fault-1' }]);
          expect(h.pointsPx).toHaveLength(first.length + second.length);
        });
        const ds = docToSection(doc);
        if (!ds.ok) throw new Error(ds.message);
        expect(ds.skipped).toEqual([]);
        expect(ds.section.faults?.map((f) => f.name)).toEqual(['Ramp']);
        expect(ds.section.horizons[0].pieces).toHaveLength(2);
        expect(ds.section.horizons[0].joinFaults).toEqual(['Ramp']);
        const out = analyseSection(ds.section);
        if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
        // Pixels and back through an affine calibration: rounding of ~1e-12 relative per coordinate.
        expectClose(out.analysis.areaDepth!.displacement, D, 1e-9);
        expectClose(out.analysis.areaDepth!.detachmentElevation!, truth.detachmentElevation, 1e-9);
        out.analysis.horizons.forEach((h, i) => expectClose(h.excessArea, truth.horizons[i].excessArea, 1e-9));
      });
    }
  }

  it('skips a horizon whose piece end is off its fault, naming the piece and the fault, and analyses the rest', () => {
    const doc = sectionToProjectDoc(faultedSection(spec(1500)).section, 'Forward');
    const h = doc.horizons[1];
    const at = h.joins[0].at;
    const moved: ProjectDoc = { ...doc, horizons: doc.horizons.map((x) => (x === h ? { ...h, pointsPx: h.pointsPx.map((p, i): [number, number] => (i === at - 1 ? [p[0] - 30, p[1]] : p)) } : x)) };
    const ds = docToSection(moved);
    if (!ds.ok) throw new Error(ds.message);
    expect(ds.skipped).toHaveLength(1);
    expect(ds.skipped[0].name).toBe('Marker 2');
    expect(ds.skipped[0].reason).toMatch(/^the end of piece 1 is [\d.]+ m off fault "Ramp"/);
    expect(ds.section.horizons.map((x) => x.name)).toEqual(['Marker 1', 'Marker 3']);
    expect(analyseDoc(moved).outcome?.ok).toBe(true);
  });

  it('skips a fault of fewer than two vertices with a reason, and the horizons joined on it', () => {
    const doc = sectionToProjectDoc(faultedSection(spec(1500)).section, 'Forward');
    const broken: ProjectDoc = { ...doc, faults: [{ ...doc.faults[0], pointsPx: [doc.faults[0].pointsPx[0]] }] };
    const ds = docToSection(broken);
    if (!ds.ok) throw new Error(ds.message);
    expect(ds.skippedFaults).toEqual([{ id: 'fault-1', name: 'Ramp', reason: 'fewer than two vertices' }]);
    expect(ds.skipped.map((s) => s.reason)).toEqual(Array(3).fill('it is joined on fault "Ramp", which is left out (see the fault\'s own message)'));
  });

  it('passes the engine\'s message through for a joined line that really crosses itself', () => {
    // A Z-shaped repeat whose footwall piece is dragged back across the hanging-wall piece.
    const doc = sectionToProjectDoc(faultedSection(spec(1500)).section, 'Forward');
    const h = doc.horizons[0];
    const last = h.pointsPx.length - 1;
    const crossing: ProjectDoc = { ...doc, horizons: [{ ...h, pointsPx: h.pointsPx.map((p, i): [number, number] => (i === last ? [h.pointsPx[0][0] + 200, h.pointsPx[0][1] + 400] : p)) }, ...doc.horizons.slice(1)] };
    const a = analyseDoc(crossing);
    expect(a.leftOut.map((x) => x.name)).toEqual(['Marker 1']);
    expect(a.leftOut[0].reason).toMatch(/cross/);
  });

  it('refuses a document whose join names a fault it does not have, or leaves a piece of one vertex', () => {
    const doc = sectionToProjectDoc(faultedSection(spec(1500)).section, 'Forward');
    const h = doc.horizons[0];
    const unknown = checkProjectDoc({ ...doc, horizons: [{ ...h, joins: [{ at: h.joins[0].at, faultId: 'fault-9' }] }, ...doc.horizons.slice(1)] });
    expect(unknown.ok).toBe(false);
    if (!unknown.ok) expect(unknown.message).toContain('horizon "Marker 1": a join names fault id "fault-9"');
    const short = checkProjectDoc({ ...doc, horizons: [{ ...h, joins: [{ at: h.pointsPx.length - 1, faultId: 'fault-1' }] }, ...doc.horizons.slice(1)] });
    expect(short.ok).toBe(false);
    const twins = checkProjectDoc({ ...doc, faults: [doc.faults[0], { ...doc.faults[0], id: 'fault-2' }] });
    expect(twins.ok).toBe(false);
    if (!twins.ok) expect(twins.message).toContain('two faults share the name "Ramp"');
  });
});
