// The exported figure is drawn in section coordinates: on a rotated, sheared scan the pins come out
// vertical, the detachment and reference level horizontal, and the axes read back every point's true
// section coordinate. Checked against the analytic affine composition (a rotation, a scale per axis and
// a shift, inverted exactly) and against the section coordinates the points were placed at.
import { describe, expect, it } from 'vitest';
import { renderSectionSvg } from '../../src/io/renderSectionSvg';
import { fitSectionFrame, imageToFigureMatrix, sectionToFigure } from '../../src/io/sectionFigureFrame';
import { fitCalibration } from '../../src/core/calibration/fitCalibration';
import { selectAnalysis } from '../../src/state/selectors';
import type { ImagePx, ProjectDoc } from '../../src/core/model/projectDoc';
import type { XZ } from '../../src/core/model/section';
import { sampleDoc, SAMPLE_SECTION } from './sampleDoc';
import { paletteColour } from '../../src/core/model/horizonPalette';

/** Section (x, z) → image pixel of a scan drawn rotated by `deg` at 0.8 px per unit across and 1.6 px per unit up (VE 2 on the scan). */
function scanOf(deg: number): (q: XZ) => ImagePx {
  const t = (deg * Math.PI) / 180;
  return ([x, z]) => {
    const [a, b] = [0.8 * (x + 200), -1.6 * (z - 1000)];
    return [300 + Math.cos(t) * a - Math.sin(t) * b, 150 + Math.sin(t) * a + Math.cos(t) * b];
  };
}

/** The sample section placed on a rotated scan, calibrated by four control points at the scan's corners of the section. */
function rotatedDoc(deg: number): ProjectDoc {
  const toPx = scanOf(deg);
  const doc = sampleDoc();
  const corners: XZ[] = [[-200, 1000], [1300, 1000], [-200, -300], [1300, -300]];
  doc.calibration = { kind: 'affine', points: corners.map((q) => { const [u, v] = toPx(q); return { u, v, x: q[0], z: q[1] }; }) };
  doc.scan = { id: 'scan-1', name: 'rotated.png', widthPx: 2000, heightPx: 1800, type: 'image/png' };
  doc.horizons.forEach((h, i) => { h.pointsPx = SAMPLE_SECTION.horizons[i].line!.map(toPx); });
  const sc = doc.scenarios[0];
  sc.pinsPx = [toPx([SAMPLE_SECTION.pins[0], 300]), toPx([SAMPLE_SECTION.pins[1], 450])];
  sc.regionals = Object.fromEntries(doc.horizons.map((h, i) => [h.id, SAMPLE_SECTION.horizons[i].regional.map(toPx)]));
  return doc;
}

const num = (t: string) => Number(t.replace(/,/g, '').replace('\u2212', '-'));

/** The axes' tick labels as linear maps from figure position to section x and z (least squares over every tick). */
function axesOf(svg: string): { x: (fx: number) => number; z: (fy: number) => number; xPerFig: number; zPerFig: number } {
  const group = /<g class="section-axes"[\s\S]*?<\/g>/.exec(svg)![0];
  const zs = [...group.matchAll(/<line x1="[\d.]+" y1="([\d.]+)" x2="[\d.]+" y2="[\d.]+" stroke="#1d2731"\/><text x="[\d.]+" y="[\d.]+" text-anchor="end">([^<]+)<\/text>/g)].map((m) => [Number(m[1]), num(m[2])]);
  const xs = [...group.matchAll(/<line x1="([\d.]+)" y1="[\d.]+" x2="[\d.]+" y2="[\d.]+" stroke="#1d2731"\/><text x="[\d.]+" y="[\d.]+" text-anchor="middle">([^<]+)<\/text>/g)].map((m) => [Number(m[1]), num(m[2])]);
  const line = (pairs: number[][]) => {
    const n = pairs.length, mt = pairs.reduce((s, p) => s + p[0], 0) / n, my = pairs.reduce((s, p) => s + p[1], 0) / n;
    let sxx = 0, sxy = 0;
    for (const [t, y] of pairs) { sxx += (t - mt) ** 2; sxy += (t - mt) * (y - my); }
    const k = sxy / sxx;
    return { at: (t: number) => my + k * (t - mt), k };
  };
  expect(zs.length).toBeGreaterThanOrEqual(3);
  expect(xs.length).toBeGreaterThanOrEqual(3);
  const lz = line(zs), lx = line(xs);
  return { x: lx.at, z: lz.at, xPerFig: lx.k, zPerFig: lz.k };
}

const attrs = (svg: string, cls: string) => [...svg.matchAll(new RegExp(`<line class="${cls}" x1="([\\d.-]+)" y1="([\\d.-]+)" x2="([\\d.-]+)" y2="([\\d.-]+)"`, 'g'))].map((m) => m.slice(1, 5).map(Number));

