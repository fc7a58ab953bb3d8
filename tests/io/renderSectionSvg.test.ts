import { describe, expect, it } from 'vitest';
import { SECTION_CAUTION } from '../../src/core/analysis/caution';
import { renderSectionSvg, renderSectionSvgParts } from '../../src/io/renderSectionSvg';
import { escapeXml } from '../../src/io/escapeXml';
import { selectAnalysis } from '../../src/state/selectors';
import { emptyProjectDoc } from '../../src/core/model/projectDoc';
import { sampleDoc, SAMPLE_SECTION } from './sampleDoc';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import { SCENARIO_COLOURS, scenarioColour } from '../../src/core/model/horizonPalette';
import { scenarioDuplicate } from '../../src/core/model/commands/scenarioDuplicate';
import { areaDepthGroup, shortName } from '../../src/io/renderAreaDepthSvg';
import type { Section } from '../../src/core/model/section';

const textsOf = (svg: string, group: string): string[] => {
  const m = new RegExp(`<g class="${group}"[\\s\\S]*?</g>`).exec(svg);
  return m ? [...m[0].matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((t) => t[1]) : [];
};

/** The sample with the lower horizon's crest moved so the points scatter about the line (no exact fit). */
function scatteredDoc(peak = 301) {
  const section: Section = structuredClone(SAMPLE_SECTION);
  section.horizons[2].line![2] = [500, peak];
  return { ...sectionToProjectDoc(section, 'Scattered'), author: 'T' };
}

/** Tag balance check: every opened element is closed in order (enough for our generated markup). */
function balanced(svg: string): boolean {
  const stack: string[] = [];
  const re = /<(\/?)([a-zA-Z][\w:-]*)[^>]*?(\/?)>/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(svg)) !== null) {
    if (m[3]) continue;
    if (m[1]) { if (stack.pop() !== m[2]) return false; } else stack.push(m[2]);
  }
  return stack.length === 0;
}

