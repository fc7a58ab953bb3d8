import { describe, expect, it } from 'vitest';
import { pathDataToPolylines } from '../../../src/io/svgPathData';
import { parseTransform } from '../../../src/io/svgTransform';
import { readSvgLines, svgToSectionAxes } from '../../../src/io/svgHorizons';

describe('pathDataToPolylines', () => {
  it('reads M L H V Z, absolute and relative, and starts a new line at each M', () => {
    expect(pathDataToPolylines('M10 20 L30 20 H40 V50 m5,5 l10-5 h-2 v3 z')).toEqual([
      [[10, 20], [30, 20], [40, 20], [40, 50]],
      [[45, 55], [55, 50], [53, 50], [53, 53], [45, 55]],
    ]);
  });

  it('flattens a cubic onto the curve: the midpoint is (P0 + 3P1 + 3P2 + P3)/8 (Bézier, t = 1/2)', () => {
    const [line] = pathDataToPolylines('M0 0 C 0 100 100 100 100 0')!;
    expect(line[line.length - 1]).toEqual([100, 0]);
    const mid = line[(line.length - 1) / 2];
    expect(mid[0]).toBeCloseTo(50, 9);
    expect(mid[1]).toBeCloseTo(75, 9);
  });

  it('flattens a relative quadratic: midpoint (P0 + 2P1 + P2)/4', () => {
    const [line] = pathDataToPolylines('M10 10 q 50 80 100 0')!;
    const mid = line[(line.length - 1) / 2];
    expect(mid[0]).toBeCloseTo(60, 9);
    expect(mid[1]).toBeCloseTo(50, 9);
    expect(line[line.length - 1]).toEqual([110, 10]);
  });

  it('returns null for malformed data', () => {
    expect(pathDataToPolylines('M 0 0 L 10')).toBeNull();
    expect(pathDataToPolylines('M 0 0 L 10 x')).toBeNull();
  });
});

describe('parseTransform', () => {
  it('composes a list left to right (SVG 1.1 §7.6)', () => {
    expect(parseTransform('translate(10 20) scale(2)')).toEqual([2, 0, 0, 2, 10, 20]);
    const r = parseTransform('rotate(90)')!;
    expect(r.map((v) => Math.round(v * 1e12) / 1e12)).toEqual([0, 1, -1, 0, 0, 0]);
    expect(parseTransform('translate(1,2) nonsense')).toBeNull();
  });
});

describe('readSvgLines and svgToSectionAxes', () => {
  const svg = `<?xml version="1.0"?><!-- drawn by hand -->
    <svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 200 100">
      <g transform="translate(10 0)"><g transform="scale(2 1)">
        <path id="Top &amp; upper" d="M0 50 L50 40 L90 50"/>
      </g></g>
      <polyline id="Base" points="0,90 100,80 190,90"/>
      <rect x="0" y="0" width="10" height="10"/>
      <path id="broken" d="M 0 0 L"/>
    </svg>`;

  it('applies nested group transforms and decodes names', () => {
    const r = readSvgLines(svg);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.lines.map((l) => l.name)).toEqual(['Top & upper', 'Base']);
    expect(r.lines[0].points).toEqual([[10, 50], [110, 40], [190, 50]]);
    expect(r.problems).toHaveLength(1);
  });

  it('maps the drawing to section units through two reference points (y down, z up)', () => {
    const r = readSvgLines(svg);
    if (!r.ok) throw new Error(r.message);
    const m = svgToSectionAxes(r.lines, [{ svg: [0, 100], section: [1000, -500] }, { svg: [200, 0], section: [3000, 500] }]);
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    expect(m.horizons[0].line[0]).toEqual([1100, 0]);
    expect(m.horizons[1].line[1]).toEqual([2000, -300]);
    expect(svgToSectionAxes(r.lines, [{ svg: [0, 0], section: [0, 0] }, { svg: [0, 10], section: [1, 1] }]).ok).toBe(false);
  });

  it('refuses text that is not SVG', () => {
    expect(readSvgLines('<html><body>hi</body></html>').ok).toBe(false);
  });
});
