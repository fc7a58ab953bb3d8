import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../src/core/analysis/analyseSection';
import type { Section } from '../../src/core/model/section';
import { SCENARIO_COLOURS } from '../../src/core/model/horizonPalette';
import { areaDepthGroup } from '../../src/io/renderAreaDepthSvg';
import { AreaDepthGraph } from '../../src/panels/interpretation/AreaDepthGraph';
import { areaDepthSeries } from '../../src/panels/interpretation/areaDepthSeries';
import { methodExample, triangleHorizon } from '../core/analysis/sections';

// The area–depth graph in the pane and in the exported figure shows the same ticks for the same data:
// both read format/areaDepthAxes.ts. Each graph is rendered as the app and the export render it and its
// tick labels are read back as text.

function analyse(s: Section): SectionAnalysis {
  const out = analyseSection(s);
  if (!out.ok) throw new Error('analysis failed');
  return out.analysis;
}

const texts = (svg: string, re: RegExp) => [...svg.matchAll(re)].map((m) => m[1]);

/** The pane's tick labels, [across, down], and its area unit. */
function paneTicks(a: SectionAnalysis): { across: string[]; down: string[]; unit: string } {
  const series = areaDepthSeries(a, a.horizons.map((_, i) => `h${i}`));
  const html = renderToStaticMarkup(<AreaDepthGraph series={[{ key: 's', label: 'Base', colour: '#1f6f8b', series }]} units={a.units} dataOnly={false} />);
  return {
    across: texts(html, /class="tick" text-anchor="middle">([^<]*)</g),
    down: texts(html, /class="tick" text-anchor="end">([^<]*)</g),
    unit: /Excess area \(([^)]*)\)/i.exec(html)?.[1] ?? '',
  };
}

/** The exported figure's tick labels, [across, down], and its area unit. */
function figureTicks(a: SectionAnalysis): { across: string[]; down: string[]; unit: string } {
  const svg = areaDepthGroup(a, SCENARIO_COLOURS[0], 0, 0, 340, 300);
  return {
    across: texts(svg, /class="area-tick"[^>]*>([^<]*)</g),
    down: texts(svg, /class="depth-tick"[^>]*>([^<]*)</g),
    unit: /excess area \(([^)]*)\)/.exec(svg)?.[1] ?? '',
  };
}

const cases: [string, Section][] = [
  // docs/method.md §Check values: the synthetic example, detachment at 3000 m.
  ['the synthetic example of docs/method.md §Check values', methodExample()],
  ['one horizon (no fit: axes from the point alone)', { units: 'm', pins: [0, 10_000], horizons: [triangleHorizon('H1', 2.028e6, 0, 10_000)] }],
  ['two horizons at one depth, in feet', {
    units: 'ft', pins: [0, 10_000], referenceElevation: 0,
    horizons: [triangleHorizon('H1', 1e6, -30, 10_000), triangleHorizon('H2', 2e6, -30, 10_000)],
  }],
];

describe('the area–depth graph: pane and exported figure', () => {
  for (const [name, section] of cases) {
    it(`show the same ticks for ${name}`, () => {
      const a = analyse(section);
      const pane = paneTicks(a);
      const figure = figureTicks(a);
      expect(pane.across.length).toBeGreaterThanOrEqual(2);
      expect(pane.down.length).toBeGreaterThanOrEqual(2);
      expect(figure.across).toEqual(pane.across);
      expect(figure.down).toEqual(pane.down);
      expect(figure.unit).toBe(pane.unit);
    });
  }
});
