import type { ControlPoint } from '../model/projectDoc';

function solve3(m: number[][], r: number[]): [number, number, number] | null {
  // Cramer's rule on the 3 × 3 normal equations.
  const det = (q: number[][]) =>
    q[0][0] * (q[1][1] * q[2][2] - q[1][2] * q[2][1]) - q[0][1] * (q[1][0] * q[2][2] - q[1][2] * q[2][0]) + q[0][2] * (q[1][0] * q[2][1] - q[1][1] * q[2][0]);
  const d = det(m);
  if (!Number.isFinite(d) || Math.abs(d) < 1e-12 * Math.max(1, Math.abs(m[0][0] * m[1][1] * m[2][2]))) return null;
  const out: number[] = [];
  for (let c = 0; c < 3; c++) {
    const mc = m.map((row, i) => row.map((v, j) => (j === c ? r[i] : v)));
    out.push(det(mc) / d);
  }
  return [out[0], out[1], out[2]];
}

/** Returns least-squares affine coefficients x = a·[1,u,v], z = b·[1,u,v] (centred for accuracy), or null if degenerate. */
export function solveAffine(points: ControlPoint[]): { a: [number, number, number]; b: [number, number, number] } | null {
  const n = points.length;
  if (n < 3) return null;
  const um = points.reduce((s, p) => s + p.u, 0) / n;
  const vm = points.reduce((s, p) => s + p.v, 0) / n;
  const m = [[n, 0, 0], [0, 0, 0], [0, 0, 0]];
  const rx = [0, 0, 0];
  const rz = [0, 0, 0];
  for (const p of points) {
    const row = [1, p.u - um, p.v - vm];
    for (let i = 1; i < 3; i++) for (let j = 1; j < 3; j++) m[i][j] += row[i] * row[j];
    for (let i = 0; i < 3; i++) {
      rx[i] += row[i] * p.x;
      rz[i] += row[i] * p.z;
    }
  }
  const ca = solve3(m, rx);
  const cb = solve3(m, rz);
  if (!ca || !cb) return null;
  // Undo the centring: x = c0 + c1 (u − um) + c2 (v − vm).
  const a: [number, number, number] = [ca[0] - ca[1] * um - ca[2] * vm, ca[1], ca[2]];
  const b: [number, number, number] = [cb[0] - cb[1] * um - cb[2] * vm, cb[1], cb[2]];
  return { a, b };
}
