// Tracing benchmark (a script, not a test): on a generated scan with known truth — 3200 × 1500 px, rotated
// 0.01 rad, paper tone, noise, four anti-aliased ink horizons and two boundaries between colour fills drawn
// without ink, all built so that each horizon's excess area is D × its height above a chosen detachment —
// traces every horizon across 3,000 px with the fewest evenly spaced clicks that follow it, and prints the
// clicks per horizon, the RMS distance of the traced vertices from the true line (scan px), and the
// detachment depth the Epard & Groshong fit recovers from the traced lines against the true one. Then the
// preview latency of a 3,000 px stretch (first computation of its tiles and tree, then each later pointer
// position) and the memory tracing holds; last, the demo section's six horizons traced the same way against
// the exact lines its scan was drawn from (the forward model's, not section.json, whose vertices carry the
// demo's hand-digitising jitter), and again as a user with the live preview clicks: where the preview would leave
// the line, the whole traced line (not only its vertices) within 1.5 px. Run alone (npm run bench:trace; `-- --demo` for the demo part only) or from bench:ui.
import { readFileSync } from 'node:fs';
import { PNG } from 'pngjs';
import { analyseSection } from '../src/core/analysis/analyseSection';
import type { Section } from '../src/core/model/section';
import { snapToLine } from '../src/core/trace/snapToLine';
import { TraceSession } from '../src/core/trace/traceSession';
import { tilesOver, traceWindow, TRACE_TILE_PX } from '../src/core/trace/traceWindow';
import { pixelFeatures } from '../src/core/trace/pixelFeatures';
import { forwardSection } from '../src/core/forward/forwardSection';
import { demoSpec } from './demo/demoSpec';
import { distanceToCurve, fromFrame, renderScan, straightCurve, toFrame, type Curve, type ScanSpec } from '../tests/core/trace/syntheticScan';

const W = 3200;
const H = 1500;
/** Pins and the fold between them (frame px); the horizons run from U0 to U1 (3,000 px). */
const PIN_L = 300;
const PIN_R = 2900;
const U0 = 100;
const U1 = 3100;
/** Displacement D and detachment level (frame px, v down): excess area = D × (V_DET − v_regional). */
const D = 60;
const V_DET = 1450;

/** A horizon whose regional lies at v = level, uplifted by a sin² bump between the pins sized to its target area. */
function foldedCurve(level: number): Curve {
  const w = PIN_R - PIN_L;
  // ∫ sin²(π t / w) dt over the pins = w / 2, so an uplift a gives area a·w/2 = D·h.
  const a = (2 * D * (V_DET - level)) / w;
  const k = Math.PI / w;
  const inside = (u: number) => u > PIN_L && u < PIN_R;
  return {
    f: (u) => (inside(u) ? level - a * Math.sin(k * (u - PIN_L)) ** 2 : level),
    df: (u) => (inside(u) ? -a * k * Math.sin(2 * k * (u - PIN_L)) : 0),
    d2f: (u) => (inside(u) ? -2 * a * k * k * Math.cos(2 * k * (u - PIN_L)) : 0),
  };
}

const INK_LEVELS = [300, 480, 660, 840];
const FILL_LEVELS = [1040, 1220];
const ink = INK_LEVELS.map(foldedCurve);
const fills = FILL_LEVELS.map(foldedCurve);
const SPEC: ScanSpec = {
  w: W, h: H, paper: [240, 233, 216], angleRad: 0.01, noise: 6, seed: 2026,
  layers: [
    { kind: 'fill', below: straightCurve(960, 0), colour: [226, 206, 150] },
    { kind: 'fill', below: fills[0], colour: [168, 192, 214] },
    { kind: 'fill', below: fills[1], colour: [200, 170, 196] },
    ...ink.map((curve) => ({ kind: 'ink' as const, curve, widthPx: 2.5, colour: [32, 30, 28] as [number, number, number] })),
  ],
};

function ms(t0: number): number {
  return performance.now() - t0;
}

interface Traced { clicks: number; rms: number; max: number; points: [number, number][] }

