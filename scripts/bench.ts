// Benchmark of the area-balance engine (npm run bench; add -- --json for the medians only).
// In one run, on a forward-model section of 12 horizons × ~10,000 vertices:
//   analysis  – analyseSection with a caller-held preparation buffer, as the page runs it (and once
//               more without one, in fresh arrays), the full analysis (validation, pin clipping, lengths, areas,
//               self-crossing checks, the area–depth fit);
//   floor     – a bare shoelace pass over the same vertices, already in typed arrays;
//   input     – a bare shoelace pass over the section's own [x, z] point arrays, the form the
//               analysis is given: what reading the input costs, before any checking or clipping;
//   validation, self-crossing – two parts of the analysis timed alone (validateSectionArrays into a
//               reused buffer, and sweepSelfCrossing on the clipped lines), to show where the time goes;
//   sweep     – the self-crossing test alone on long steep lines, where many segments overlap in x:
//               a 1,000,000-vertex steep zigzag, a diamond spiral of as many (x and z both reverse, so the
//               sweep itself holds nearly every segment at once: its worst case) and a 20,000-vertex densely traced
//               steep limb (wall time and CPU time, since a shared machine inflates the first);
//   clipping  – the same excess areas the general-purpose way: each horizon + regional loop
//               as a polygon, clipped to the pin rectangle with polygon-clipping (npm), planar area;
// and 10,000 Monte Carlo realisations of 6 horizons × ~2,000 vertices (monteCarlo).
// Times are medians over repeated runs after a warm-up; the analysis and the floor are timed in
// alternating blocks so that load on the machine falls on both alike. No result is cached between
// runs: every analysis validates, clips and measures the whole section again.
import polygonClipping from 'polygon-clipping';
import { analyseSection } from '../src/core/analysis/analyseSection';
import { createPreparationBuffer } from '../src/core/analysis/preparationBuffer';
import { monteCarlo, type MonteCarloOptions } from '../src/core/analysis/monteCarlo';
import { forwardSection } from '../src/core/forward/forwardSection';
import type { FoldSpec } from '../src/core/forward/forwardSpec';
import { sweepSelfCrossing } from '../src/core/geometry/sweepSelfCrossing';
import { clipAndMeasure } from '../src/core/geometry/clipAndMeasure';
import { shoelaceArea } from '../src/core/geometry/shoelaceArea';
import type { LineSection as Section } from '../src/core/model/section';
import { validateSectionArrays } from '../src/core/model/validateSectionArrays';
import { minOf, maxOf } from '../src/core/stats/minMax';

const json = process.argv.includes('--json');

/**
 * An invented fold belt: 20 anticlines (rounded, asymmetric, overturned) on flat regionals,
 * `samplesPerFold` segments per fold. The folds only rise above the regional (weights > 0), so each
 * horizon + regional loop has winding 0 or 1 everywhere and a polygon library's unsigned area equals
 * the signed excess area; the overturned folds make most horizons fold back in x, so the
 * self-crossing check has real work to do.
 */
function benchSection(horizons: number, samplesPerFold: number): Section {
  const shapes: FoldSpec['shape'][] = ['rounded', 'asymmetric', 'overturned', 'rounded'];
  const folds: FoldSpec[] = Array.from({ length: 20 }, (_, k) => ({
    shape: shapes[k % 4], from: 6000 + k * 10000, to: 10000 + k * 10000, crest: 0.7, overturn: 1.3, weight: 1 + (k % 3) * 0.5,
  }));
  return forwardSection({
    units: 'm', displacement: 5000, detachmentElevation: -8000, pins: [0, 205000],
    horizons: Array.from({ length: horizons }, (_, i) => ({ name: `Unit ${i + 1}`, regionalElevation: -200 * i })),
    folds, samplesPerFold,
  }).section;
}

