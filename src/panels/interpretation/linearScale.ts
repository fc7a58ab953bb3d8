// A linear map between a data domain and a pixel range (either may be reversed).

export interface LinearScale { map(v: number): number; invert(p: number): number; domain: [number, number]; range: [number, number] }

/** The scale taking domain[0] → range[0] and domain[1] → range[1]; a zero-width domain maps to the range's middle. */
export function linearScale(domain: [number, number], range: [number, number]): LinearScale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const k = d1 !== d0 ? (r1 - r0) / (d1 - d0) : 0;
  return {
    domain, range,
    map: (v) => (k === 0 ? (r0 + r1) / 2 : r0 + (v - d0) * k),
    invert: (p) => (k === 0 ? d0 : d0 + (p - r0) / k),
  };
}
