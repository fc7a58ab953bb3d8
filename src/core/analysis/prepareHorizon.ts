import { clipAndMeasure, type ClipAllocate } from '../geometry/clipAndMeasure';
import type { ClippedPolyline, PinClip } from '../geometry/clipPolylineToPins';
import { crossingVerdict } from '../geometry/crossingVerdicts';
import type { Cutoff } from '../model/joinPieces';
import type { LengthUnit } from '../model/section';
import type { SectionProblem } from '../model/validateSection';
import { projectedContribution } from './projectedContribution';
import { formatNumber } from '../model/numberText';

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
  /** Each line's length beyond the pin width (lengthBeyondSpan, units): L − W = bedBeyond − regionalBeyond, formed without cancellation. */
  bedBeyond: number;
  regionalBeyond: number;
  /** r = (1/W0) ∫ regional dx over the pins (units). */
  regionalElevation: number;
  /** Signed area carried by projected runs (see projectedContribution) and their length. */
  projectedArea: number;
  projectedLength: number;
  /** |P| / (|P| + |A − P|): the share of the absolute area carried by projected runs (0 when both are 0). */
  projectedAreaShare: number;
  /** Number of pieces (1 for an unbroken line) and the cutoff pairs between them (empty for one piece). */
  pieces: number;
  cutoffs: Cutoff[];
  /** Vertices of the measured input line (for a horizon in pieces: the joined line). */
  inputVertexCount: number;
}

/** What a horizon in pieces adds: which segments of the joined line run along a fault, and the cutoffs. */
export interface HorizonJoin { faultSegments: Uint8Array; pieces: number; cutoffs: Cutoff[] }

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

function crossingProblem(c: ClippedPolyline, who: string, what: string, name: string, units?: LengthUnit): SectionProblem | null {
  // The sweep-line test with exact orientation signs (sweepSelfCrossing): touches and retraced stretches are not crossings.
  // A long line may be under test elsewhere (crossingVerdicts): it is measured meanwhile, and left out if it crosses.
  const pair = crossingVerdict(c.xs, c.zs);
  if (pair === null || pair === 'pending') return null;
  const [s, t] = pair;
  // Name the input segments (vertex i to i + 1), not clipped ones, so the user can find the spot;
  // the smaller end of a clipped segment's source lies on its input segment, in either direction.
  const inputSegment = (k: number) => Math.floor(Math.min(c.source[k], c.source[k + 1]));
  const [i, j] = [inputSegment(s), inputSegment(t)].sort((a, b) => a - b);
  const x = formatNumber(crossingX(c.xs, c.zs, s, t), 6);
  const where = `segments ${i}–${i + 1} and ${j}–${j + 1} cross at x ≈ ${x}${units ? ` ${units}` : ''}`;
  return { code: 'self-intersecting', horizon: name, message: `${who}: the ${what} crosses itself between the pins (${where}); redraw it so it does not cross itself.` };
}

/** x where segments s and t (vertex k to k + 1) of xs/zs meet: the line intersection, or for collinear overlap an end inside both. */
function crossingX(xs: ArrayLike<number>, zs: ArrayLike<number>, s: number, t: number): number {
  // Relative to segment s's start (docs/method.md §Numerics).
  const x0 = xs[s], z0 = zs[s];
  const rx = xs[s + 1] - x0, rz = zs[s + 1] - z0;
  const cx = xs[t] - x0, cz = zs[t] - z0;
  const qx = xs[t + 1] - xs[t], qz = zs[t + 1] - zs[t];
  const den = rx * qz - rz * qx;
  if (den !== 0) {
    // a + u·r = c + v·q solved for u (Cramer's rule), clamped for a touch at an end.
    const u = Math.min(1, Math.max(0, (cx * qz - cz * qx) / den));
    return x0 + u * rx;
  }
  // Parallel segments that meet are collinear: an end of one lies within the other's extent.
  const inside = (x: number, z: number, ax: number, az: number, bx: number, bz: number) =>
    Math.min(ax, bx) <= x && x <= Math.max(ax, bx) && Math.min(az, bz) <= z && z <= Math.max(az, bz);
  if (inside(cx, cz, 0, 0, rx, rz)) return x0 + cx;
  if (inside(cx + qx, cz + qz, 0, 0, rx, rz)) return x0 + cx + qx;
  return x0;
}