/** Median of the times (ms) of `runs` calls after `warm` untimed ones. */
function timeIt(fn: () => unknown, runs: number, warm: number): number {
  for (let i = 0; i < warm; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    fn();
    t.push(performance.now() - start);
  }
  return median(t);
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** Each horizon's loop (line, then regional reversed) as typed arrays, built outside the timing. */
function loops(section: Section): { xs: Float64Array; zs: Float64Array }[] {
  return section.horizons.map((h) => {
    const ring = [...h.line, ...[...h.regional].reverse()];
    return { xs: Float64Array.from(ring, (p) => p[0]), zs: Float64Array.from(ring, (p) => p[1]) };
  });
}

/** Excess areas the general-purpose way: loop polygon ∩ pin rectangle (polygon-clipping), planar area of the result. */
function clippedAreas(section: Section): number[] {
  const [pL, pR] = section.pins;
  return section.horizons.map((h) => {
    // A local origin (docs/method.md §Numerics), as the engine uses; the library then works on small numbers.
    const z0 = h.regional[0][1];
    const ring: [number, number][] = [...h.line, ...[...h.regional].reverse()].map((p) => [p[0] - pL, p[1] - z0]);
    let lo = Infinity;
    let hi = -Infinity;
    for (const p of ring) {
      lo = Math.min(lo, p[1]);
      hi = Math.max(hi, p[1]);
    }
    const w = pR - pL;
    const rect: [number, number][] = [[0, lo - 1], [w, lo - 1], [w, hi + 1], [0, hi + 1]];
    const result = polygonClipping.intersection([ring], [rect]);
    let area = 0;
    for (const polygon of result) {
      polygon.forEach((r, k) => {
        const a = Math.abs(shoelaceArea(r.map((p) => p[0]), r.map((p) => p[1])));
        area += k === 0 ? a : -a;
      });
    }
    return area;
  });
}

/** A bare shoelace pass over each horizon's loop read straight from the section's [x, z] arrays (line, then regional back). */
function inputShoelace(section: Section): number {
  let total = 0;
  for (const h of section.horizons) {
    const ring = [h.line, h.regional];
    const x0 = h.line[0][0];
    const z0 = h.line[0][1];
    let sum = 0;
    let px = 0;
    let pz = 0;
    for (let r = 0; r < 2; r++) {
      const pts = ring[r];
      const n = pts.length;
      for (let k = 0; k < n; k++) {
        const p = pts[r === 0 ? k : n - 1 - k];
        const x = p[0] - x0;
        const z = p[1] - z0;
        sum += px * z - x * pz;
        px = x;
        pz = z;
      }
    }
    total += sum / 2;
  }
  return total;
}

/** The self-crossing test alone: sweepSelfCrossing on every clipped line that is not x-monotone (as prepareHorizon runs it). */
function crossingTest(section: Section): () => number {
  const [pL, pR] = section.pins;
  const measured = section.horizons.map((h) => clipAndMeasure(
    Float64Array.from(h.line, (p) => p[0]), Float64Array.from(h.line, (p) => p[1]), pL, pR,
  )).filter((m) => m.clip.clipped && !m.xMonotone);
  return () => {
    let found = 0;
    for (const m of measured) found += sweepSelfCrossing(m.clip.clipped!.xs, m.clip.clipped!.zs) ? 1 : 0;
    return found;
  };
}

/** A steep zigzag (x back and forth between 0 and 1 while z falls by 1 per vertex): every segment overlaps every other in x; it does not cross itself. */
function steepZigzag(n: number): { xs: Float64Array; zs: Float64Array } {
  const xs = new Float64Array(n), zs = new Float64Array(n);
  for (let i = 0; i < n; i++) { xs[i] = i % 2; zs[i] = -i; }
  return { xs, zs };
}

/**
 * A diamond spiral (four vertices a turn, the radius growing a little at each): every segment spans from the centre
 * line out to its radius in both x and z, and both reverse every other vertex, so no choice of sweep axis helps and
 * the sweep itself holds nearly every segment at once. It does not cross itself (each turn lies outside the last).
 */
function diamondSpiral(n: number): { xs: Float64Array; zs: Float64Array } {
  const xs = new Float64Array(n), zs = new Float64Array(n);
  const dx = [1, 0, -1, 0], dz = [0, 1, 0, -1];
  for (let i = 0; i < n; i++) { const r = 1 + i * 1e-3; xs[i] = r * dx[i % 4]; zs[i] = r * dz[i % 4]; }
  return { xs, zs };
}

/** A densely traced steep limb: z falls steadily while x wavers by hand-like jitter; it does not cross itself. */
function steepLimb(n: number): { xs: Float64Array; zs: Float64Array } {
  const xs = new Float64Array(n), zs = new Float64Array(n);
  for (let i = 0; i < n; i++) { xs[i] = 0.3 * Math.sin(i * 0.7) + 0.2 * Math.sin(i * 1.9); zs[i] = -i * 0.5; }
  return { xs, zs };
}

/** Median wall and CPU milliseconds of the sweep on the line over `runs` runs; throws if it finds a crossing (there is none). */
function timeSweep(line: { xs: Float64Array; zs: Float64Array }, runs: number): { wallMs: number; cpuMs: number } {
  const wall: number[] = [], cpu: number[] = [];
  for (let r = 0; r < runs + 1; r++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    if (sweepSelfCrossing(line.xs, line.zs) !== null) throw new Error('the benchmark line crosses itself');
    const t1 = performance.now();
    const c = process.cpuUsage(c0);
    if (r > 0) { wall.push(t1 - t0); cpu.push((c.user + c.system) / 1000); }
  }
  return { wallMs: median(wall), cpuMs: median(cpu) };
}

function main(): void {
  const section = benchSection(12, 500);
  const vertices = section.horizons.map((h) => h.line.length);
  const loopArrays = loops(section);
  const floor = (): number => {
    let s = 0;
    for (const l of loopArrays) s += shoelaceArea(l.xs, l.zs);
    return s;
  };
  // The page holds one buffer for the engine's passing points (state/selectors.ts), and so does this loop.
  const preparationBuffer = createPreparationBuffer();
  const analysis = (): number => {
    const r = analyseSection(section, { buffer: preparationBuffer });
    if (!r.ok) throw new Error(`bench section rejected: ${r.problems[0].message}`);
    return r.analysis.horizons.length;
  };

  // The same analysis by a caller that holds no buffer: fresh arrays each call.
  const analysisFresh = (): number => {
    const r = analyseSection(section);
    if (!r.ok) throw new Error(`bench section rejected: ${r.problems[0].message}`);
    return r.analysis.horizons.length;
  };
  const input = () => inputShoelace(section);
  // Validation into one reused buffer, as the analysis runs it (the caller's preparation buffer).
  const buffer = new Float64Array(section.horizons.reduce((n, h) => n + 2 * (h.line.length + h.regional.length), 0));
  let used = 0;
  const validation = () => {
    used = 0;
    return validateSectionArrays(section, (n) => buffer.subarray((used += n) - n, used));
  };
  const crossings = crossingTest(section);

  // All six in alternating blocks of 20 runs after a warm-up of each: load on the machine falls on
  // all alike, and within a block each runs in its own steady state (the floor's arrays stay in
  // cache, as a bare pass would have them; a strict one-by-one alternation would let the analysis
  // evict them and flatter the ratio).
  const timed: [() => unknown, number[]][] = [analysis, floor, input, validation, crossings, analysisFresh].map((fn) => [fn, []]);
  for (let i = 0; i < 20; i++) for (const [fn] of timed) fn();
  for (let block = 0; block < 6; block++) {
    for (const [fn, times] of timed) {
      for (let i = 0; i < 20; i++) {
        const t = performance.now();
        fn();
        times.push(performance.now() - t);
      }
    }
  }
  const [analysisMs, floorMs, inputMs, validationMs, crossingMs, analysisFreshMs] = timed.map(([, times]) => median(times));

  const clippingMs = timeIt(() => clippedAreas(section), 7, 2);
  const ours = analyseSection(section);
  if (!ours.ok) throw new Error('bench section rejected');
  const theirs = clippedAreas(section);
  const worst = maxOf(ours.analysis.horizons.map((h, i) => Math.abs(h.excessArea - theirs[i]) / Math.abs(theirs[i])));

  const mcSection = benchSection(6, 100);
  const mcOptions: MonteCarloOptions = {
    runs: 10_000, seed: 20260, sigmaVertex: 5, sigmaOffset: 20, sigmaHorizonOffset: 10, sigmaTilt: 1e-4, sigmaScale: 0.005,
  };
  const mc = (): number => {
    const r = monteCarlo(mcSection, mcOptions);
    if (!r.ok) throw new Error('Monte Carlo section rejected');
    return r.result.valid;
  };
  const monteCarloMs = timeIt(mc, 7, 2);

  const zigzag = timeSweep(steepZigzag(1_000_000), 5);
  const spiral = timeSweep(diamondSpiral(1_000_000), 3);
  const limb = timeSweep(steepLimb(20_000), 9);
  if (json) {
    process.stdout.write(`${JSON.stringify({ analysisMs, analysisFreshMs, floorMs, clippingMs, monteCarloMs, zigzagSweepMs: zigzag.wallMs, zigzagSweepCpuMs: zigzag.cpuMs, spiralSweepMs: spiral.wallMs, spiralSweepCpuMs: spiral.cpuMs, limbSweepMs: limb.wallMs })}\n`);
    return;
  }
  const mcVertices = mcSection.horizons.map((h) => h.line.length);
  const x = (ms: number) => `${(ms / floorMs).toFixed(2)}× floor`;
  const rows: [string, string, string][] = [
    ['full analysis (analyseSection)', analysisMs.toFixed(3), x(analysisMs)],
    ['  the same, no buffer (fresh arrays)', analysisFreshMs.toFixed(3), x(analysisFreshMs)],
    ['floor: bare shoelace, typed arrays', floorMs.toFixed(3), '1.00× floor'],
    ['input: bare shoelace, [x, z] arrays', inputMs.toFixed(3), x(inputMs)],
    ['  part: validation (copy to arrays)', validationMs.toFixed(3), x(validationMs)],
    ['  part: self-crossing test', crossingMs.toFixed(3), x(crossingMs)],
    ['polygon-clipping loop ∩ pin rectangle', clippingMs.toFixed(1), `${(clippingMs / analysisMs).toFixed(0)}× analysis`],
    ['Monte Carlo, 10,000 runs', monteCarloMs.toFixed(1), `${(monteCarloMs / 10_000 * 1000).toFixed(1)} µs/run`],
    ['self-crossing: 1,000,000-vertex zigzag', zigzag.wallMs.toFixed(0), `CPU ${zigzag.cpuMs.toFixed(0)} ms`],
    ['  1,000,000-vertex spiral (sweep, worst)', spiral.wallMs.toFixed(0), `CPU ${spiral.cpuMs.toFixed(0)} ms`],
    ['self-crossing: 20,000-vertex steep limb', limb.wallMs.toFixed(1), `CPU ${limb.cpuMs.toFixed(1)} ms`],
  ];
  const line = (a: string, b: string, c: string) => `${a.padEnd(40)} ${b.padStart(10)}  ${c}`;
  const yes = (ok: boolean) => (ok ? 'met' : 'NOT met');
  console.log(`Section: ${vertices.length} horizons × ${minOf(vertices)}–${maxOf(vertices)} vertices (forward model); Monte Carlo: ${mcVertices.length} × ${minOf(mcVertices)}–${maxOf(mcVertices)}.`);
  console.log(`Node ${process.version}; medians in ms.\n`);
  console.log(line('measure', 'median ms', 'relative'));
  for (const r of rows) console.log(line(...r));
  console.log(`\nExcess areas, ours vs polygon-clipping: worst relative difference ${worst.toExponential(2)} (${worst <= 1e-9 ? 'agree to 1e-9' : 'DISAGREE beyond 1e-9'}).`);
  console.log('\nTargets:');
  console.log(`  analysis ≤ 3× the floor          ${(analysisMs / floorMs).toFixed(2)}×   ${yes(analysisMs <= 3 * floorMs)}`);
  // Work no analysis of this input can skip: reading every [x, z] point once, and the self-crossing test.
  console.log(`    (reading the input plus the self-crossing test alone: ${((inputMs + crossingMs) / floorMs).toFixed(2)}× the floor)`);
  console.log(`  analysis ≥ 20× faster than clipping  ${(clippingMs / analysisMs).toFixed(0)}×   ${yes(clippingMs >= 20 * analysisMs)}`);
  console.log(`  Monte Carlo ≤ 1 s                ${monteCarloMs.toFixed(0)} ms   ${yes(monteCarloMs <= 1000)}`);
  console.log(`  zigzag self-crossing < 1 s       ${zigzag.wallMs.toFixed(0)} ms (CPU ${zigzag.cpuMs.toFixed(0)} ms)   ${yes(zigzag.wallMs < 1000)}`);
}

main();