describe('renderSectionSvg', () => {
  it('draws every part of the figure with the results and the caution', () => {
    const doc = sampleDoc();
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: '2024-05-01' });
    expect(balanced(svg)).toBe(true);
    expect(svg).toContain('Invented test fold');
    expect(svg).toContain('Author: Test author');
    expect(svg).toContain('Date: 2024-05-01');
    expect(svg).toContain('Scenario: Base case');
    expect(svg).toContain('class="legend"');
    expect(svg).toContain('class="scale-bar"');
    expect(svg).toContain('Vertical exaggeration 1×');
    expect(svg).toContain('class="area-depth"');
    expect(svg).toContain('estimated detachment');
    expect(svg).toContain('left pin');
    // Three excess-area fills, all above their regionals (anticlines), in the canvas's orange; none below.
    expect(svg.match(/<polygon class="fill-above"[^>]*fill="rgb\(232, 121, 30\)"/g)).toHaveLength(3);
    expect(svg).not.toContain('class="fill-below"');
    expect(svg.match(/stroke-dasharray="7 4"\/>/g)!.length).toBeGreaterThanOrEqual(3);
    // The caution words appear (wrapped over lines).
    const text = [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]).join(' ');
    expect(text.replace(/\s+/g, ' ')).toContain(escapeXml(`Caution: ${SECTION_CAUTION}`).replace(/\s+/g, ' '));
  });

  it('escapes hostile names so they stay text', () => {
    const doc = sampleDoc();
    doc.title = '<img src=x onerror=alert(1)>';
    doc.horizons[0].name = '"/><script>alert(1)</script>';
    doc.horizons[0].colour = '"/><script>x</script>';
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: 'data:image/png;base64,AAAA"/>', date: '2024-05-01' });
    expect(svg).not.toContain('<img');
    expect(svg).not.toContain('<script');
    expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(balanced(svg)).toBe(true);
  });

  it('shortens a title or author too long for the title block with an ellipsis, never silently', () => {
    const doc = sampleDoc();
    doc.title = `${'T'.repeat(99)}XYZ`;
    doc.author = 'A'.repeat(300);
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: '2024-05-01' });
    expect(svg).toContain(`>${'T'.repeat(99)}…</text>`);
    expect(svg).toContain(`Author: ${'A'.repeat(59)}…`);
    doc.title = 'Short title';
    expect(renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: 'd' })).toContain('>Short title</text>');
  });

  it('still draws an empty project and says why there are no results', () => {
    const doc = emptyProjectDoc();
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: 'd' });
    expect(balanced(svg)).toBe(true);
    expect(svg).toContain('No area–depth result: Calibrate the scan first');
    expect(svg).toContain('Not calibrated');
  });

  it('labels elevations along the left edge and distances along the bottom (1-2-5 steps), and marks the reference level', () => {
    const doc = sampleDoc();
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: 'd' });
    const axis = textsOf(svg, 'section-axes');
    expect(axis).toContain('Elevation z (m)');
    const values = axis.filter((t) => /^-?[\d,]+$/.test(t)).map((t) => Number(t.replace(/,/g, '')));
    // The sample spans z = 0…900 and x = −100…1100: both scales must cover them.
    expect(values).toContain(0);
    expect(values.some((v) => v >= 800)).toBe(true);
    expect(values.some((v) => v >= 1000)).toBe(true);
    const steps = new Set(values.slice(1).map((v, i) => Math.abs(v - values[i])).filter((d) => d > 0));
    for (const d of steps) expect([1, 2, 5]).toContain(d / 10 ** Math.floor(Math.log10(d)));
    // The reference (the highest regional, z = 500) drawn and named.
    expect(svg).toContain('class="reference-level"');
    expect(svg).toContain('reference level, elevation 500 m: depths below this line');
    expect(textsOf(svg, 'legend')).toContain('reference level: depths are measured below it');
  });

  it('puts each elevation label at the height where the calibration puts that elevation', () => {
    const doc = sampleDoc();
    const analysis = selectAnalysis(doc);
    const svg = renderSectionSvg({ doc, analysis, scanDataUrl: null, date: 'd' });
    // The dashed elevation line for z is drawn through sectionToImage; its label must sit on the same height.
    const labels = [...svg.matchAll(/<line x1="([\d.]+)" y1="([\d.]+)" x2="[\d.]+" y2="([\d.]+)" stroke="#1d2731"\/><text x="[\d.]+" y="([\d.]+)" text-anchor="end">([^<]+)<\/text>/g)];
    expect(labels.length).toBeGreaterThanOrEqual(3);
    const fy = labels.map((m) => Number(m[2]));
    const z = labels.map((m) => Number(m[5].replace(/,/g, '').replace('\u2212', '-')));
    // Linear in z, and z increases upward (smaller y).
    const slope = (fy[1] - fy[0]) / (z[1] - z[0]);
    expect(slope).toBeLessThan(0);
    labels.forEach((_, i) => expect(fy[i]).toBeCloseTo(fy[0] + slope * (z[i] - z[0]), 1));
  });

  // Text for readers takes the minus sign U+2212 (Unicode "MINUS SIGN"); attribute values keep the
  // hyphen-minus, the only sign the SVG number grammar allows (SVG 1.1, "Basic data types").
  it('writes negative numbers in the figure\'s text with the minus sign U+2212, and attributes in SVG number syntax', () => {
    // The sample's bumps are triangles 1000 wide and 400, 350, 300 high: excess areas 200 000, 175 000 and
    // 150 000 m² at depths 0, 250, 500 below the highest regional (z = 500): A = 100 (2000 − h), so the
    // detachment is 2000 m down, at elevation −1500 m (docs/method.md §Area-depth line; analytic).
    const doc = sampleDoc();
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: '2024-05-01' });
    expect(svg).toContain('Detachment at elevation \u22121500 m: 2000 m below the reference at elevation 500 m');
    expect(svg).toContain('estimated detachment: elevation \u22121500 m, 2000 m below the reference');
    const axis = textsOf(svg, 'section-axes');
    expect(axis.filter((t) => /^\u2212[\d,]+$/.test(t)).length).toBeGreaterThan(0);
    // Shifted 3000 m down, every elevation is negative: the reference, its label and the inset's axis title.
    const low: Section = structuredClone(SAMPLE_SECTION);
    for (const h of low.horizons) for (const pts of [h.line!, h.regional]) for (const p of pts) p[1] -= 3000;
    const lowDoc = sectionToProjectDoc(low, 'Deep');
    const lowSvg = renderSectionSvg({ doc: lowDoc, analysis: selectAnalysis(lowDoc), scanDataUrl: null, date: '2024-05-01' });
    expect(lowSvg).toContain('reference level, elevation \u22122500 m: depths below this line');
    expect(lowSvg).toContain('Detachment at elevation \u22124500 m');
    expect(lowSvg).toContain('depth below reference at elevation \u22122500 m (m)');
    for (const s of [svg, lowSvg]) {
      const texts = [...s.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]);
      // No hyphen-minus as a sign in any text (the date's hyphens follow a digit).
      expect(texts.filter((t) => /(^|[^\w])-\d/.test(t))).toEqual([]);
      const attributes = [...s.matchAll(/\s[\w:-]+="([^"]*)"/g)].map((m) => m[1]).filter((v) => !v.startsWith('data:'));
      expect(attributes.filter((v) => v.includes('\u2212'))).toEqual([]);
    }
  });

  it('lists only what is drawn: no projected entry without projected segments, one with them', () => {
    const doc = sampleDoc();
    const plain = textsOf(renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: 'd' }), 'legend');
    expect(plain.some((t) => t.includes('projected'))).toBe(false);
    expect(plain).toContain('excess area above the regional (added)');
    expect(plain).toContain('excess area below the regional (subtracted)');
    doc.horizons[0].projected = [[1, 3]];
    const withRun = textsOf(renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: 'd' }), 'legend');
    expect(withRun).toContain('projected (interpreted) segment');
    // An empty project draws no regionals, pins or fills: none of them in the legend.
    const empty = emptyProjectDoc();
    const none = textsOf(renderSectionSvg({ doc: empty, analysis: selectAnalysis(empty), scanDataUrl: null, date: 'd' }), 'legend');
    expect(none.filter((t) => /regional|pin|excess|detachment|reference/.test(t))).toEqual([]);
  });

  it('fills a syncline below its regional in the blue of the canvas, clipped to the half-plane below the regional', () => {
    const section: Section = structuredClone(SAMPLE_SECTION);
    section.horizons[1].line![2] = [500, 100]; // the middle horizon sags 150 below its regional
    const doc = sectionToProjectDoc(section, 'Syncline');
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: 'd' });
    const below = /<polygon class="fill-below"[^>]*fill="rgb\(38, 104, 199\)"[^>]*clip-path="url\(#(below-\d+)\)"/.exec(svg);
    expect(below).not.toBeNull();
    expect(svg).toContain(`<clipPath id="${below![1]}">`);
    expect(svg.match(/class="fill-above"/g)).toHaveLength(2);
  });
});

