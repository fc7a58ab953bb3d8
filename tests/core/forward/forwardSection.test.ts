import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { forwardSection } from '../../../src/core/forward/forwardSection';
import type { FoldSpec, ForwardSpec } from '../../../src/core/forward/forwardSpec';
import type { XZ } from '../../../src/core/model/section';

// --- Independent helpers, written here so the check does not reuse the model's own code. ---

/** Linear interpolation of z at x on the segment a–b. */
const lerpZ = (a: XZ, b: XZ, x: number): number => a[1] + ((b[1] - a[1]) * (x - a[0])) / (b[0] - a[0]);

/** Part of a polyline between x = pL and x = pR, assuming it crosses each once. */
function between(line: XZ[], pL: number, pR: number): XZ[] {
  const out: XZ[] = [];
  for (let i = 0; i + 1 < line.length; i++) {
    const a = line[i];
    const b = line[i + 1];
    if (a[0] < pL && b[0] >= pL) out.push([pL, lerpZ(a, b, pL)]);
    if (b[0] > pL && b[0] < pR) out.push(b);
    if (a[0] <= pR && b[0] > pR) out.push([pR, lerpZ(a, b, pR)]);
  }
  return out;
}

/** Shoelace (Gauss) area of a closed ring, counter-clockwise positive. */
function shoelace(ring: XZ[]): number {
  let s = 0;
  for (let i = 0; i < ring.length; i++) {
    const [x1, z1] = ring[i];
    const [x2, z2] = ring[(i + 1) % ring.length];
    s += x1 * z2 - x2 * z1;
  }
  return s / 2;
}

/** Excess area as docs/method.md §Pins, regional and excess area constructs it: horizon left pin → right pin, regional back; above positive. */
function excess(line: XZ[], regional: XZ[], pins: [number, number]): number {
  return -shoelace([...between(line, pins[0], pins[1]), ...between(regional, pins[0], pins[1]).reverse()]);
}

/** Number of segments of a polyline that cross the vertical x = p (a vertex on the line counts once). */
function pinCrossings(line: XZ[], p: number): number {
  let n = 0;
  for (let i = 0; i + 1 < line.length; i++) {
    const a = line[i][0] - p;
    const b = line[i + 1][0] - p;
    if ((a < 0 && b >= 0) || (a >= 0 && b < 0)) n++;
  }
  return n;
}

/** Mean of a polyline's z over [pL, pR] by trapezoids (regional elevation, docs/method.md §Pins, regional and excess area). */
function meanOver(line: XZ[], pL: number, pR: number): number {
  const part = between(line, pL, pR);
  let s = 0;
  for (let i = 0; i + 1 < part.length; i++) s += ((part[i][1] + part[i + 1][1]) / 2) * (part[i + 1][0] - part[i][0]);
  return s / (pR - pL);
}

function properlyCross(a: XZ, b: XZ, c: XZ, d: XZ): boolean {
  const o = (p: XZ, q: XZ, r: XZ): number => Math.sign((q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0]));
  return o(a, b, c) * o(a, b, d) < 0 && o(c, d, a) * o(c, d, b) < 0;
}

function selfCrossings(line: XZ[]): number {
  let n = 0;
  for (let i = 0; i + 1 < line.length; i++) {
    for (let j = i + 2; j + 1 < line.length; j++) if (properlyCross(line[i], line[i + 1], line[j], line[j + 1])) n++;
  }
  return n;
}

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

const shapes: Record<string, FoldSpec[]> = {
  box: [{ shape: 'box', from: 3000, to: 9000 }],
  rounded: [{ shape: 'rounded', from: 3000, to: 11000 }],
  asymmetric: [{ shape: 'asymmetric', from: 3000, to: 11000, crest: 0.7, shear: 0.4 }],
  overturned: [{ shape: 'overturned', from: 12000, to: 16000, crest: 0.7 }],
  'anticline with synclines below regional': [
    { shape: 'rounded', from: 2000, to: 5000, weight: -0.4 },
    { shape: 'box', from: 5000, to: 11000 },
    { shape: 'rounded', from: 11000, to: 14000, weight: -0.4 },
  ],
};

