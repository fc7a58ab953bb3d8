// The selected horizon's regional as numbers: its elevation at each pin, its mean elevation between the
// pins (the r of the area–depth analysis, docs/method.md §Pins, regional and excess area) and its dip.
import { imageToSection } from '../../calibration/mapPoints';
import { interpolateZAt } from '../../geometry/interpolateZAt';
import { meanElevation } from '../../geometry/meanElevation';
import { activeScenario } from '../docToSection';
import type { ProjectDoc } from '../projectDoc';
import { pinXs } from './pinXs';
import { sectionFrame } from './sectionFrame';

export interface RegionalLevels {
  pins: [number, number];
  /** Elevation of the regional at the left and right pins (section units; a straight end is extended). */
  zLeft: number;
  zRight: number;
  /** Mean elevation between the pins, (1/W₀) ∫ z dx. */
  mean: number;
  /** Dip of the chord between the pins, degrees; positive = down towards +x (to the right). */
  dipDeg: number;
  /** True when the regional is one straight segment. */
  straight: boolean;
}

/** Returns z at x along the polyline (x increasing), extending its end segments in a straight line; NaN for < 2 points. */
function zAlong(xs: number[], zs: number[], x: number): number {
  const n = xs.length;
  if (n < 2) return Number.NaN;
  const inside = interpolateZAt(xs, zs, x);
  if (Number.isFinite(inside)) return inside;
  const [i, j] = x < xs[0] ? [0, 1] : [n - 2, n - 1];
  if (xs[j] === xs[i]) return zs[i];
  return zs[i] + ((zs[j] - zs[i]) * (x - xs[i])) / (xs[j] - xs[i]);
}

/** Returns the horizon's regional levels in the active scenario, or null without pins or a regional. */
export function regionalLevels(doc: ProjectDoc, horizonId: string): RegionalLevels | null {
  const frame = sectionFrame(doc);
  const sc = activeScenario(doc);
  const pins = pinXs(sc.pinsPx, frame);
  const reg = sc.regionals[horizonId];
  if (!pins || !reg || reg.length < 2) return null;
  const pts = reg.map((p) => imageToSection(frame, p)).sort((a, b) => a[0] - b[0]);
  const xs = pts.map((q) => q[0]), zs = pts.map((q) => q[1]);
  const zLeft = zAlong(xs, zs, pins[0]), zRight = zAlong(xs, zs, pins[1]);
  // The mean over the pins: the regional's vertices between them, closed by its levels at the pins.
  const mx = [pins[0]], mz = [zLeft];
  for (let i = 0; i < xs.length; i++) if (xs[i] > pins[0] && xs[i] < pins[1]) { mx.push(xs[i]); mz.push(zs[i]); }
  mx.push(pins[1]); mz.push(zRight);
  const dipDeg = (Math.atan2(zLeft - zRight, pins[1] - pins[0]) * 180) / Math.PI;
  return { pins, zLeft, zRight, mean: meanElevation(mx, mz), dipDeg, straight: reg.length === 2 };
}