describe('the inset area–depth graph', () => {
  it('draws the line and points in the active scenario\'s colour, as the pane does (scenario i takes colour i)', () => {
    const first = scatteredDoc();
    const second = scenarioDuplicate(first, first.activeScenarioId);
    const strokes = (doc: typeof first) => {
      const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: '2024-05-01' });
      const graph = /<g class="area-depth"[\s\S]*?<\/g>/.exec(svg)![0];
      return { line: /class="fitted-line"[^>]*stroke="([^"]+)"/.exec(graph)![1], points: [...graph.matchAll(/<circle [^>]*r="4" [^>]*stroke="([^"]+)"/g)].map((m) => m[1]) };
    };
    expect(strokes(first)).toEqual({ line: SCENARIO_COLOURS[0], points: [SCENARIO_COLOURS[0], SCENARIO_COLOURS[0], SCENARIO_COLOURS[0]] });
    expect(second.scenarios.findIndex((sc) => sc.id === second.activeScenarioId)).toBe(1);
    expect(strokes(second)).toEqual({ line: SCENARIO_COLOURS[1], points: [SCENARIO_COLOURS[1], SCENARIO_COLOURS[1], SCENARIO_COLOURS[1]] });
    expect(scenarioColour(1)).toBe(SCENARIO_COLOURS[1]);
  });

  it('writes area ticks that do not run together, names the points and shows the Fieller bar', () => {
    // Areas of 0.8–2.0 km² as in a test user's section (the labels ran together in m²).
    const doc = scatteredDoc();
    const a = selectAnalysis(doc);
    const result = a.outcome!.ok ? a.outcome!.analysis : null;
    const scaled = { ...result!, horizons: result!.horizons.map((h) => ({ ...h, excessArea: h.excessArea * 10 })) };
    const svg = areaDepthGroup(scaled, SCENARIO_COLOURS[0], 0, 0, 340, 326);
    expect(svg).toContain('excess area (km²)');
    const ticks = [...svg.matchAll(/<text x="([\d.]+)" y="[\d.]+" font-size="9.5" text-anchor="middle"[^>]*>([^<]+)<\/text>/g)].map((m) => ({ x: Number(m[1]), t: m[2] }));
    expect(ticks.length).toBeGreaterThanOrEqual(2);
    // DejaVu Sans digits are 0.64 em wide: 6.1 figure units at 9.5 (common practice for sizing labels).
    for (let i = 1; i < ticks.length; i++) expect(ticks[i].x - ticks[i - 1].x).toBeGreaterThan(6.1 * (ticks[i].t.length + ticks[i - 1].t.length) / 2 + 2);
    for (const name of ['Upper marker', 'Middle marker', 'Lower marker']) expect(svg).toContain(`>${shortName(name)}</text>`);
    expect(svg).toContain('class="fitted-line"');
    // The crest raised by 1 m leaves a bounded interval (about 1900–2160 below the reference).
    expect(result!.areaDepth!.detachmentDepthCI95).not.toBeNull();
    expect(svg).toContain('class="fieller-bar"');
    expect(svg).toMatch(/95%: 1\d{3} to 2\d{3} m/);
  });

  it('labels negative excess areas (a syncline below its regional) with the minus sign U+2212', () => {
    // The middle horizon sags to −150, 400 below its regional at 250: a triangle of −200 000 m² (analytic).
    const section: Section = structuredClone(SAMPLE_SECTION);
    section.horizons[1].line![2] = [500, -150];
    const a = selectAnalysis(sectionToProjectDoc(section, 'Syncline'));
    const r = a.outcome!.ok ? a.outcome!.analysis : null;
    expect(r!.horizons[1].excessArea).toBeCloseTo(-200_000, 6);
    const svg = areaDepthGroup(r, SCENARIO_COLOURS[0], 0, 0, 340, 326);
    const ticks = [...svg.matchAll(/<text x="[\d.]+" y="[\d.]+" font-size="9.5" text-anchor="middle"[^>]*>([^<]+)<\/text>/g)].map((m) => m[1]);
    expect(ticks.some((t) => /^\u22120\.\d+$/.test(t))).toBe(true);
    expect(ticks.filter((t) => t.includes('-'))).toEqual([]);
  });

  it('writes "unbounded" instead of a bar when the Fieller interval is unbounded', () => {
    // Raised by 20 m the scatter makes g ≥ 1 with one degree of freedom (docs/method.md §Fieller interval).
    const a = selectAnalysis(scatteredDoc(320));
    const r = a.outcome!.ok ? a.outcome!.analysis : null;
    expect(r!.areaDepth!.detachmentDepthInterval.kind).toBe('unbounded');
    const svg = areaDepthGroup(r, SCENARIO_COLOURS[0], 0, 0, 340, 326);
    expect(svg).toContain('95% interval unbounded');
    expect(svg).not.toContain('class="fieller-bar"');
  });

  it('cuts long names short for point labels', () => {
    expect(shortName('Top Saltherne Limestone')).toBe('Top Salther…');
    expect(shortName('Top A')).toBe('Top A');
  });

  it('draws a horizon of 150,000 vertices (past the engine\'s argument limit for a spread call)', () => {
    // A densely traced copy of the upper marker: the same kinked line with 150,000 vertices along it.
    const doc = sampleDoc();
    const src = doc.horizons[0].pointsPx;
    const n = 150_000;
    const dense: [number, number][] = [];
    for (let i = 0; i < n; i++) {
      const t = (i / (n - 1)) * (src.length - 1);
      const k = Math.min(src.length - 2, Math.floor(t));
      const f = t - k;
      dense.push([src[k][0] + f * (src[k + 1][0] - src[k][0]), src[k][1] + f * (src[k + 1][1] - src[k][1])]);
    }
    doc.horizons[0] = { ...doc.horizons[0], pointsPx: dense };
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: 'd' });
    expect(balanced(svg)).toBe(true);
    expect(svg).toContain('Upper marker');
    expect(svg).toContain('class="area-depth"');
  });
});

