// Elliptical arcs in SVG path data, checked against the SVG 1.1 specification (appendix F.6, "Elliptical arc
// implementation notes", and §8.3.8, "The elliptical arc curve commands") and against analytic geometry.
import { describe, expect, it } from 'vitest';
import { pathDataToPolylines, type Pt } from '../../src/io/svgPathData';

/** Signed shoelace area of a closed ring (first point repeated at the end or not). */
function shoelace(ring: Pt[]): number {
  let s = 0;
  for (let i = 0; i < ring.length; i++) {
    const [x0, y0] = ring[i];
    const [x1, y1] = ring[(i + 1) % ring.length];
    s += x0 * y1 - x1 * y0;
  }
  return s / 2;
}

const onePath = (d: string): Pt[] => {
  const lines = pathDataToPolylines(d);
  if (lines === null || typeof lines === 'string') throw new Error(`path data not read: ${d}`);
  expect(lines).toHaveLength(1);
  return lines[0];
};

describe('pathDataToPolylines: elliptical arcs (SVG 1.1 appendix F.6)', () => {
  it('a half circle: every vertex on the circle, the closed area the inscribed polygon\'s, within 1e-3 of πr²/2', () => {
    // From (0,0) to (100,0) with r = 50 the chord is a diameter: centre (50,0) (F.6.5 gives the chord midpoint when Λ = 1).
    const line = onePath('M0 0 A50 50 0 0 0 100 0 Z');
    const arc = line.slice(0, -1); // Z repeats the start
    const n = arc.length - 1; // segments of the flattened arc
    expect(n).toBeGreaterThanOrEqual(8);
    for (const [x, y] of arc) {
      // Analytic: on the circle |p − (50,0)| = 50, to rounding (tolerance 1e-9 of the radius).
      expect(Math.abs(Math.hypot(x - 50, y) - 50)).toBeLessThan(50e-9);
      // sweep-flag 0 goes the negative-angle way (§8.3.8): from angle 180° down to 0° through 90°, i.e. y ≥ 0 (y down).
      expect(y).toBeGreaterThanOrEqual(-1e-9);
    }
    expect(arc[0]).toEqual([0, 0]);
    expect(arc[n]).toEqual([100, 0]);
    // Analytic: equal-angle chords of a half circle enclose (n/2) r² sin(π/n) with the diameter (n isosceles triangles).
    const area = Math.abs(shoelace(line));
    expect(area).toBeCloseTo((n / 2) * 2500 * Math.sin(Math.PI / n), 6);
    // ... which approaches πr²/2 (stated tolerance: relative 1e-3).
    expect(Math.abs(area - (Math.PI * 2500) / 2) / ((Math.PI * 2500) / 2)).toBeLessThan(1e-3);
  });

  it('radii too small to reach the end point are scaled up (F.6.6): r = 10 over a chord of 100 becomes r = 50', () => {
    // F.6.6: Λ = x1′²/rx² + y1′²/ry² = 50²/10² = 25 > 1, so rx = ry = √25 · 10 = 50: the half circle centred at (50,0).
    const line = onePath('M0 0 A10 10 0 0 1 100 0');
    for (const [x, y] of line) {
      expect(Math.abs(Math.hypot(x - 50, y) - 50)).toBeLessThan(50e-9);
      // sweep-flag 1: positive-angle way, 180° → 360° through 270°, i.e. y ≤ 0.
      expect(y).toBeLessThanOrEqual(1e-9);
    }
    // Positive shoelace sum for (0,0) → (50,−50) → (100,0): the orientation the sweep flag asks for.
    expect(shoelace(line)).toBeGreaterThan(0);
    expect(Math.abs(shoelace(line) - (Math.PI * 2500) / 2) / ((Math.PI * 2500) / 2)).toBeLessThan(1e-3);
  });

  it('the large-arc flag picks the 270° arc of the two circles through the end points, the small one the 90° arc', () => {
    // The pie of the SVG 1.1 §8.3.8 example (path recalled from memory: "M300,200 h-150 a150,150 0 1,0 150,-150 z").
    // Analytic: circles of r = 150 through (150,200) and (300,50) have centres (300,200) and (150,50).
    const r = 150;
    const large = onePath('M300,200 h-150 a150,150 0 1,0 150,-150 z');
    const arcLarge = large.slice(1, -1);
    for (const [x, y] of arcLarge) expect(Math.abs(Math.hypot(x - 300, y - 200) - r)).toBeLessThan(r * 1e-9);
    const n = arcLarge.length - 1;
    // Pie of 3/4 turn: n triangles of apex angle (3π/2)/n at the centre, area (n/2) r² sin(3π/(2n)) → 3/4 πr².
    const pie = Math.abs(shoelace(large));
    expect(pie).toBeCloseTo((n / 2) * r * r * Math.sin((3 * Math.PI) / (2 * n)), 6);
    expect(Math.abs(pie - 0.75 * Math.PI * r * r) / (0.75 * Math.PI * r * r)).toBeLessThan(1e-3);

    const small = onePath('M300,200 h-150 a150,150 0 0,0 150,-150 z');
    for (const [x, y] of small.slice(1, -1)) expect(Math.abs(Math.hypot(x - 150, y - 50) - r)).toBeLessThan(r * 1e-9);
    // Analytic: the right triangle (300,200),(150,200),(300,50) less the circular segment of 90°, r²/2 (π/2 − 1).
    const expected = (r * r) / 2 - ((r * r) / 2) * (Math.PI / 2 - 1);
    expect(Math.abs(Math.abs(shoelace(small)) - expected) / expected).toBeLessThan(1e-3);
  });

  it('the four flag pairs pick the four arcs of §8.3.8: centre and swept angle per pair', () => {
    // Analytic: from (150,200) to (300,50) with r = 150 the two circles have centres (300,200) and (150,50); on each,
    // one arc turns 90° and the other 270°. sweep-flag 1 turns the positive-angle way (y down: +x toward +y).
    const cases: { flags: string; centre: Pt; turn: number }[] = [
      { flags: '1,0', centre: [300, 200], turn: -1.5 * Math.PI },
      { flags: '0,0', centre: [150, 50], turn: -0.5 * Math.PI },
      { flags: '1,1', centre: [150, 50], turn: 1.5 * Math.PI },
      { flags: '0,1', centre: [300, 200], turn: 0.5 * Math.PI },
    ];
    for (const { flags, centre, turn } of cases) {
      const line = onePath(`M150,200 A150,150 0 ${flags} 300,50`);
      let swept = 0;
      for (let k = 1; k < line.length; k++) {
        const [a0, a1] = [line[k - 1], line[k]].map(([x, y]) => Math.atan2(y - centre[1], x - centre[0]));
        swept += Math.atan2(Math.sin(a1 - a0), Math.cos(a1 - a0));
        expect(Math.abs(Math.hypot(line[k][0] - centre[0], line[k][1] - centre[1]) - 150)).toBeLessThan(150e-9);
      }
      expect(swept).toBeCloseTo(turn, 9);
    }
  });

  it('a rotated ellipse: every vertex on the ellipse, from parameter 0° to 90° in order (F.6.3, F.6.5)', () => {
    const [cx, cy, rx, ry, phi] = [100, 100, 50, 20, Math.PI / 6];
    // F.6.3: the point at parameter θ of the ellipse with centre c, radii rx, ry, x-axis rotation φ.
    const at = (t: number): Pt => [
      cx + Math.cos(phi) * rx * Math.cos(t) - Math.sin(phi) * ry * Math.sin(t),
      cy + Math.sin(phi) * rx * Math.cos(t) + Math.cos(phi) * ry * Math.sin(t),
    ];
    const [p0, p1] = [at(0), at(Math.PI / 2)];
    const line = onePath(`M${p0[0]} ${p0[1]} A50 20 30 0 1 ${p1[0]} ${p1[1]}`);
    const params = line.map(([x, y]) => {
      // Back to the ellipse's frame: rotate by −φ about the centre.
      const u = Math.cos(phi) * (x - cx) + Math.sin(phi) * (y - cy);
      const v = -Math.sin(phi) * (x - cx) + Math.cos(phi) * (y - cy);
      expect(Math.abs((u / rx) ** 2 + (v / ry) ** 2 - 1)).toBeLessThan(1e-9);
      return Math.atan2(v / ry, u / rx);
    });
    expect(params[0]).toBeCloseTo(0, 9);
    expect(params[params.length - 1]).toBeCloseTo(Math.PI / 2, 9);
    for (let k = 1; k < params.length; k++) expect(params[k]).toBeGreaterThan(params[k - 1]);
  });

  it('out-of-range parameters (F.6.2): a zero radius is a straight line, identical end points omit the arc, negative radii count as positive', () => {
    expect(pathDataToPolylines('M0 0 A0 10 0 0 1 100 0')).toEqual([[[0, 0], [100, 0]]]);
    expect(pathDataToPolylines('M0 0 A10 10 0 0 1 0 0 L5 5')).toEqual([[[0, 0], [5, 5]]]);
    expect(pathDataToPolylines('M0 0 A-50 -50 0 0 0 100 0')).toEqual(pathDataToPolylines('M0 0 A50 50 0 0 0 100 0'));
  });

  it('reads flags as single characters, relative arcs from the current point (SVG 1.1 §8.3.9 path data grammar)', () => {
    // "0 1150 0": flags 1 and 1, then the point (50, 0) — the grammar's flag is one "0" or "1".
    expect(pathDataToPolylines('M10 10 a25 25 0 1150 0')).toEqual(pathDataToPolylines('M10 10 A25 25 0 1 1 60 10'));
    expect(pathDataToPolylines('M0 0 a10 10 0 2 0 50 0')).toBeNull();
  });
});
