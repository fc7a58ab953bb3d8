// Path data ("d") to polylines: M L H V C S Q T A Z, absolute and relative (SVG 1.1 §8.3).
// Curves are flattened into straight segments; elliptical arcs follow the SVG 1.1 implementation
// notes (appendix F.6, svgArc.ts). The two arc flags are single characters "0" or "1" (the path data
// grammar, §8.3.9), so "a10 10 0 1150 0" reads as flags 1, 1 and the point (50, 0).
import { arcToPoints } from './svgArc';

export type Pt = [number, number];

const ARGS: Record<string, number> = { m: 2, l: 2, h: 1, v: 1, c: 6, s: 4, q: 4, t: 2, a: 7, z: 0 };
const NUMBER = /[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/y;
const SEPARATORS = /[\s,]*/y;
const FLAG = /[01]/y;

/** A reader over path data: commands, numbers and flags, with whitespace and commas between them skipped. */
function pathReader(d: string) {
  let pos = 0;
  const skip = () => {
    SEPARATORS.lastIndex = pos;
    SEPARATORS.exec(d);
    pos = SEPARATORS.lastIndex;
  };
  const take = (re: RegExp): string | null => {
    skip();
    re.lastIndex = pos;
    const m = re.exec(d);
    if (!m) return null;
    pos = re.lastIndex;
    return m[0];
  };
  return {
    done: () => (skip(), pos >= d.length),
    command: (): string | null => {
      skip();
      const c = d[pos];
      if (c !== undefined && /[MmLlHhVvCcSsQqTtAaZz]/.test(c)) {
        pos += 1;
        return c;
      }
      return null;
    },
    number: (): number => {
      const t = take(NUMBER);
      return t === null ? NaN : Number(t);
    },
    flag: (): number => {
      const t = take(FLAG);
      return t === null ? NaN : Number(t);
    },
  };
}

function segmentsFor(p0: Pt, ...ctrl: Pt[]): number {
  let len = 0;
  let prev = p0;
  for (const p of ctrl) { len += Math.hypot(p[0] - prev[0], p[1] - prev[1]); prev = p; }
  // Even, so t = 1/2 is a vertex; 4–128 segments, about one per 4 units of control polygon.
  return 2 * Math.ceil(Math.max(4, Math.min(128, Math.ceil(len / 4))) / 2);
}

/** What pathDataToPolylines returns when the path would make more than the points allowed. */
export const TOO_MANY_POINTS = 'too-many-points';

/**
 * Returns the subpaths of the path data as polylines in the path's user units, null when the data is malformed,
 * or TOO_MANY_POINTS as soon as they would hold more than `maxPoints` vertices (stopped early: a path of
 * 300,000 arcs would otherwise make 150 million points before anything could refuse it).
 */
export function pathDataToPolylines(d: string, maxPoints = Infinity): Pt[][] | null | typeof TOO_MANY_POINTS {
  const read = pathReader(d);
  const lines: Pt[][] = [];
  let made = 0;
  let cur: Pt[] = [];
  let p: Pt = [0, 0];
  let start: Pt = [0, 0];
  let lastCtrl: Pt | null = null;
  let lastCmd = '';
  let cmd = '';
  while (!read.done()) {
    const next = read.command();
    if (next) cmd = next;
    else if (!cmd || cmd === 'z' || cmd === 'Z') return null;
    const lower = cmd.toLowerCase();
    const rel = cmd === lower;
    const n = ARGS[lower];
    const a: number[] = [];
    // Arguments 4 and 5 of an arc are its flags.
    for (let k = 0; k < n; k++) a.push(lower === 'a' && (k === 3 || k === 4) ? read.flag() : read.number());
    if (a.some((v) => !Number.isFinite(v))) return null;
    const abs = (x: number, y: number): Pt => (rel ? [p[0] + x, p[1] + y] : [x, y]);
    let ctrl: Pt | null = null;
    if (lower === 'm') {
      if (cur.length > 1) { lines.push(cur); made += cur.length; }
      p = abs(a[0], a[1]); start = p; cur = [p];
      cmd = rel ? 'l' : 'L';
    } else if (lower === 'z') {
      if (cur.length > 0 && (p[0] !== start[0] || p[1] !== start[1])) cur.push(start);
      if (cur.length > 1) { lines.push(cur); made += cur.length; }
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
      const e = abs(a[5], a[6]);
      for (const q of arcToPoints(p, a[0], a[1], a[2], a[3], a[4], e)) cur.push(q);
      p = e;
    }
    lastCtrl = ctrl;
    lastCmd = lower === 'm' ? 'M' : cmd;
    if (made + cur.length > maxPoints) return TOO_MANY_POINTS;
  }
  if (cur.length > 1) lines.push(cur);
  return lines;
}