describe('the section figure of a rotated scan', () => {
  for (const deg of [0, 12, -25]) {
    it(`draws pins vertical, the detachment and reference horizontal, and true axes (scan rotated ${deg}°)`, () => {
      const doc = rotatedDoc(deg);
      const analysis = selectAnalysis(doc);
      // The sample's detachment is analytic: A = 100 (2000 − h), detachment at elevation −1500 m.
      expect(analysis.outcome!.ok && analysis.outcome!.analysis.areaDepth!.detachmentElevation).toBeCloseTo(-1500, 6);
      const svg = renderSectionSvg({ doc, analysis, scanDataUrl: 'data:image/png;base64,AAAA', date: 'd', verticalExaggeration: 1 });
      const ax = axesOf(svg);
      // True scale: a figure unit is as many metres across as up.
      // (Positions are written to 0.01 figure units: ratios hold to about 1e-5.)
      expect(Math.abs(ax.zPerFig / ax.xPerFig)).toBeCloseTo(1, 4);
      expect(ax.zPerFig).toBeLessThan(0);
      const pins = attrs(svg, 'pin');
      expect(pins).toHaveLength(2);
      for (const [x1, , x2] of pins) expect(x2).toBeCloseTo(x1, 2);
      expect(pins.map(([x1]) => ax.x(x1))).toEqual([expect.closeTo(0, 1), expect.closeTo(1000, 1)]);
      for (const cls of ['detachment', 'reference-level']) {
        const [[, y1, , y2]] = attrs(svg, cls);
        expect(y2).toBeCloseTo(y1, 2);
      }
      expect(ax.z(attrs(svg, 'detachment')[0][1])).toBeCloseTo(-1500, 0);
      expect(ax.z(attrs(svg, 'reference-level')[0][1])).toBeCloseTo(500, 0);
      // The scan's matrix takes each calibration point to where the axes read its true (x, z).
      const m = /<image class="scan"[^>]*transform="matrix\(([^)]+)\)"/.exec(svg)![1].split(' ').map(Number);
      const cal = doc.calibration as Extract<ProjectDoc['calibration'], { kind: 'affine' }>;
      for (const p of cal.points) {
        const [fx, fy] = [m[0] * p.u + m[2] * p.v + m[4], m[1] * p.u + m[3] * p.v + m[5]];
        expect(ax.x(fx)).toBeCloseTo(p.x, 0);
        expect(ax.z(fy)).toBeCloseTo(p.z, 0);
      }
      // Every vertex of the upper horizon reads back its section coordinate off the axes.
      const upper = new RegExp(`<polyline points="([^"]+)" fill="none" stroke="${paletteColour(0)}" stroke-width="2.5"`).exec(svg)![1].split(' ').map((s) => s.split(',').map(Number));
      upper.forEach(([fx, fy], i) => {
        expect(ax.x(fx)).toBeCloseTo(SAMPLE_SECTION.horizons[0].line![i][0], 0);
        expect(ax.z(fy)).toBeCloseTo(SAMPLE_SECTION.horizons[0].line![i][1], 0);
      });
      expect(svg).toContain('True scale: vertical exaggeration 1×');
    });
  }

  it('draws a chosen vertical exaggeration, or the scan\'s own, and states it', () => {
    const doc = rotatedDoc(12);
    const analysis = selectAnalysis(doc);
    const three = renderSectionSvg({ doc, analysis, scanDataUrl: null, date: 'd', verticalExaggeration: 3 });
    const ax3 = axesOf(three);
    expect(Math.abs(ax3.xPerFig / ax3.zPerFig)).toBeCloseTo(3, 4);
    expect(three).toContain('Vertical exaggeration 3× (chosen)');
    // The scan was drawn at 1.6 px per unit up and 0.8 across: VE 2 (analytic).
    const own = renderSectionSvg({ doc, analysis, scanDataUrl: null, date: 'd' });
    const axo = axesOf(own);
    expect(Math.abs(axo.xPerFig / axo.zPerFig)).toBeCloseTo(2, 4);
    expect(own).toContain('Vertical exaggeration 2× (as on the scan)');
  });
});

describe('fitSectionFrame and imageToFigureMatrix', () => {
  it('fit the window inside the panel and compose the calibration with the frame', () => {
    const panel = { x: 10, y: 20, w: 400, h: 300 };
    const f = fitSectionFrame({ x: [0, 1000], z: [-500, 0] }, 2, panel);
    // 1000 × 500 at VE 2 is 1000 × 1000 in x units: the height limits, s = 0.3 (arithmetic).
    expect(f.s).toBeCloseTo(0.3, 12);
    const [l, t] = sectionToFigure(f, [f.xRange[0], f.zRange[1]]);
    const [r, b] = sectionToFigure(f, [f.xRange[1], f.zRange[0]]);
    expect([l, t, r, b]).toEqual([expect.closeTo(10, 9), expect.closeTo(20, 9), expect.closeTo(410, 9), expect.closeTo(320, 9)]);
    const cal = fitCalibration(rotatedDoc(30).calibration!);
    if (!cal.ok) throw new Error(cal.message);
    const m = imageToFigureMatrix(cal.fit, f);
    const toPx = scanOf(30);
    for (const q of [[0, 0], [700, -300], [-150, 900]] as XZ[]) {
      const [u, v] = toPx(q);
      const [fx, fy] = sectionToFigure(f, q);
      expect(m[0] * u + m[2] * v + m[4]).toBeCloseTo(fx, 6);
      expect(m[1] * u + m[3] * v + m[5]).toBeCloseTo(fy, 6);
    }
  });
});
