import { describe, expect, it } from 'vitest';
import { shoelaceArea } from '../../src/core/geometry/shoelaceArea';
import { faultedSection } from '../../src/core/forward/faultedSection';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import { renderSectionSvg, renderSectionSvgParts } from '../../src/io/renderSectionSvg';
import type { SectionFrame } from '../../src/io/sectionFigureFrame';
import { selectAnalysis } from '../../src/state/selectors';
import { expectClose } from '../expectClose';
import { RAMP_FLAT } from '../canvas/faultedFixture';

/** The forward model's faulted section (ramp-flat fault, four flat-lying horizons) as a project. */
function faultedDoc(D: number, rightToLeft: boolean) {
  const levels = [500, -500, -1500, -2500].map((r, i) => ({ name: `L${i}`, regionalElevation: r }));
  const { section, truth } = faultedSection({ units: 'm', pins: [0, 20000], displacement: D, fault: RAMP_FLAT, horizons: levels, rightToLeft });
  return { doc: { ...sectionToProjectDoc(section, 'Invented faulted section'), author: 'T' }, truth };
}

const pointsOf = (attr: string): [number, number][] => attr.trim().split(/\s+/).map((p) => p.split(',').map(Number) as [number, number]);

/** Net excess area (section units²) enclosed by a fill loop in figure units: horizon left → right, regional back; above the regional positive. */
function loopArea(loop: [number, number][], f: SectionFrame): number {
  const xs = loop.map(([u]) => f.x0 + (u - f.ox) / f.s);
  const zs = loop.map(([, v]) => f.z1 - (v - f.oy) / (f.s * f.ve));
  return -shoelaceArea(xs, zs);
}

describe('the section figure of a faulted section', () => {
  for (const [label, D] of [['thrust', 1500], ['normal fault', -1200]] as const) {
    for (const rightToLeft of [false, true]) {
      it(`draws the fault and fills each pieced horizon along its joined line: D·(z_r − zd) (${label}, ${rightToLeft ? 'right to left' : 'left to right'})`, () => {
        const { doc, truth } = faultedDoc(D, rightToLeft);
        const analysis = selectAnalysis(doc);
        const input = { doc, analysis, scanDataUrl: null, date: '2024-05-01' };
        const svg = renderSectionSvg(input);
        const { frame } = renderSectionSvgParts(input);
        // The fault: its own dashed polyline, in its colour, apart from the horizons.
        const fault = /<polyline class="fault" data-fault="fault-1" points="([^"]+)"[^>]*stroke="([^"]+)"[^>]*stroke-dasharray="16 5"/.exec(svg);
        expect(fault).not.toBeNull();
        expect(pointsOf(fault![1])).toHaveLength(RAMP_FLAT.length);
        expect(doc.horizons.map((h) => h.colour)).not.toContain(fault![2]);
        expect(svg).toContain('fault (heavy, long dashes)');
        // One thin stretch along the fault between the cutoffs per horizon, in the horizon's colour.
        const stretches = [...svg.matchAll(/<polyline class="fault-stretch" points="[^"]+" fill="none" stroke="([^"]+)"/g)].map((m) => m[1]);
        expect(stretches.sort()).toEqual(doc.horizons.map((h) => h.colour).sort());
        // Forward model (Gibbs 1983 construction; exactness docs/method.md §Forward models), analytic: every
        // horizon's excess area is D·(z_r − zd). Tolerance: the figure rounds its coordinates to 0.01 units.
        expect(truth.horizons).toHaveLength(4);
        doc.horizons.forEach((h, i) => {
          const m = new RegExp(`<polygon class="fill-(?:above|below)" data-horizon="${h.id}" points="([^"]+)"`).exec(svg);
          expect(m, `fill of ${h.name}`).not.toBeNull();
          const expected = truth.horizons[i].excessArea;
          expectClose(expected, D * (truth.horizons[i].regionalElevation - truth.detachmentElevation), 1e-12);
          expectClose(loopArea(pointsOf(m![1]), frame), expected, 2e-3, { label: h.name });
        });
      });
    }
  }

  it('draws each piece on its own: no straight step across the fault', () => {
    const { doc } = faultedDoc(1500, false);
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: '2024-05-01' });
    const c = doc.horizons[0].colour;
    const lines = [...svg.matchAll(new RegExp(`<polyline points="[^"]+" fill="none" stroke="${c}" stroke-width="2.5"`, 'g'))];
    expect(lines).toHaveLength(2);
  });
});
