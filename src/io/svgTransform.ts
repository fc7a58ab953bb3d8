// The SVG "transform" attribute as a 2×3 matrix [a, b, c, d, e, f] (SVG 1.1 §7.6):
// x' = a x + c y + e, y' = b x + d y + f.

export type Matrix = [number, number, number, number, number, number];

export const IDENTITY: Matrix = [1, 0, 0, 1, 0, 0];

/** Returns m · n (n applied first). */
export function multiply(m: Matrix, n: Matrix): Matrix {
  return [
    m[0] * n[0] + m[2] * n[1], m[1] * n[0] + m[3] * n[1],
    m[0] * n[2] + m[2] * n[3], m[1] * n[2] + m[3] * n[3],
    m[0] * n[4] + m[2] * n[5] + m[4], m[1] * n[4] + m[3] * n[5] + m[5],
  ];
}

/** Returns the point transformed by the matrix. */
export function applyMatrix(m: Matrix, p: [number, number]): [number, number] {
  return [m[0] * p[0] + m[2] * p[1] + m[4], m[1] * p[0] + m[3] * p[1] + m[5]];
}

/** Returns the matrix of a transform list, identity for an empty one, or null when it is malformed. */
export function parseTransform(text: string | undefined): Matrix | null {
  if (!text || text.trim() === '') return IDENTITY;
  let m: Matrix = IDENTITY;
  const re = /\s*(matrix|translate|scale|rotate|skewX|skewY)\s*\(([^)]*)\)\s*,?/gy;
  let pos = 0;
  let hit: RegExpExecArray | null;
  while ((hit = re.exec(text)) !== null) {
    pos = re.lastIndex;
    const v = hit[2].trim().split(/[\s,]+/).filter(Boolean).map(Number);
    if (v.some((x) => !Number.isFinite(x))) return null;
    let t: Matrix;
    const rad = (deg: number) => (deg * Math.PI) / 180;
    switch (hit[1]) {
      case 'matrix': if (v.length !== 6) return null; t = v as Matrix; break;
      case 'translate': t = [1, 0, 0, 1, v[0] ?? 0, v[1] ?? 0]; break;
      case 'scale': t = [v[0] ?? 1, 0, 0, v[1] ?? v[0] ?? 1, 0, 0]; break;
      case 'rotate': {
        const c = Math.cos(rad(v[0] ?? 0)), s = Math.sin(rad(v[0] ?? 0));
        const [cx, cy] = [v[1] ?? 0, v[2] ?? 0];
        t = multiply(multiply([1, 0, 0, 1, cx, cy], [c, s, -s, c, 0, 0]), [1, 0, 0, 1, -cx, -cy]);
        break;
      }
      case 'skewX': t = [1, 0, Math.tan(rad(v[0] ?? 0)), 1, 0, 0]; break;
      default: t = [1, Math.tan(rad(v[0] ?? 0)), 0, 1, 0, 0];
    }
    m = multiply(m, t);
  }
  return text.slice(pos).trim() === '' ? m : null;
}