/** Traces one horizon through n evenly spaced clicks, each 2 px off the line (alternating sides), as the app does. */
function traceHorizon(scan: ReturnType<typeof renderScan>, curve: Curve, n: number): Traced {
  const session = new TraceSession();
  const anchors: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    const u = U0 + ((U1 - U0) * i) / (n - 1);
    const raw = fromFrame(SPEC, u, curve.f(u) + (i % 2 ? 2 : -2));
    // Snap as the app does: features of a small window around the click (radius 7 screen px at 50 %: 14 px).
    const r = 14;
    const x0 = Math.max(0, Math.floor(raw[0] - r - 3));
    const y0 = Math.max(0, Math.floor(raw[1] - r - 3));
    const x1 = Math.min(W, Math.ceil(raw[0] + r + 3));
    const y1 = Math.min(H, Math.ceil(raw[1] + r + 3));
    const f = pixelFeatures(scan.rgba, W, H, 0, 0, { x0, y0, w: x1 - x0, h: y1 - y0 });
    anchors.push(snapToLine(f, raw[0], raw[1], r) ?? raw);
  }
  const whole = { x0: 0, y0: 0, w: W, h: H };
  const points: [number, number][] = [anchors[0]];
  for (let i = 1; i < n; i++) {
    const win = traceWindow(anchors[i - 1], anchors[i], W, H);
    const tiles = tilesOver(win, W, H);
    for (const t of tiles) session.putTile(t.key, t, scan.rgba, whole);
    session.buildTree(i, anchors[i - 1], win, tiles.map((t) => t.key));
    const stretch = session.path(i, anchors[i]) ?? [anchors[i - 1], anchors[i]];
    for (let k = 1; k < stretch.length; k++) points.push(stretch[k]);
  }
  let s = 0;
  let max = 0;
  for (const p of points) {
    const d = distanceToCurve(SPEC, curve, p[0], p[1]);
    s += d * d;
    if (d > max) max = d;
  }
  return { clicks: n, rms: Math.sqrt(s / points.length), max, points };
}

/** The section of a set of lines given in image px: back to the unrotated frame, x = u, z = −v (1 px = 1 m). */
function sectionOf(lines: [number, number][][], levels: number[], image: boolean): Section {
  return {
    units: 'm',
    pins: [PIN_L, PIN_R],
    horizons: lines.map((pts, i) => ({
      name: `H${i + 1}`,
      line: pts.map((p) => {
        const [u, v] = image ? toFrame(SPEC, p[0], p[1]) : p;
        return [u, -v] as [number, number];
      }),
      regional: [[U0, -levels[i]], [U1, -levels[i]]],
    })),
  };
}

function depthOf(section: Section): number {
  const out = analyseSection(section);
  if (!out.ok || !out.analysis.areaDepth?.detachmentDepth) throw new Error('no detachment');
  return out.analysis.areaDepth.detachmentDepth;
}

