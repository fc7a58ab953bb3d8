// Forward model: a synthetic, area-balanced section from a chosen displacement and detachment.
import type { LineHorizon, XZ } from '../model/section';
import type { FoldSpec, ForwardHorizonTruth, ForwardResult, ForwardSpec } from './forwardSpec';
import { foldProfile, type FoldProfile } from './foldProfile';
import { regionalProfile } from './regionalProfile';
import { resolveLevels } from './resolveLevels';
import { overturnShear, placeFolds, unitFoldArea } from './placeFolds';
import { horizonLine, type PlacedFold } from './horizonLine';
import { clipAtPins } from './clipAtPins';
import { loopExcessArea } from './loopExcessArea';
import { polylineLength } from './polylineLength';
import { minOf, maxOf } from '../stats/minMax';

/**
 * Returns a section whose horizons have excess area D · (regional elevation − detachment elevation)
 * (Epard & Groshong 1993) to rounding, and the truth it was built from; throws on an impossible spec.
 */
export function forwardSection(spec: ForwardSpec): ForwardResult {
  const [pL, pR] = spec.pins;
  const D = spec.displacement;
  if (!(pL < pR) || !(D > 0) || !Number.isFinite(D)) throw new Error('forward model: need pins left < right and D > 0');
  if (new Set(spec.horizons.map((h) => h.name)).size !== spec.horizons.length) throw new Error('forward model: duplicate horizon names');
  const margin = 0.05 * (pR - pL);
  const extent = spec.extent ?? [pL - margin, pR + margin];
  if (!(extent[0] < pL && extent[1] > pR)) throw new Error('forward model: extent must reach beyond both pins');
  const levels = resolveLevels(spec);
  const { regionalElevations: rs, detachmentElevation: zd, referenceElevation: zref } = levels;
  const anchor = spec.anchorElevation ?? maxOf(rs);
  const foldsOf = spec.horizons.map((h) => h.folds ?? spec.folds);
  const profiles = new Map<FoldSpec, FoldProfile>();
  for (const f of foldsOf.flat()) {
    if (!(f.to > f.from)) throw new Error(`forward model: fold at x = ${f.from} needs to > from`);
    if (!profiles.has(f)) profiles.set(f, foldProfile(f, spec.samplesPerFold ?? 48));
  }
  // Amplitude scale: the excess area is linear in it, so one division hits the target (see horizonLine).
  const scales = spec.horizons.map((h, i) => {
    const unit = unitFoldArea(foldsOf[i], profiles);
    if (!(unit > 0)) throw new Error(`forward model: the folds of "${h.name}" must have a net uplift`);
    return (D * (rs[i] - zd)) / unit;
  });
  // Shear of each fold, set on the highest horizon that carries it (overturning dies out downwards).
  const shears = new Map<FoldSpec, number>();
  for (const i of rs.map((_, k) => k).sort((a, b) => rs[b] - rs[a])) {
    for (const f of foldsOf[i]) {
      if (shears.has(f)) continue;
      shears.set(f, f.shape === 'overturned' ? overturnShear(f, profiles.get(f)!, scales[i]) : f.shape === 'asymmetric' ? (f.shear ?? 0) : 0);
    }
  }
  const horizons: LineHorizon[] = [];
  const truths: ForwardHorizonTruth[] = [];
  spec.horizons.forEach((h, i) => {
    const prof = regionalProfile(h.regional ?? spec.regional ?? { kind: 'horizontal' }, spec.pins, extent);
    const regionalAt = (x: number): number => rs[i] + prof.offset(x);
    const placed = placeFolds(foldsOf[i], profiles, shears, scales[i], rs[i] - anchor);
    checkPlacement(h.name, placed, spec.pins);
    const line = horizonLine(placed, extent, prof.breaks, regionalAt);
    const regional: XZ[] = [extent[0], ...prof.breaks, extent[1]].map((x) => [x, regionalAt(x)]);
    horizons.push({ name: h.name, line, regional, ...(h.include === undefined ? {} : { include: h.include }) });
    const lineIn = clipAtPins(line, spec.pins);
    const regionalIn = clipAtPins(regional, spec.pins);
    const L = polylineLength(lineIn);
    const W = polylineLength(regionalIn);
    truths.push({
      name: h.name, regionalElevation: rs[i], depth: zref - rs[i], targetExcessArea: D * (rs[i] - zd),
      excessArea: loopExcessArea(lineIn, regionalIn), bedLength: L, regionalLength: W, lpsStrain: L / (W + D) - 1,
      maxUplift: maxOf(placed.flatMap((f) => f.uplift), 0),
    });
  });
  const section = { units: spec.units, pins: [pL, pR] as [number, number], ...(spec.referenceElevation === undefined ? {} : { referenceElevation: zref }), horizons };
  return { section, truth: { units: spec.units, displacement: D, detachmentElevation: zd, detachmentDepth: zref - zd, referenceElevation: zref, horizons: truths } };
}

/** Throws unless every fold stays strictly between the pins and clear of its neighbours, so each pin is crossed once. */
function checkPlacement(name: string, folds: PlacedFold[], pins: [number, number]): void {
  let right = pins[0];
  folds.forEach((f, k) => {
    const xs = f.xs.map((x, j) => x + f.shear * f.uplift[j]);
    const lo = minOf(xs);
    // Neighbouring folds may share an end point on the regional; the left pin must stay clear.
    if (!(k === 0 ? lo > right : lo >= right)) throw new Error(`forward model: on "${name}" a fold reaches the left pin or overlaps its neighbour at x = ${lo}`);
    right = maxOf(xs);
  });
  if (!(right < pins[1])) throw new Error(`forward model: on "${name}" a fold reaches the right pin at x = ${right}`);
}