describe('renderSectionSvg with a scan', () => {
  const withScan = () => ({ ...sampleDoc(), scan: { id: 's', name: 'scan.png', widthPx: 4000, heightPx: 2000, type: 'image/png' } });

  it('embeds the scan once (href; xlink:href is not repeated), through the figure’s matrix', () => {
    const doc = withScan();
    const url = 'data:image/png;base64,QUJDRA==';
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: url, date: 'd' });
    expect(svg.split(url).length - 1).toBe(1);
    expect(svg).not.toContain('xlink:href');
    const m = renderSectionSvgParts({ doc, analysis: selectAnalysis(doc), date: 'd' }).scan!.matrix;
    expect(svg).toContain(`transform="matrix(${m.join(' ')})"`);
    expect(balanced(svg)).toBe(true);
  });

  it('splits the figure into standalone parts below and above the scan, each a whole SVG document', () => {
    const doc = withScan();
    const parts = renderSectionSvgParts({ doc, analysis: selectAnalysis(doc), date: 'd' });
    const below = `${parts.head}${parts.under}</svg>`;
    const above = `${parts.head}${parts.panelOpen}${parts.over}</svg>`;
    expect(balanced(below) && balanced(above)).toBe(true);
    // The caution (an export's duty) and the lines are above the scan; the title block below it.
    expect(above).toContain(escapeXml(SECTION_CAUTION.slice(0, 40)));
    expect(below).toContain('title-block');
    expect(above).not.toContain('title-block');
    expect(renderSectionSvgParts({ doc: sampleDoc(), analysis: selectAnalysis(sampleDoc()), date: 'd' }).scan).toBeNull();
  });
});
