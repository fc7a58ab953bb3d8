// Synthetic scans with known truth for the tracing tests and benchmark: curves v = f(u) in a frame
// rotated by a small angle about the image centre, drawn as anti-aliased ink (pixel coverage from the
// exact distance to the curve, a box-filter approximation) or as the boundary between two colour fills,
// on a paper tone with seeded Gaussian noise. Distances to the curve are found by Newton's method on the
// foot of the perpendicular, so the truth is analytic.
import { seededRandom } from '../../../src/core/stats/seededRandom';

/** A curve v = f(u) with its first and second derivatives. */
export interface Curve { f: (u: number) => number; df: (u: number) => number; d2f: (u: number) => number }

export type Layer =
  | { kind: 'fill'; /** Colour below the curve (larger v). */ below: Curve; colour: [number, number, number] }
  | {
      kind: 'ink'; curve: Curve; widthPx: number; colour: [number, number, number];
      /** Frame u range the line is drawn over (ends cut square to the line); the whole width when absent. */
      spanU?: [number, number];
      /** Dashes: lengths drawn and left out, in frame u along the line, starting at the span's start (or u = 0). */
      dashU?: [number, number];
    };

export interface ScanSpec { w: number; h: number; paper: [number, number, number]; angleRad: number; noise: number; seed: number; layers: Layer[] }

export interface SyntheticScan { w: number; h: number; rgba: Uint8ClampedArray; spec: ScanSpec }

/** Returns the frame (u, v) of image point (x, y): rotated by −angle about the image centre. */
export function toFrame(spec: ScanSpec, x: number, y: number): [number, number] {
  const cx = spec.w / 2;
  const cy = spec.h / 2;
  const c = Math.cos(spec.angleRad);
  const s = Math.sin(spec.angleRad);
  const dx = x - cx;
  const dy = y - cy;
  return [cx + c * dx + s * dy, cy - s * dx + c * dy];
}

/** Returns the image point of frame point (u, v). */
export function fromFrame(spec: ScanSpec, u: number, v: number): [number, number] {
  const cx = spec.w / 2;
  const cy = spec.h / 2;
  const c = Math.cos(spec.angleRad);
  const s = Math.sin(spec.angleRad);
  const du = u - cx;
  const dv = v - cy;
  return [cx + c * du - s * dv, cy + s * du + c * dv];
}

/** Signed distance from frame point (u, v) to the curve: positive below it (larger v). */
export function signedDistance(curve: Curve, u: number, v: number): number {
  const t = footOnCurve(curve, u, v);
  const d = Math.hypot(t - u, curve.f(t) - v);
  return v >= curve.f(u) ? d : -d;
}

/** Returns the u of the foot of the perpendicular from frame point (u, v) to the curve (Newton's method). */
export function footOnCurve(curve: Curve, u: number, v: number): number {
  let t = u;
  for (let it = 0; it < 8; it++) {
    const e = curve.f(t) - v;
    const d1 = curve.df(t);
    const g = t - u + e * d1;
    const gp = 1 + d1 * d1 + e * curve.d2f(t);
    const step = g / (gp > 0.1 ? gp : 0.1);
    t -= step;
    if (Math.abs(step) < 1e-9) break;
  }
  return t;
}

/** Returns the distance (image px) from image point (x, y) to the curve drawn on the scan. */
export function distanceToCurve(spec: ScanSpec, curve: Curve, x: number, y: number): number {
  const [u, v] = toFrame(spec, x, y);
  return Math.abs(signedDistance(curve, u, v));
}

/** Renders the scan: paper, then each layer in order, then noise; opaque RGBA. */
export function renderScan(spec: ScanSpec): SyntheticScan {
  const { w, h } = spec;
  const rgba = new Uint8ClampedArray(w * h * 4);
  const rand = seededRandom(spec.seed);
  const px = [0, 0, 0];
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      const [u, v] = toFrame(spec, x + 0.5, y + 0.5);
      px[0] = spec.paper[0];
      px[1] = spec.paper[1];
      px[2] = spec.paper[2];
      for (const layer of spec.layers) {
        if (layer.kind === 'fill') {
          // Cheap rejection far from the boundary.
          const dv = v - layer.below.f(u);
          if (dv < -3) continue;
          const a = dv > 3 ? 1 : Math.min(1, Math.max(0, 0.5 + signedDistance(layer.below, u, v)));
          for (let c = 0; c < 3; c++) px[c] = px[c] * (1 - a) + layer.colour[c] * a;
        } else {
          const dv = Math.abs(v - layer.curve.f(u));
          if (dv > layer.widthPx * 3 + 3) continue;
          // Ends cut square to the line, as a pen or a renderer's dashes end: by the foot of the perpendicular.
          if ((layer.spanU || layer.dashU) && !inkDrawnAt(layer, footOnCurve(layer.curve, u, v))) continue;
          const d = Math.abs(signedDistance(layer.curve, u, v));
          const a = Math.min(1, Math.max(0, layer.widthPx / 2 + 0.5 - d));
          if (a <= 0) continue;
          for (let c = 0; c < 3; c++) px[c] = px[c] * (1 - a) + layer.colour[c] * a;
        }
      }
      const k = (y * w + x) * 4;
      for (let c = 0; c < 3; c++) rgba[k + c] = Math.round(px[c] + spec.noise * rand.normal());
      rgba[k + 3] = 255;
    }
  }
  return { w, h, rgba, spec };
}

/** Returns whether an ink layer is drawn at frame u: inside its span and on a dash. */
function inkDrawnAt(layer: { spanU?: [number, number]; dashU?: [number, number] }, u: number): boolean {
  const start = layer.spanU ? layer.spanU[0] : 0;
  if (layer.spanU && (u < layer.spanU[0] || u > layer.spanU[1])) return false;
  if (!layer.dashU) return true;
  const period = layer.dashU[0] + layer.dashU[1];
  const along = (((u - start) % period) + period) % period;
  return along < layer.dashU[0];
}

/** A sine curve v = base + amp · sin(2π u / wavelength + phase). */
export function sineCurve(base: number, amp: number, wavelength: number, phase = 0): Curve {
  const k = (2 * Math.PI) / wavelength;
  return {
    f: (u) => base + amp * Math.sin(k * u + phase),
    df: (u) => amp * k * Math.cos(k * u + phase),
    d2f: (u) => -amp * k * k * Math.sin(k * u + phase),
  };
}

/** A straight curve v = base + slope · u. */
export function straightCurve(base: number, slope: number): Curve {
  return { f: (u) => base + slope * u, df: () => slope, d2f: () => 0 };
}
