import type { LineHorizon, LineSection, XZ } from '../../../src/core/model/section';

/** A triangular fold with the given excess area over a flat regional at elevation r, pins [0, w]. */
export function triangleHorizon(name: string, area: number, r: number, w: number): LineHorizon {
  // Analytic: a triangle of base w and height 2A/w has area A.
  const peak = (2 * area) / w;
  return { name, line: [[0, r], [w / 2, r + peak], [w, r]], regional: [[0, r], [w, r]] };
}

/** the synthetic example of docs/method.md §Check values (our own): D = 1000 m, zd = 3000 m, h = 500…2000 m, A = D (zd − h). */
export function methodExample(): LineSection {
  const w = 10_000;
  return {
    units: 'm',
    pins: [0, w],
    referenceElevation: 0,
    horizons: [500, 1000, 1500, 2000].map((h, i) => triangleHorizon(`H${i + 1}`, 1000 * (3000 - h), -h, w)),
  };
}

export function pts(...p: number[]): XZ[] {
  const out: XZ[] = [];
  for (let i = 0; i < p.length; i += 2) out.push([p[i], p[i + 1]]);
  return out;
}
