import { clipAndMeasure } from '../geometry/clipAndMeasure';
import type { ClippedPolyline, PinClip } from '../geometry/clipPolylineToPins';
import { chainCrossings } from '../geometry/chainCrossings';
import type { XMonotoneChains } from '../geometry/xMonotoneChains';
import type { SectionProblem } from '../model/validateSection';
import { projectedContribution } from './projectedContribution';

/** One horizon clipped to the pins, with the measures that do not depend on the area–depth fit. */
export interface PreparedHorizon {
  name: string;
  included: boolean;
  /** Horizon and regional, clipped to the pins, left to right (typed arrays, section units). */
  line: ClippedPolyline;
  regional: ClippedPolyline;
  /** Epard & Groshong excess area A (units², above the regional positive). */
  excessArea: number;
  /** Bed length L and regional length W between the pins (units, W measured along the regional). */
  bedLength: number;
  regionalLength: number;
  /** r = (1/W0) ∫ regional dx over the pins (units). */
  regionalElevation: number;
  /** Signed area carried by projected runs (see projectedContribution) and their length. */
  projectedArea: number;
  projectedLength: number;
  /** |P| / (|P| + |A − P|): the share of the absolute area carried by projected runs (0 when both are 0). */
  projectedAreaShare: number;
}

export type HorizonPreparation = { ok: true; horizon: PreparedHorizon } | { ok: false; problems: SectionProblem[] };

function pinProblems(clip: PinClip, who: string, what: string, name: string, pins: [number, number]): SectionProblem[] {
  const out: SectionProblem[] = [];
  const sides: [string, number, number][] = [['left', pins[0], clip.leftContacts], ['right', pins[1], clip.rightContacts]];
  for (const [side, x, count] of sides) {
    if (count === 0) {
      out.push({ code: 'misses-pin', horizon: name, message: `${who}: the ${what} does not reach the ${side} pin (x = ${x}); extend it across the pin or move the pin.` });
    } else if (count > 1) {
      out.push({ code: 'crosses-pin-twice', horizon: name, message: `${who}: the ${what} meets the ${side} pin (x = ${x}) ${count} times; it must cross each pin exactly once — move the pin to where the bed is back at its regional, or trim the ${what}.` });
    }
  }
  return out;
}

function crossingProblem(c: ClippedPolyline, chains: XMonotoneChains, who: string, what: string, name: string): SectionProblem | null {
  // The monotone-chain test of selfIntersections, on the chains the clipping pass already found.
  const pairs = chainCrossings(c.xs, c.zs, chains, 1);
  if (pairs.length === 0) return null;
  // Report input vertex numbers, not clipped ones, so the user can find the spot.
  const a = Math.floor(c.source[pairs[0][0]]);
  const b = Math.floor(c.source[pairs[0][1]]);
  const [i, j] = a <= b ? [a, b] : [b, a];
  return { code: 'self-intersecting', horizon: name, message: `${who}: the ${what} crosses itself between the pins (near vertices ${i} and ${j}, x ≈ ${c.xs[pairs[0][1]].toPrecision(6)}); redraw it so it does not cross itself.` };
}

/** Clip one horizon and its regional to the pins and measure them; problems (pins, self-crossing) instead of throwing. */
export function prepareHorizon(
  name: string,
  lineX: ArrayLike<number>, lineZ: ArrayLike<number>,
  regionalX: ArrayLike<number>, regionalZ: ArrayLike<number>,
  pins: [number, number],
  included = true,
  segmentProjected?: ArrayLike<number>,
): HorizonPreparation {
  const who = `Horizon "${name}"`;
  // The regional first: its first clipped z is the loop's z origin (as areaBetweenPolylines takes it).
  const reg = clipAndMeasure(regionalX, regionalZ, pins[0], pins[1]);
  const lin = clipAndMeasure(lineX, lineZ, pins[0], pins[1], segmentProjected, reg.zOrigin);
  const problems = [...pinProblems(lin.clip, who, 'line', name, pins), ...pinProblems(reg.clip, who, 'regional', name, pins)];
  for (const [m, what] of [[lin, 'line'], [reg, 'regional']] as const) {
    // A line along which x only increases is one monotone chain and cannot cross itself (selfIntersections).
    const p = m.clip.clipped && !m.xMonotone ? crossingProblem(m.clip.clipped, m.chains, who, what, name) : null;
    if (p) problems.push(p);
  }
  if (problems.length > 0 || !lin.clip.clipped || !reg.clip.clipped) return { ok: false, problems };
  const line = lin.clip.clipped;
  const regional = reg.clip.clipped;
  // Loop area as areaBetweenPolylines, and r = z0 + ∫ (z − z0) dx / W0 as meanElevation, from the same integrals.
  const excessArea = lin.integral - reg.integral;
  const width = regional.xs[regional.xs.length - 1] - regional.xs[0];
  const regionalElevation = width === 0 ? Number.NaN : reg.zOrigin + reg.integral / width;
  const proj = segmentProjected ? projectedContribution(line, regional) : { area: 0, length: 0 };
  const rest = Math.abs(excessArea - proj.area);
  const share = proj.area === 0 ? 0 : Math.abs(proj.area) / (Math.abs(proj.area) + rest);
  return {
    ok: true,
    horizon: {
      name, included, line, regional, excessArea,
      bedLength: lin.length,
      regionalLength: reg.length,
      regionalElevation,
      projectedArea: proj.area,
      projectedLength: proj.length,
      projectedAreaShare: share,
    },
  };
}