/** Clip one horizon and its regional to the pins and measure them; problems (pins, self-crossing) instead of throwing; `units`, when given, labels the x in messages; the clipped arrays come from `allocate` (default new ones). */
export function prepareHorizon(
  name: string,
  lineX: ArrayLike<number>, lineZ: ArrayLike<number>,
  regionalX: ArrayLike<number>, regionalZ: ArrayLike<number>,
  pins: [number, number],
  included = true,
  segmentProjected?: ArrayLike<number>,
  units?: LengthUnit,
  allocate?: ClipAllocate,
  join?: HorizonJoin,
): HorizonPreparation {
  const who = `Horizon "${name}"`;
  const lineWhat = join ? 'joined line (its pieces and the fault between them)' : 'line';
  // The regional first: its first clipped z is the loop's z origin (as areaBetweenPolylines takes it).
  const reg = clipAndMeasure(regionalX, regionalZ, pins[0], pins[1], undefined, undefined, allocate);
  const lin = clipAndMeasure(lineX, lineZ, pins[0], pins[1], segmentProjected, reg.zOrigin, allocate);
  const problems = [...pinProblems(lin.clip, who, lineWhat, name, pins), ...pinProblems(reg.clip, who, 'regional', name, pins)];
  for (const [m, what] of [[lin, lineWhat], [reg, 'regional']] as const) {
    // A line along which x only increases is one monotone chain and cannot cross itself (sweepSelfCrossing).
    const p = m.clip.clipped && !m.xMonotone ? crossingProblem(m.clip.clipped, who, what, name, units) : null;
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
  const alongFaults = join ? faultLengthWithin(lineX, lineZ, join.faultSegments, pins) : 0;
  return {
    ok: true,
    horizon: {
      name, included, line, regional, excessArea,
      // Bed length counts the pieces only: the stretches along faults are not bed (docs/method.md §Faults and horizons in pieces).
      bedLength: lin.length - alongFaults,
      regionalLength: reg.length,
      // Segments along a fault are not bed: their length leaves L, and so L − W (the fault's heave stays in W0).
      bedBeyond: lin.lengthBeyondSpan - alongFaults,
      regionalBeyond: reg.lengthBeyondSpan,
      regionalElevation,
      projectedArea: proj.area,
      projectedLength: proj.length,
      projectedAreaShare: share,
      pieces: join ? join.pieces : 1,
      cutoffs: join ? join.cutoffs : [],
      inputVertexCount: Math.min(lineX.length, lineZ.length),
    },
  };
}

/** Length (units) of the flagged segments' parts with pL ≤ x ≤ pR: a segment's length times the share of its x-range inside (all or nothing for a vertical one). */
function faultLengthWithin(xs: ArrayLike<number>, zs: ArrayLike<number>, flags: Uint8Array, pins: [number, number]): number {
  const [pL, pR] = pins;
  let sum = 0;
  for (let s = 0; s < flags.length; s++) {
    if (!flags[s]) continue;
    const ax = xs[s], bx = xs[s + 1];
    const len = Math.hypot(bx - ax, zs[s + 1] - zs[s]);
    const lo = Math.min(ax, bx), hi = Math.max(ax, bx);
    if (hi === lo) {
      if (lo >= pL && lo <= pR) sum += len;
      continue;
    }
    const inside = Math.max(0, Math.min(hi, pR) - Math.max(lo, pL));
    sum += (len * inside) / (hi - lo);
  }
  return sum;
}
