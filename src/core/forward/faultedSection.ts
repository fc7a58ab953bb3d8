// Forward model of a faulted section: a hanging wall carried over a fault by vertical simple shear
// (Gibbs 1983, J. Struct. Geol. 5, for the construction; exactness is our derivation, docs/method.md
// "Forward model"). The fault is z = f(x), rising to the right; a hanging-wall point (x, z) above it
// moves to (x + D, z + f(x + D) − f(x)) and footwall points stay. D > 0 carries the hanging wall up
// the ramp (a thrust: the horizon repeats), D < 0 down it (a normal fault: a gap opens along the fault).
//
// Why every horizon's excess area is exactly D·(z_r − zd): the map moves each vertical strip by D and
// keeps the height above the fault, so the hanging-wall area between the horizon and the fault over
// [pL, x_c + D] equals the area between z_r and the fault over [pL − D, x_c]. The joined line (hanging-
// wall piece, the fault from the hanging-wall cutoff to the footwall cutoff, footwall piece at z_r) then
// encloses, against the regional z = z_r, ∫ over [pL − D, pL] of (z_r − f) dx, which is D·(z_r − zd)
// when the fault lies on its lower flat at zd over that interval (the left pin condition).
// The hanging-wall piece is sampled wherever x or x + D passes a fault vertex, so the mapped line is
// the exact image (the map is piecewise linear between those points).
import type { Section, SectionHorizon, XZ } from '../model/section';
import { maxOf } from '../stats/minMax';

export interface FaultedSpec {
  units: 'm' | 'ft';
  /** Left and right pins (x). The fault must lie on its lower flat at x = pL and x = pL − D; the right pin in the footwall beyond every cutoff. */
  pins: [number, number];
  /** Displacement of the hanging wall along x (units): > 0 thrust, < 0 normal fault. */
  displacement: number;
  /** The fault: x strictly increasing, elevation never decreasing, its first vertex at the lower flat (the detachment, zd). */
  fault: XZ[];
  faultName?: string;
  /** Each horizon's name and flat regional elevation, strictly between the fault's lowest and highest elevation (so the ramp cuts it). */
  horizons: { name: string; regionalElevation: number }[];
  /** Where the lines start and end (default the pins ± 10% of their width and |D|). */
  extent?: [number, number];
  /** Digitise every horizon from right to left (pieces in reverse order, each reversed). */
  rightToLeft?: boolean;
}

export interface FaultedTruth {
  displacement: number;
  /** The lower flat's elevation. */
  detachmentElevation: number;
  /** The highest regional, and the detachment's depth below it. */
  referenceElevation: number;
  detachmentDepth: number;
  horizons: { name: string; regionalElevation: number; excessArea: number; footwallCutoff: XZ; hangingWallCutoff: XZ }[];
}

/** Elevation of the fault at x (linear between vertices); throws outside its x-range. */
function faultAt(f: XZ[], x: number): number {
  if (x < f[0][0] || x > f[f.length - 1][0]) throw new Error(`forward model: the fault does not reach x = ${x}; extend it`);
  for (let i = 0; i + 1 < f.length; i++) {
    const [x0, z0] = f[i], [x1, z1] = f[i + 1];
    if (x <= x1) return x === x1 ? z1 : x === x0 ? z0 : z0 + ((x - x0) / (x1 - x0)) * (z1 - z0);
  }
  return f[f.length - 1][1];
}

/** The x where the fault reaches elevation z, on a segment that rises through it (z strictly between the lowest and highest elevation). */
function faultCrossing(f: XZ[], z: number): number {
  for (let i = 0; i + 1 < f.length; i++) {
    const [x0, z0] = f[i], [x1, z1] = f[i + 1];
    if (z0 < z && z <= z1) return z === z1 ? x1 : x0 + ((z - z0) / (z1 - z0)) * (x1 - x0);
  }
  throw new Error(`forward model: the fault does not cut elevation ${z}`);
}