function main(): void {
  let t0 = performance.now();
  const scan = renderScan(SPEC);
  console.log(`Synthetic scan ${W} × ${H} px (rotated ${SPEC.angleRad} rad, noise σ ${SPEC.noise}) rendered in ${(ms(t0) / 1000).toFixed(1)} s`);
  console.log('\nHorizon          kind      clicks  RMS (px)  max (px)  vertices   (fewest clicks with RMS within target and max ≤ 1.5 px)');
  const curves = [...ink, ...fills];
  const levels = [...INK_LEVELS, ...FILL_LEVELS];
  const traced: [number, number][][] = [];
  for (const [i, curve] of curves.entries()) {
    const isInk = i < ink.length;
    const target = isInk ? 0.5 : 1;
    let best: Traced | null = null;
    for (let n = 2; n <= 12; n++) {
      const t = traceHorizon(scan, curve, n);
      best = t;
      if (t.rms <= target && t.max <= 1.5) break;
    }
    traced.push(best!.points);
    console.log(`${`H${i + 1} at v ${levels[i]}`.padEnd(17)}${(isInk ? 'ink' : 'boundary').padEnd(10)}${String(best!.clicks).padStart(6)}  ${best!.rms.toFixed(3).padStart(8)}  ${best!.max.toFixed(3).padStart(8)}  ${String(best!.points.length).padStart(8)}`);
  }
  // The true lines, sampled every pixel in the frame.
  const truthLines = curves.map((c) => {
    const pts: [number, number][] = [];
    for (let u = U0; u <= U1; u++) pts.push([u, c.f(u)]);
    return pts;
  });
  const trueDepth = depthOf(sectionOf(truthLines, levels, false));
  const tracedDepth = depthOf(sectionOf(traced, levels, true));
  console.log(`\nDetachment depth (Epard & Groshong fit): true lines ${trueDepth.toFixed(2)} m (built for ${V_DET - INK_LEVELS[0]} m below the highest regional), traced ${tracedDepth.toFixed(2)} m: ${(((tracedDepth - trueDepth) / trueDepth) * 100).toFixed(3)} % (target within 0.2 %)`);

  // Preview latency of a 3,000 px stretch along the top horizon.
  const curve = ink[0];
  const from = fromFrame(SPEC, U0, curve.f(U0));
  const to = fromFrame(SPEC, U1, curve.f(U1));
  const session = new TraceSession();
  const win = traceWindow(from, to, W, H);
  const tiles = tilesOver(win, W, H);
  const whole = { x0: 0, y0: 0, w: W, h: H };
  t0 = performance.now();
  for (const t of tiles) session.putTile(t.key, t, scan.rgba, whole);
  const tileMs = ms(t0);
  t0 = performance.now();
  session.buildTree(1, from, win, tiles.map((t) => t.key));
  const treeMs = ms(t0);
  const moves: number[] = [];
  for (let k = 0; k < 60; k++) {
    const u = U1 - 40 + k * 0.7;
    t0 = performance.now();
    session.path(1, fromFrame(SPEC, u, curve.f(u)));
    moves.push(ms(t0));
  }
  const firstMove = moves[0];
  const later = moves.slice(1).sort((a, b) => a - b);
  console.log(`\nPreview of a 3,000 px stretch: window ${win.w} × ${win.h} px, ${tiles.length} tiles of ${TRACE_TILE_PX} px`);
  console.log(`  first computation: tile features ${tileMs.toFixed(0)} ms + path tree ${treeMs.toFixed(0)} ms (in the worker; the page shows the last ready path meanwhile)`);
  console.log(`  first pointer position on the new tree (centres the whole path): ${firstMove.toFixed(1)} ms`);
  console.log(`  each later pointer position: median ${later[later.length >> 1].toFixed(2)} ms, largest ${later[later.length - 1].toFixed(2)} ms of ${later.length} (target: within a 16.7 ms frame)`);
  const perTile = 256 * 256 * 8;
  console.log(`\nMemory held by tracing: ${(session.bytesHeld() / 1e6).toFixed(1)} MB for this stretch (tiles and one tree).`);
  console.log(`  On any scan, 200 MP included, it is bounded by the kept tiles (96 × ${(perTile / 1e6).toFixed(2)} MB = ${((96 * perTile) / 1e6).toFixed(0)} MB) and four trees of their windows; the scan's own pixels are not copied (an 800 MB RGBA bitmap at 200 MP is read tile by tile).`);
}

/** Index of the point of pts nearest to p. */
function nearestIndex(pts: [number, number][], p: [number, number]): number {
  let best = 0;
  for (let i = 1; i < pts.length; i++) if (Math.hypot(pts[i][0] - p[0], pts[i][1] - p[1]) < Math.hypot(pts[best][0] - p[0], pts[best][1] - p[1])) best = i;
  return best;
}

/** Distance from p to the polyline pts. */
function distanceToPolyline(pts: [number, number][], p: [number, number]): number {
  let best = Infinity;
  for (let i = 0; i + 1 < pts.length; i++) {
    const [ax, ay] = pts[i];
    const dx = pts[i + 1][0] - ax;
    const dy = pts[i + 1][1] - ay;
    const L2 = dx * dx + dy * dy;
    const t = L2 > 0 ? Math.max(0, Math.min(1, ((p[0] - ax) * dx + (p[1] - ay) * dy) / L2)) : 0;
    const d = Math.hypot(p[0] - ax - t * dx, p[1] - ay - t * dy);
    if (d < best) best = d;
  }
  return best;
}

/** Returns a click moved onto the line centre as the app moves it (features of a small window around it, radius 14 px), or the click itself where no line is found. */
function snapClick(rgba: ArrayLike<number>, w: number, h: number, raw: [number, number]): [number, number] {
  const r = 14;
  const x0 = Math.max(0, Math.floor(raw[0] - r - 3));
  const y0 = Math.max(0, Math.floor(raw[1] - r - 3));
  const x1 = Math.min(w, Math.ceil(raw[0] + r + 3));
  const y1 = Math.min(h, Math.ceil(raw[1] + r + 3));
  const f = pixelFeatures(rgba, w, h, 0, 0, { x0, y0, w: x1 - x0, h: y1 - y0 });
  return snapToLine(f, raw[0], raw[1], r) ?? raw;
}

