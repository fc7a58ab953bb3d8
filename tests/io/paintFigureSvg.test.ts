// The PNG painter reads the figure's own SVG markup: every label of the figure (title block, caution, legend,
// scales, graph) reaches the canvas as text, and every drawn element as one fill or stroke.
import { describe, expect, it } from 'vitest';
import { SECTION_CAUTION } from '../../src/core/analysis/caution';
import { renderSectionSvg } from '../../src/io/renderSectionSvg';
import { paintFigureSvg, parseFigureSvg } from '../../src/io/paintFigureSvg';
import { selectAnalysis } from '../../src/state/selectors';
import { sampleDoc } from './sampleDoc';

/** A 2-D context that records what is painted (enough of the canvas API for the painter). */
function recordingContext() {
  const texts: string[] = [];
  const fonts: string[] = [];
  let fills = 0, strokes = 0, clips = 0, depth = 0, deepest = 0;
  const ctx = new Proxy({} as Record<string, unknown>, {
    get(target, key: string) {
      if (key in target) return target[key];
      if (key === 'fillText') return (t: string) => { texts.push(t); fonts.push(String(target.font)); };
      if (key === 'fill') return () => { fills++; };
      if (key === 'stroke') return () => { strokes++; };
      if (key === 'clip') return () => { clips++; };
      if (key === 'save') return () => { deepest = Math.max(deepest, ++depth); };
      if (key === 'restore') return () => { depth--; };
      return () => undefined;
    },
    set(target, key: string, v) { target[key] = v; return true; },
  });
  return { ctx: ctx as unknown as CanvasRenderingContext2D, texts, fonts, counts: () => ({ fills, strokes, clips, depth, deepest }) };
}

describe('paintFigureSvg', () => {
  const doc = sampleDoc();
  const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: '2024-05-01' });

  it('parses the figure into as many elements as the markup opens', () => {
    const count = (n: ReturnType<typeof parseFigureSvg>): number => 1 + n.children.reduce((s, c) => s + count(c), 0);
    // The independent count: every opening tag in the markup (self-closing or not).
    const opened = [...svg.matchAll(/<[A-Za-z][\w:-]*[\s/>]/g)].length;
    expect(count(parseFigureSvg(svg))).toBe(opened);
  });

  it('paints every text of the figure, whitespace collapsed as SVG does, the caution included', () => {
    const rec = recordingContext();
    paintFigureSvg(rec.ctx, parseFigureSvg(svg), 1400, 990);
    const expected = [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)]
      .map((m) => m[1].replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;|&apos;/g, "'").replace(/\s+/g, ' ').trim())
      .filter((t) => t);
    expect(rec.texts).toEqual(expected);
    expect(rec.texts.join(' ')).toContain(SECTION_CAUTION.slice(0, 60));
    expect(rec.texts).toContain('Invented test fold');
    expect(rec.texts.some((t) => t.includes('Author: Test author · Date: 2024-05-01'))).toBe(true);
    // The title is bold, 22 units: at 1:1 a 22 px bold face of the figure's family.
    expect(rec.fonts[rec.texts.indexOf('Invented test fold')]).toBe('bold 22px DejaVu Sans, sans-serif');
    // Every save is restored.
    expect(rec.counts().depth).toBe(0);
  });

  it('fills and strokes each drawn element as its attributes say', () => {
    const rec = recordingContext();
    const tiny = '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10" viewBox="0 0 10 10" fill="#123456">'
      + '<defs><clipPath id="c"><rect x="0" y="0" width="5" height="5"/></clipPath></defs>'
      + '<rect x="1" y="1" width="2" height="2"/>' // filled (inherited fill), no stroke
      + '<line x1="0" y1="0" x2="1" y2="1" stroke="#000"/>' // stroked only: a line has no inside
      + '<polyline points="0,0 1,1" fill="none" stroke="#000"/>' // stroked only
      + '<g clip-path="url(#c)"><polygon points="0,0 1,0 1,1" stroke="#000"/></g>' // filled and stroked, clipped
      + '<text x="1" y="1" paint-order="stroke" stroke="#fff">a  b</text></svg>';
    paintFigureSvg(rec.ctx, parseFigureSvg(tiny), 20, 20);
    expect(rec.counts()).toMatchObject({ fills: 2, strokes: 3, clips: 1, depth: 0 });
    expect(rec.texts).toEqual(['a b']);
  });

  it('refuses markup that does not close', () => {
    expect(() => parseFigureSvg('<svg><g></svg>')).toThrow(/closes <svg> inside <g>/);
  });
});
