import type { ClippedPolyline } from '../geometry/clipPolylineToPins';

// The excess area is a shoelace sum over the loop "horizon from left pin to right pin, regional
// back", so for fixed x it is linear in every z: ∂A/∂zₖ = (x₍ₖ₊₁₎ − x₍ₖ₋₁₎)/2 for a clipped vertex k,
// with the loop's neighbours at the pins closing the ends (docs/method.md §Area variance of a horizon, our derivation). A clipped
// end vertex is interpolated between input vertices j and j+1 at fraction λ, so it passes
// (1 − λ) and λ of its coefficient back to them. Independent vertical noise σ on the input
// vertices then moves A by a normal amount of variance σ² Σ cᵢ².

/** ∂A/∂z per input vertex of the horizon (units² per unit; 0 for vertices outside the pins), from its clipped line. */
export function areaVertexCoefficients(line: ClippedPolyline, inputLength: number, pins: [number, number]): Float64Array {
  const out = new Float64Array(inputLength);
  const m = line.xs.length;
  for (let k = 0; k < m; k++) {
    const before = k === 0 ? pins[0] : line.xs[k - 1];
    const after = k === m - 1 ? pins[1] : line.xs[k + 1];
    const c = (after - before) / 2;
    const s = line.source[k];
    const j = Math.floor(s);
    const lambda = s - j;
    if (lambda === 0) out[j] += c;
    else {
      out[j] += (1 - lambda) * c;
      out[j + 1] += lambda * c;
    }
  }
  return out;
}

/** Σ cᵢ² of areaVertexCoefficients (units⁴ per unit²): the area variance per unit of vertex variance. */
export function areaNoiseFactor(line: ClippedPolyline, inputLength: number, pins: [number, number]): number {
  const c = areaVertexCoefficients(line, inputLength, pins);
  let sum = 0;
  for (let i = 0; i < c.length; i++) sum += c[i] * c[i];
  return sum;
}