/** The demo section: each horizon traced with the fewest evenly spaced clicks on its drawn line. */
function demo(): void {
  const png = PNG.sync.read(readFileSync('public/demo/section.png'));
  const cal = JSON.parse(readFileSync('public/demo/calibration.json', 'utf8'));
  // The truth is the forward model's lines the scan was drawn from; section.json is them digitised by hand, each
  // vertex off the ink by 0.7 px of seeded jitter and joined by chords, so it is no yardstick for sub-pixel tracing.
  const section = forwardSection(demoSpec).section as Section;
  const handDigitised = JSON.parse(readFileSync('public/demo/section.json', 'utf8')) as Section;
  const toImage = (x: number, z: number): [number, number] => [cal.sectionToImage.u[0] * x + cal.sectionToImage.u[1] * z + cal.sectionToImage.u[2], cal.sectionToImage.v[0] * x + cal.sectionToImage.v[1] * z + cal.sectionToImage.v[2]];
  const toSection = (u: number, v: number): [number, number] => [cal.imageToSection.x[0] * u + cal.imageToSection.x[1] * v + cal.imageToSection.x[2], cal.imageToSection.z[0] * u + cal.imageToSection.z[1] * v + cal.imageToSection.z[2]];
  const w = png.width;
  const h = png.height;
  const rgba = png.data;
  const whole = { x0: 0, y0: 0, w, h };
  console.log(`\nThe demo section (public/demo, ${w} × ${h} px): each horizon with the fewest evenly spaced clicks (plus one at each outcrop of an eroded horizon), each 2 px below the line and snapped, whose trace stays within 1.5 px of the drawn line (max: away from the ends; at ends: within 4 px of the line's first and last point)`);
  console.log('Horizon                    clicks  RMS (px)  max (px)  at ends (px)  vertices');
  const traced: Section['horizons'] = [];
  for (const hz of section.horizons) {
    // The fold demo's horizons are unbroken lines; a horizon in pieces would be traced piece by piece.
    if (!hz.line) throw new Error(`benchTrace: horizon "${hz.name}" is in pieces; this measure expects unbroken lines`);
    const truth = hz.line.map(([x, z]) => toImage(x, z));
    const digitised = handDigitised.horizons.find((k) => k.name === hz.name);
    const outcrops = (digitised?.projected ?? []).flatMap((run) => run.map((i) => nearestIndex(truth, toImage(digitised!.line![i][0], digitised!.line![i][1]))));
    let pick: { clicks: number; rms: number; max: number; endMax: number; worst: [number, number]; pts: [number, number][] } | null = null;
    for (let n = 2; n <= 16; n++) {
      const session = new TraceSession();
      // Evenly spaced clicks, and one at each outcrop of an eroded horizon (where the demo's digitised line
      // starts and ends its projected runs), as a geologist clicks where the solid line meets the land surface.
      const at = new Set<number>();
      for (let i = 0; i < n; i++) at.add(Math.round(((truth.length - 1) * i) / (n - 1)));
      for (const i of outcrops) at.add(i);
      // Each click 2 px below the line, snapped as the app snaps it (radius 14 px: 7 screen px at 50 %).
      const anchors = [...at].sort((a, b) => a - b).map((i) => snapClick(rgba, w, h, [truth[i][0], truth[i][1] + 2]));
      const pts: [number, number][] = [anchors[0]];
      for (let i = 1; i < anchors.length; i++) {
        const win = traceWindow(anchors[i - 1], anchors[i], w, h);
        const tiles = tilesOver(win, w, h);
        for (const t of tiles) session.putTile(t.key, t, rgba, whole);
        const stretch = session.traceOnce(anchors[i - 1], anchors[i], win, tiles.map((t) => t.key));
        for (let k = 1; k < stretch.length; k++) pts.push(stretch[k]);
      }
      // The ends are measured apart: the demo's horizons end on the frame's border line, where the end click
      // snaps into the junction of the two inks (crossing lines), which says nothing of how the trace follows.
      const [first, last] = [truth[0], truth[truth.length - 1]];
      const nearEnd = (p: [number, number]) => Math.min(Math.hypot(p[0] - first[0], p[1] - first[1]), Math.hypot(p[0] - last[0], p[1] - last[1])) < 4;
      let s = 0;
      let max = 0;
      let endMax = 0;
      let worst: [number, number] = pts[0];
      for (const p of pts) {
        const d = distanceToPolyline(truth, p);
        s += d * d;
        if (nearEnd(p)) endMax = Math.max(endMax, d);
        else if (d > max) [max, worst] = [d, p];
      }
      pick = { clicks: anchors.length, rms: Math.sqrt(s / pts.length), max, endMax, worst, pts };
      if (max <= 1.5) break;
    }
    traced.push({ ...hz, line: pick!.pts.map(([u, v]) => toSection(u, v)) });
    const note = pick!.max <= 1.5 ? '' : `  (still beyond 1.5 px with 16 evenly spaced clicks, worst at u ${pick!.worst[0].toFixed(0)}, v ${pick!.worst[1].toFixed(0)})`;
    console.log(`${hz.name.padEnd(27)}${String(pick!.clicks).padStart(6)}  ${pick!.rms.toFixed(3).padStart(8)}  ${pick!.max.toFixed(3).padStart(8)}  ${pick!.endMax.toFixed(3).padStart(12)}  ${String(pick!.pts.length).padStart(8)}${note}`);
  }
  const truthDepth = depthOf(section);
  const tracedDepth = depthOf({ ...section, horizons: traced });
  console.log(`Detachment depth: from the demo's own lines ${truthDepth.toFixed(1)} m, from the traced lines ${tracedDepth.toFixed(1)} m (${(((tracedDepth - truthDepth) / truthDepth) * 100).toFixed(3)} %)`);

  // The way a geologist works with the live preview: from each anchor the pointer goes on along the line, and the
  // next click is placed at the farthest point (in steps of FOLLOW_STEP_PX along the line) up to which the stretch
  // still stays within 1.5 px of the drawn line, measured along the traced line itself (its straight runs between
  // vertices too), not only at its vertices. The pointer goes on a little past a place where the preview leaves the
  // line (FOLLOW_PAST steps), as a user does to see whether it comes back. An eroded horizon is traced again with a
  // click at each outcrop as well.
  console.log(`\nThe demo again, each click where the preview would leave the line (steps of ${FOLLOW_STEP_PX} px along it; the whole traced line within 1.5 px, every 1 px along it, ends as above)`);
  console.log('Horizon                    clicks  RMS (px)  max along the line (px)  vertices  clicks placed');
  const followed: Section['horizons'] = [];
  for (const hz of section.horizons) {
    const truth = hz.line!.map(([x, z]) => toImage(x, z));
    const digitised = handDigitised.horizons.find((k) => k.name === hz.name);
    const outcrops = (digitised?.projected ?? []).flatMap((run) => run.map((i) => nearestIndex(truth, toImage(digitised!.line![i][0], digitised!.line![i][1]))));
    const r = followPreview(rgba, w, h, truth, []);
    followed.push({ ...hz, line: r.pts.map(([u, v]) => toSection(u, v)) });
    console.log(`${hz.name.padEnd(27)}${String(r.clicks).padStart(6)}  ${r.rms.toFixed(3).padStart(8)}  ${r.max.toFixed(3).padStart(23)}  ${String(r.pts.length).padStart(8)}  at u ${r.placed.map((p) => p[0].toFixed(0)).join(', ')}`);
    if (outcrops.length === 0) continue;
    // An eroded horizon again, with a click at each outcrop as well (where its projected run starts and ends).
    const o = followPreview(rgba, w, h, truth, outcrops);
    console.log(`${'  and a click at each outcrop'.padEnd(27)}${String(o.clicks).padStart(6)}  ${o.rms.toFixed(3).padStart(8)}  ${o.max.toFixed(3).padStart(23)}  ${String(o.pts.length).padStart(8)}  at u ${o.placed.map((p) => p[0].toFixed(0)).join(', ')}`);
  }
  const followedDepth = depthOf({ ...section, horizons: followed });
  console.log(`Detachment depth from these lines: ${followedDepth.toFixed(1)} m (${(((followedDepth - truthDepth) / truthDepth) * 100).toFixed(3)} %)`);
}