function baseSpec(folds: FoldSpec[], extra: Partial<ForwardSpec> = {}): ForwardSpec {
  return {
    units: 'm', displacement: 1000, detachmentElevation: -3000, pins: [0, 20000], folds,
    horizons: [500, 0, -500, -1000, -2000].map((r, i) => ({ name: `H${i + 1}`, regionalElevation: r })),
    ...extra,
  };
}

const regionals = {
  horizontal: { kind: 'horizontal' as const },
  inclined: { kind: 'inclined' as const, slope: -0.03 },
  curved: { kind: 'curved' as const, points: [[-500, 0], [4000, 120], [9000, 200], [15000, 90], [21000, -60]] as XZ[] },
};

describe('forwardSection', () => {
  for (const [shapeName, folds] of Object.entries(shapes)) {
    for (const [regName, regional] of Object.entries(regionals)) {
      it(`forwardSection(${shapeName}, ${regName} regional): each excess area is D·(r − zd) and each pin is crossed once`, () => {
        const spec = baseSpec(folds, { regional });
        const { section } = forwardSection(spec);
        section.horizons.forEach((h, i) => {
          const r = spec.horizons[i].regionalElevation!;
          // Epard & Groshong (1993): A = D · (zd − h), i.e. D times the height of the regional above the detachment.
          const target = 1000 * (r - -3000);
          expect(rel(excess(h.line, h.regional, section.pins), target)).toBeLessThan(1e-12);
          // The regional elevation is the mean of the regional over the pins (docs/method.md §Pins, regional and excess area).
          expect(Math.abs(meanOver(h.regional, 0, 20000) - r)).toBeLessThan(1e-9);
          for (const line of [h.line, h.regional]) {
            expect(pinCrossings(line, 0)).toBe(1);
            expect(pinCrossings(line, 20000)).toBe(1);
          }
          expect(selfCrossings(h.line)).toBe(0);
        });
      });
    }
  }

  it('forwardSection(overturned): the highest horizon folds back in x, and the stack stays free of crossings', () => {
    const { section, truth } = forwardSection(baseSpec(shapes.overturned));
    const xs = section.horizons[0].line.map((p) => p[0]);
    const backwards = xs.filter((x, i) => i > 0 && x < xs[i - 1]).length;
    expect(backwards).toBeGreaterThan(0);
    // A vertical line through the overturned limb meets the horizon three times.
    const top = section.horizons[0].line;
    const limbX = [...xs].filter((x, i) => i > 0 && x < xs[i - 1])[0];
    expect(pinCrossings(top, limbX + 1e-6)).toBe(3);
    for (let i = 0; i < section.horizons.length; i++) {
      for (let j = i + 1; j < section.horizons.length; j++) {
        const a = section.horizons[i].line;
        const b = section.horizons[j].line;
        let n = 0;
        for (let p = 0; p + 1 < a.length; p++) for (let q = 0; q + 1 < b.length; q++) if (properlyCross(a[p], a[p + 1], b[q], b[q + 1])) n++;
        expect(n).toBe(0);
      }
    }
    expect(truth.horizons[0].maxUplift).toBeGreaterThan(truth.horizons[4].maxUplift);
  });

  it('forwardSection(synclines): part of every horizon lies below its regional', () => {
    const { section } = forwardSection(baseSpec(shapes['anticline with synclines below regional']));
    for (const h of section.horizons) {
      const below = h.line.filter(([x, z]) => x > 2000 && x < 5000 && z < h.regional[0][1] - 1);
      expect(below.length).toBeGreaterThan(0);
    }
  });

  it('forwardSection(box) has the trapezoid amplitude A / (w (1 − limb)) (area of a trapezoid)', () => {
    const { truth } = forwardSection(baseSpec([{ shape: 'box', from: 3000, to: 9000, limb: 0.25 }]));
    // Trapezoid of height a, bases w and w(1 − 2·limb): area a·w·(1 − limb).
    truth.horizons.forEach((h) => expect(rel(h.maxUplift, h.targetExcessArea / (6000 * 0.75))).toBeLessThan(1e-12));
  });

  it('forwardSection(rounded) has the sine-bump amplitude 2A / λ (area of a·sin²(πx/λ) is aλ/2)', () => {
    // docs/method.md §Check values, analytic shapes: a full bump a·sin²(πx/λ) over one wavelength has area aλ/2.
    const { truth } = forwardSection(baseSpec(shapes.rounded));
    truth.horizons.forEach((h) => expect(rel(h.maxUplift, (2 * h.targetExcessArea) / 8000)).toBeLessThan(1e-12));
  });

  it('forwardSection in feet: units carried through, areas in ft², depths from referenceElevation', () => {
    const spec: ForwardSpec = {
      units: 'ft', displacement: 3500, detachmentDepth: 12000, referenceElevation: 2000, pins: [10000, 70000],
      folds: [{ shape: 'asymmetric', from: 20000, to: 45000, crest: 0.65 }],
      horizons: [0, 2500, 5000, 8000].map((d, i) => ({ name: `F${i}`, depth: d })),
    };
    const { section, truth } = forwardSection(spec);
    expect(section.units).toBe('ft');
    expect(truth.units).toBe('ft');
    expect(section.referenceElevation).toBe(2000);
    expect(truth.detachmentElevation).toBe(2000 - 12000);
    section.horizons.forEach((h, i) => {
      const depth = [0, 2500, 5000, 8000][i];
      expect(rel(excess(h.line, h.regional, section.pins), 3500 * (12000 - depth))).toBeLessThan(1e-12);
    });
  });

  it('forwardSection reports bed length and layer-parallel strain L/(W + D) − 1 of the built lines', () => {
    const { section, truth } = forwardSection(baseSpec(shapes.box));
    const len = (l: XZ[]): number => l.slice(1).reduce((s, p, i) => s + Math.hypot(p[0] - l[i][0], p[1] - l[i][1]), 0);
    section.horizons.forEach((h, i) => {
      const L = len(between(h.line, 0, 20000));
      expect(rel(truth.horizons[i].bedLength, L)).toBeLessThan(1e-12);
      // Groshong 2006 §11.4.3.2: e = L / (W + D) − 1.
      expect(truth.horizons[i].lpsStrain).toBeCloseTo(L / (20000 + 1000) - 1, 12);
    });
  });

  it('forwardSection output is plain JSON data', () => {
    const { section } = forwardSection(baseSpec(shapes.overturned, { regional: regionals.curved }));
    expect(JSON.parse(JSON.stringify(section))).toEqual(section);
  });

  it('forwardSection rejects folds that reach a pin, horizons below the detachment and an ambiguous detachment', () => {
    expect(() => forwardSection(baseSpec([{ shape: 'box', from: -100, to: 5000 }]))).toThrow(/left pin/);
    expect(() => forwardSection(baseSpec([{ shape: 'box', from: 15000, to: 20001 }]))).toThrow(/right pin/);
    expect(() => forwardSection(baseSpec([{ shape: 'box', from: 3000, to: 9000 }, { shape: 'box', from: 8000, to: 12000 }]))).toThrow(/overlaps/);
    expect(() => forwardSection({ ...baseSpec(shapes.box), detachmentElevation: 0 })).toThrow(/above the detachment/);
    expect(() => forwardSection({ ...baseSpec(shapes.box), detachmentDepth: 100 })).toThrow(/exactly one/);
  });

  it('forwardSection hits the target area for random displacements, levels and folds (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 5000, noNaN: true }),
        fc.double({ min: -8000, max: 0, noNaN: true }),
        fc.array(fc.double({ min: 50, max: 4000, noNaN: true }), { minLength: 1, maxLength: 5 }),
        fc.constantFrom('box', 'rounded', 'asymmetric'),
        fc.double({ min: -0.05, max: 0.05, noNaN: true }),
        (D, zd, heights, shape, slope) => {
          const spec: ForwardSpec = {
            units: 'm', displacement: D, detachmentElevation: zd, pins: [1000, 31000], regional: { kind: 'inclined', slope },
            folds: [{ shape: shape as FoldSpec['shape'], from: 5000, to: 20000 }],
            horizons: heights.map((hh, i) => ({ name: `h${i}`, regionalElevation: zd + hh })),
          };
          const { section } = forwardSection(spec);
          section.horizons.forEach((h, i) => {
            expect(rel(excess(h.line, h.regional, section.pins), D * heights[i])).toBeLessThan(1e-9);
          });
        },
      ),
      { seed: 20240611, numRuns: 60 },
    );
  });
});
