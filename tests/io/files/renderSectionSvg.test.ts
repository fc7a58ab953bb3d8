import { describe, expect, it } from 'vitest';
import { SECTION_CAUTION } from '../../../src/core/analysis/caution';
import { renderSectionSvg } from '../../../src/io/renderSectionSvg';
import { escapeXml } from '../../../src/io/escapeXml';
import { selectAnalysis } from '../../../src/state/selectors';
import { emptyProjectDoc } from '../../../src/core/model/projectDoc';
import { sampleDoc } from './sampleDoc';

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
    // Three excess-area fills, three regionals (dashed polylines) and three horizons.
    expect(svg.match(/<polygon [^>]*fill-opacity="0.25"/g)).toHaveLength(3);
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

  it('still draws an empty project and says why there are no results', () => {
    const doc = emptyProjectDoc();
    const svg = renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: null, date: 'd' });
    expect(balanced(svg)).toBe(true);
    expect(svg).toContain('No area–depth result: Calibrate the scan first');
    expect(svg).toContain('Not calibrated');
  });
});