/** Step along the line between the pointer positions tried, in image px. */
const FOLLOW_STEP_PX = 100;
/** Steps the pointer goes on past a position where the preview leaves the line. */
const FOLLOW_PAST = 2;

/** Largest distance (image px) from the truth of the traced line `pts`, every 1 px along it, leaving out points where `skip` holds. */
function lineMax(pts: [number, number][], truth: [number, number][], skip: (p: [number, number]) => boolean): number {
  let max = 0;
  for (let i = 0; i + 1 < pts.length; i++) {
    const [a, b] = [pts[i], pts[i + 1]];
    const steps = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1])));
    for (let k = 0; k <= steps; k++) {
      const p: [number, number] = [a[0] + ((b[0] - a[0]) * k) / steps, a[1] + ((b[1] - a[1]) * k) / steps];
      if (!skip(p)) max = Math.max(max, distanceToPolyline(truth, p));
    }
  }
  return max;
}

/** Traces a demo horizon clicking where the preview would leave the line (see demo()); returns the clicks, the vertices' RMS and the line's largest distance. */
function followPreview(rgba: ArrayLike<number>, w: number, h: number, truth: [number, number][], outcrops: number[]): { clicks: number; rms: number; max: number; pts: [number, number][]; placed: [number, number][] } {
  const session = new TraceSession();
  const whole = { x0: 0, y0: 0, w, h };
  const [first, last] = [truth[0], truth[truth.length - 1]];
  const nearEnd = (p: [number, number]) => Math.min(Math.hypot(p[0] - first[0], p[1] - first[1]), Math.hypot(p[0] - last[0], p[1] - last[1])) < 4;
  const arc = [0];
  for (let i = 1; i < truth.length; i++) arc.push(arc[i - 1] + Math.hypot(truth[i][0] - truth[i - 1][0], truth[i][1] - truth[i - 1][1]));
  const clickAt = (i: number) => snapClick(rgba, w, h, [truth[i][0], truth[i][1] + 2]);
  const trace = (a: [number, number], b: [number, number]) => {
    const win = traceWindow(a, b, w, h);
    const tiles = tilesOver(win, w, h);
    for (const t of tiles) session.putTile(t.key, t, rgba, whole);
    return session.traceOnce(a, b, win, tiles.map((t) => t.key));
  };
  const forced = [...new Set([...outcrops, truth.length - 1])].sort((a, b) => a - b);
  let at = 0;
  let anchor = clickAt(0);
  let clicks = 1;
  const pts: [number, number][] = [anchor];
  const placed: [number, number][] = [anchor];
  for (const stop of forced) {
    while (at < stop) {
      // The farthest point, FOLLOW_STEP_PX at a time, at which the preview follows: the pointer goes on while it does,
      // and FOLLOW_PAST steps past a place where it leaves the line, to see whether it comes back; shorter steps when
      // even the first does not follow.
      let best: { i: number; q: [number, number]; stretch: [number, number][] } | null = null;
      for (let step = FOLLOW_STEP_PX; !best && step >= 12; step /= 2) {
        let misses = 0;
        for (let s = arc[at] + step; misses <= FOLLOW_PAST; s += step) {
          let i = at + 1;
          while (i < stop && arc[i] < s) i++;
          const q = clickAt(i);
          const stretch = trace(anchor, q);
          if (lineMax(stretch, truth, nearEnd) <= 1.5) [best, misses] = [{ i, q, stretch }, 0];
          else misses++;
          if (i >= stop) break;
        }
      }
      // Nothing follows even a short way: the click goes a short step on, and its stretch is kept as it is.
      if (!best) {
        let i = at + 1;
        while (i < stop && arc[i] < arc[at] + 12) i++;
        const q = clickAt(i);
        best = { i, q, stretch: trace(anchor, q) };
      }
      for (let k = 1; k < best.stretch.length; k++) pts.push(best.stretch[k]);
      [at, anchor] = [best.i, best.q];
      clicks++;
      placed.push(anchor);
    }
  }
  let s2 = 0;
  for (const p of pts) s2 += distanceToPolyline(truth, p) ** 2;
  return { clicks, rms: Math.sqrt(s2 / pts.length), max: lineMax(pts, truth, nearEnd), pts, placed };
}

if (!process.argv.includes('--demo')) main();
demo();
