// Path data ("d") to polylines: M L H V C S Q T A Z, absolute and relative (SVG 1.1 §8.3).
// Curves are flattened into straight segments; an arc is replaced by its chord plus midpoint
// samples on the straight line (drafting exports of horizons rarely use arcs).

export type Pt = [number, number];

const ARGS: Record<string, number> = { m: 2, l: 2, h: 1, v: 1, c: 6, s: 4, q: 4, t: 2, a: 7, z: 0 };

function tokenize(d: string): (string | number)[] | null {
  const out: (string | number)[] = [];
  const re = /([MmLlHhVvCcSsQqTtAaZz])|([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)|([\s,]+)|(.)/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(d)) !== null) {
    if (m[1]) out.push(m[1]);
    else if (m[2]) out.push(Number(m[2]));
    else if (m[4]) return null;
  }
  return out;
}

function segmentsFor(p0: Pt, ...ctrl: Pt[]): number {
  let len = 0;
  let prev = p0;
  for (const p of ctrl) { len += Math.hypot(p[0] - prev[0], p[1] - prev[1]); prev = p; }
  // Even, so t = 1/2 is a vertex; 4–128 segments, about one per 4 units of control polygon.
  return 2 * Math.ceil(Math.max(4, Math.min(128, Math.ceil(len / 4))) / 2);
}

/** Returns the subpaths of the path data as polylines in the path's user units, or null when the data is malformed. */
export function pathDataToPolylines(d: string): Pt[][] | null {
  const tokens = tokenize(d);
  if (!tokens) return null;
  const lines: Pt[][] = [];
  let cur: Pt[] = [];
  let p: Pt = [0, 0];
  let start: Pt = [0, 0];
  let lastCtrl: Pt | null = null;
  let lastCmd = '';
  let i = 0;
  let cmd = '';
  const num = () => { const v = tokens[i++]; return typeof v === 'number' && Number.isFinite(v) ? v : NaN; };
  while (i < tokens.length) {
    if (typeof tokens[i] === 'string') cmd = tokens[i++] as string;
    else if (!cmd || cmd === 'z' || cmd === 'Z') return null;
    const lower = cmd.toLowerCase();
    const rel = cmd === lower;
    const n = ARGS[lower];
    const a: number[] = [];
    for (let k = 0; k < n; k++) a.push(num());
    if (a.some(Number.isNaN)) return null;
    const abs = (x: number, y: number): Pt => (rel ? [p[0] + x, p[1] + y] : [x, y]);
    let ctrl: Pt | null = null;
    if (lower === 'm') {
      if (cur.length > 1) lines.push(cur);
      p = abs(a[0], a[1]); start = p; cur = [p];
      cmd = rel ? 'l' : 'L';
    } else if (lower === 'z') {
      if (cur.length > 0 && (p[0] !== start[0] || p[1] !== start[1])) cur.push(start);
      if (cur.length > 1) lines.push(cur);
      p = start; cur = [p];
    } else if (lower === 'l') {
      p = abs(a[0], a[1]); cur.push(p);
    } else if (lower === 'h') {
      p = [rel ? p[0] + a[0] : a[0], p[1]]; cur.push(p);
    } else if (lower === 'v') {
      p = [p[0], rel ? p[1] + a[0] : a[0]]; cur.push(p);
    } else if (lower === 'c' || lower === 's') {
      const reflect: Pt = lastCtrl && 'cCsS'.includes(lastCmd) ? [2 * p[0] - lastCtrl[0], 2 * p[1] - lastCtrl[1]] : p;
      const c1 = lower === 'c' ? abs(a[0], a[1]) : reflect;
      const c2 = lower === 'c' ? abs(a[2], a[3]) : abs(a[0], a[1]);
      const e = lower === 'c' ? abs(a[4], a[5]) : abs(a[2], a[3]);
      const segs = segmentsFor(p, c1, c2, e);
      for (let k = 1; k <= segs; k++) {
        const t = k / segs, u = 1 - t;
        cur.push([u * u * u * p[0] + 3 * u * u * t * c1[0] + 3 * u * t * t * c2[0] + t * t * t * e[0], u * u * u * p[1] + 3 * u * u * t * c1[1] + 3 * u * t * t * c2[1] + t * t * t * e[1]]);
      }
      ctrl = c2; p = e;
    } else if (lower === 'q' || lower === 't') {
      const c: Pt = lower === 'q' ? abs(a[0], a[1]) : lastCtrl && 'qQtT'.includes(lastCmd) ? [2 * p[0] - lastCtrl[0], 2 * p[1] - lastCtrl[1]] : p;
      const e = lower === 'q' ? abs(a[2], a[3]) : abs(a[0], a[1]);
      const segs = segmentsFor(p, c, e);
      for (let k = 1; k <= segs; k++) {
        const t = k / segs, u = 1 - t;
        cur.push([u * u * p[0] + 2 * u * t * c[0] + t * t * e[0], u * u * p[1] + 2 * u * t * c[1] + t * t * e[1]]);
      }
      ctrl = c; p = e;
    } else if (lower === 'a') {
      p = abs(a[5], a[6]); cur.push(p);
    }
    lastCtrl = ctrl;
    lastCmd = lower === 'm' ? 'M' : cmd;
  }
  if (cur.length > 1) lines.push(cur);
  return lines;
}