/** A faulted, area-balanced section with its truth; throws an Error naming the problem on an impossible spec. */
export function faultedSection(spec: FaultedSpec): { section: Section; truth: FaultedTruth } {
  const [pL, pR] = spec.pins;
  const D = spec.displacement;
  const f = spec.fault;
  if (!(pL < pR)) throw new Error('forward model: need pins left < right');
  if (!(D !== 0) || !Number.isFinite(D)) throw new Error('forward model: need a non-zero finite displacement');
  if (f.length < 2) throw new Error('forward model: the fault needs at least 2 points');
  for (let i = 0; i + 1 < f.length; i++) {
    if (!(f[i + 1][0] > f[i][0]) || f[i + 1][1] < f[i][1]) throw new Error('forward model: the fault must run left to right and never descend');
  }
  const zd = f[0][1];
  const top = f[f.length - 1][1];
  if (faultAt(f, pL) !== zd || faultAt(f, pL - D) !== zd) throw new Error('forward model: the fault must lie on its lower flat at the left pin and at pL − D');
  const margin = 0.1 * (pR - pL) + Math.abs(D);
  const extent = spec.extent ?? [pL - margin, pR + margin];
  const names = new Set<string>();
  const horizons: SectionHorizon[] = [];
  const truthHorizons: FaultedTruth['horizons'] = [];
  for (const h of spec.horizons) {
    const r = h.regionalElevation;
    if (names.has(h.name)) throw new Error(`forward model: duplicate horizon name "${h.name}"`);
    names.add(h.name);
    if (!(r > zd && r < top)) throw new Error(`forward model: "${h.name}" must lie between the fault's lower flat (${zd}) and top (${top})`);
    const xc = faultCrossing(f, r);
    const xHangingEnd = xc + D;
    if (!(Math.min(xc, xHangingEnd) > pL) || !(Math.max(xc, xHangingEnd) < pR) || !(extent[1] > pR) || !(extent[0] < pL)) {
      throw new Error(`forward model: "${h.name}" is cut at x = ${xc} (and carried to ${xHangingEnd}); both must lie between the pins, inside the extent`);
    }
    // Hanging wall before the move: from x0 (so that it starts at extent[0] once moved) to the cutoff xc.
    const x0 = extent[0] - D;
    const breaks = new Set<number>([x0, xc]);
    for (const [fx] of f) {
      for (const x of [fx, fx - D]) if (x > x0 && x < xc) breaks.add(x);
    }
    const xsBefore = [...breaks].sort((a, b) => a - b);
    const hanging: XZ[] = xsBefore.map((x) => [x + D, r + faultAt(f, x + D) - faultAt(f, x)]);
    // The cutoff lies on the fault exactly (its height above the fault, z_r − f(xc), is zero up to rounding).
    const hangingCutoff: XZ = [xHangingEnd, faultAt(f, xHangingEnd)];
    hanging[hanging.length - 1] = hangingCutoff;
    const footwallCutoff: XZ = [xc, faultAt(f, xc)];
    const footwall: XZ[] = [footwallCutoff, [extent[1], r]];
    const pieces = spec.rightToLeft ? [footwall.slice().reverse(), hanging.slice().reverse()] : [hanging, footwall];
    const regional: XZ[] = spec.rightToLeft ? [[extent[1], r], [extent[0], r]] : [[extent[0], r], [extent[1], r]];
    horizons.push({ name: h.name, pieces, regional });
    truthHorizons.push({ name: h.name, regionalElevation: r, excessArea: D * (r - zd), footwallCutoff, hangingWallCutoff: hangingCutoff });
  }
  const zref = maxOf(spec.horizons.map((h) => h.regionalElevation));
  return {
    section: { units: spec.units, pins: [pL, pR], horizons, faults: [{ name: spec.faultName ?? 'Fault 1', line: f.map((p) => [p[0], p[1]] as XZ) }] },
    truth: { displacement: D, detachmentElevation: zd, referenceElevation: zref, detachmentDepth: zref - zd, horizons: truthHorizons },
  };
}
