// Elliptical arcs of SVG path data ("A"/"a") as polyline vertices, by the SVG 1.1 implementation notes,
// appendix F.6: out-of-range parameters (F.6.2), the endpoint-to-centre conversion (F.6.5) and the
// scaling of radii too small to reach the end point (F.6.6); points from the centre parameterisation (F.6.3).

export type ArcPt = [number, number];

/** Largest angle one flattened step may span: the chord then stays within 1 − cos(1.25°) ≈ 2.4e-4 radius of the arc. */
const MAX_STEP_RAD = Math.PI / 72;
/** About one step per this many user units of arc, as the path's Bézier curves are flattened. */
const UNITS_PER_STEP = 4;
const MAX_STEPS = 512;

/** Returns the angle from u to v in radians, in (−π, π] (F.6.5.4). */
function angleBetween(ux: number, uy: number, vx: number, vy: number): number {
  return Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
}

/**
 * Returns the vertices after `p0` of the arc from `p0` to `p1` (the last one is exactly `p1`), in user units:
 * radii `rx`, `ry`, x-axis rotation `rotationDeg`, flags `largeArc` and `sweep` (any non-zero value is 1).
 * Identical end points give no vertex (the arc is omitted); a zero radius gives the straight segment to `p1`.
 */
export function arcToPoints(p0: ArcPt, rxIn: number, ryIn: number, rotationDeg: number, largeArc: number, sweep: number, p1: ArcPt): ArcPt[] {
  const [x1, y1] = p0;
  const [x2, y2] = p1;
  // F.6.2: identical end points omit the arc; a zero radius is a straight line; radii are taken as absolute values.
  if (x1 === x2 && y1 === y2) return [];
  let rx = Math.abs(rxIn);
  let ry = Math.abs(ryIn);
  if (rx === 0 || ry === 0) return [[x2, y2]];
  const fA = largeArc !== 0;
  const fS = sweep !== 0;
  const phi = ((rotationDeg % 360) * Math.PI) / 180;
  const cosPhi = Math.cos(phi);
  const sinPhi = Math.sin(phi);
  // F.6.5.1: the start point in the frame centred on the chord's midpoint, rotated by −φ.
  const dx = (x1 - x2) / 2;
  const dy = (y1 - y2) / 2;
  const x1p = cosPhi * dx + sinPhi * dy;
  const y1p = -sinPhi * dx + cosPhi * dy;
  // F.6.6: radii too small to span the end points are scaled up uniformly until they just do (Λ = 1).
  const lambda = (x1p * x1p) / (rx * rx) + (y1p * y1p) / (ry * ry);
  if (lambda > 1) {
    const k = Math.sqrt(lambda);
    rx *= k;
    ry *= k;
  }
  // F.6.5.2: the centre in that frame; the sign picks one of the two ellipses (+ when fA ≠ fS).
  const rx2 = rx * rx;
  const ry2 = ry * ry;
  const num = rx2 * ry2 - rx2 * y1p * y1p - ry2 * x1p * x1p;
  const den = rx2 * y1p * y1p + ry2 * x1p * x1p;
  // After F.6.6 the numerator is ≥ 0 up to rounding; clamp so that Λ = 1 gives the chord's midpoint.
  const coef = (fA !== fS ? 1 : -1) * Math.sqrt(Math.max(0, num) / den);
  const cxp = (coef * rx * y1p) / ry;
  const cyp = (-coef * ry * x1p) / rx;
  // F.6.5.3: back to user space.
  const cx = cosPhi * cxp - sinPhi * cyp + (x1 + x2) / 2;
  const cy = sinPhi * cxp + cosPhi * cyp + (y1 + y2) / 2;
  // F.6.5.5–6: start angle θ1 and sweep Δθ, negative when fS = 0, positive when fS = 1.
  const ux = (x1p - cxp) / rx;
  const uy = (y1p - cyp) / ry;
  const vx = (-x1p - cxp) / rx;
  const vy = (-y1p - cyp) / ry;
  const theta1 = angleBetween(1, 0, ux, uy);
  let dTheta = angleBetween(ux, uy, vx, vy);
  if (!fS && dTheta > 0) dTheta -= 2 * Math.PI;
  else if (fS && dTheta < 0) dTheta += 2 * Math.PI;
  // Steps of equal angle: fine enough in angle (MAX_STEP_RAD) and in length (UNITS_PER_STEP, on the larger radius).
  const byAngle = Math.ceil(Math.abs(dTheta) / MAX_STEP_RAD);
  const byLength = Math.ceil((Math.abs(dTheta) * Math.max(rx, ry)) / UNITS_PER_STEP);
  const steps = Math.max(1, Math.min(MAX_STEPS, Math.max(byAngle, byLength)));
  const out: ArcPt[] = [];
  for (let k = 1; k < steps; k++) {
    // F.6.3: a point of the ellipse at parameter θ.
    const t = theta1 + (dTheta * k) / steps;
    const ex = rx * Math.cos(t);
    const ey = ry * Math.sin(t);
    out.push([cx + cosPhi * ex - sinPhi * ey, cy + sinPhi * ex + cosPhi * ey]);
  }
  out.push([x2, y2]);
  return out;
}
