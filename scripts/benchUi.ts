// UI benchmark (a script, not a test): builds the app into its own folder, serves it, drives headless Chromium
// and prints, for each piece of work a geologist feels, what it took beside the floor for the same work measured
// in the same page, their ratio and the longest main-thread task it caused (PerformanceObserver 'longtask').
//
//   npm run bench:ui [-- --scans 1,25,100,200 --png-sizes screen,a3-300 --vertices 2000,20000,100000 --runs 3 --no-uncapped --no-scans
//                       --no-documents --trace-mp 200 --no-trace --only-trace --moves 60 --trace-profile folder
//                       --profile folder --first-move-trace folder --open-trace folder --export-trace folder --no-continuous --no-canvas-floor
//                       --drag-trace folder --drag-invalidations]
//   BENCH_DIST=folder skips the build and serves that folder.
//
// Rows (each the median of --runs runs where a run is repeatable):
// - pan: frame intervals while panning a 1 MP and the largest scan (fitted, and at 1:1); floor: the page's idle
//   frame interval. Twice: frame rate capped at the display's, and uncapped (a frame then takes what its work takes).
// - open scan at each size: drop → shown (timed in the page: the frame that first draws it done); floor: createImageBitmap of the same file in the same page, and beside it
//   decode + one drawn frame (the bitmap drawn fitted on one canvas of the view's size, timed to a task after that frame). With it the
//   memory of the renderer process that hosts the page (resident, and its private, file and shared parts; the
//   browser's other renderer processes hold nothing of the app and are printed beside it) against the scan's RGBA
//   size, and against that renderer before any scan plus the RGBA size (what holding the decoded scan cannot go
//   under), with Chromium's own account of it by allocator (scripts/rendererMemory.ts); then, for the largest scan
//   before its exports, the renderer once it is replaced by a 1 MP one (and again at the end, after the export floors).
// - export PNG at each offered size (--png-sizes screen,a4-150,a4-300,a3-300) and scan size: the button's click event →
//   the file handed to the browser's download, both in the page (Playwright's click → download event in the note);
//   floor: the same figure (the markup of the app's SVG export) drawn by the browser with the scan at the PNG's
//   resolution through its matrix, and that canvas encoded as PNG, in the same page (exportFloor); with the longest
//   main-thread task and the main thread's heap peak against the PNG's pixel bytes; the app's own time (its click
//   handler → the file handed to the download, without Playwright's click and download event) and each step's
//   share (src/io/exportFigure.ts PNG_STEP_MARK). --no-documents leaves out the big-document rows.
// - big documents (12 horizons × each --vertices): opening the section file, the first move of a regional drag,
//   single and Shift (every regional) drags waiting for the numbers, a continuous drag at 60 moves a second, the
//   autosave task after the edit; floor: one 16.7 ms frame. The first move is also timed to the end of its frame on
//   the main thread (layout, paint and commit included), beside the same drag's later moves timed so. Each continuous
//   drag again against the browser's floor for its canvases (unless --no-canvas-floor): a bare page with the same
//   canvases, the ones a move redraws put back with one drawImage a move, timed the same way (canvasFloor).
//   --profile keeps a CPU profile (and a trace) of the opens,
//   first moves and continuous drags; --drag-trace keeps only a Chromium trace of each continuous drag and prints
//   one move by phase (script, style, layout, paint, raster) and what was painted; with --drag-invalidations also
//   what invalidated style, layout and paint.
// - tracing on a --trace-mp scan (default 200 MP): Draw horizon, an anchor on a drawn line, the pointer moved
//   3,000 px along it; the first preview that follows the line (the rough one), the full-resolution preview (when
//   the preview stops changing), and each of --moves later pointer positions of a few pixels: move → preview
//   redrawn, and move → the full-resolution trace to that position drawn (no stand-in left); floor: one 16.7 ms
//   frame. The machine's load average is printed with them. --trace-profile keeps a Chromium trace of the later
//   moves there and prints, for the slowest, what each thread ran between the move and its trace drawn. Then the renderer's memory with the scan open, before tracing and after the
//   stretch is placed: the difference is what tracing holds.
// The script fails loudly (exit 1) when what it meant to open is not open or a measurement saw nothing.
import { execFileSync } from 'node:child_process';
import { loadavg } from 'node:os';
import { chromium, type Page } from '@playwright/test';
import { forwardSection } from '../src/core/forward/forwardSection';
import { sectionToProjectDoc } from '../src/core/model/migrations/sectionToProjectDoc';
import type { LineSection as Section } from '../src/core/model/section';
import { fitCamera } from '../src/state/camera';
import { SCAN_SHOWN_MARK } from '../src/state/scanTilesPyramid';
import { LONG_TASKS, longestSince, pageNow as now } from './pageTasks';
import { startPreview } from './previewServer';
import { allocatorLine, pageRendererMemory, rendererAllocators, residentLine, type ProcessMemory } from './rendererMemory';
import { DRAG_TRACE_CATEGORIES, INVALIDATION_CATEGORY, printDragTrace, type DragTraceEvent } from './dragTrace';

const DIST = process.env.BENCH_DIST || '/tmp/foldroot-bench-ui/dist';
const VITE = 'node_modules/vite/bin/vite.js';
const ARGS = ['--no-sandbox', '--disable-gpu', '--enable-precise-memory-info', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const UNCAPPED = ['--disable-frame-rate-limit', '--disable-gpu-vsync'];
const FRAME_MS = 1000 / 60;

function flag(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}
const list = (s: string | undefined, fallback: number[]) => (s ? s.split(',').map(Number).filter((x) => x > 0) : fallback);
const SCAN_MP = list(flag('scans'), [1, 25, 100, 200]);
const VERTICES = list(flag('vertices'), [2000, 20000, 100000]);
const RUNS = Math.max(1, Number(flag('runs') ?? 3));
const WITH_UNCAPPED = !process.argv.includes('--no-uncapped');
const WITH_SCANS = !process.argv.includes('--no-scans') && !process.argv.includes('--only-trace');
const WITH_TRACE = !process.argv.includes('--no-trace');
const ONLY_TRACE = process.argv.includes('--only-trace');
/** Leaves out the big-document rows (open, drags, autosave), e.g. to time only the scan and export rows. */
const WITH_DOCUMENTS = !process.argv.includes('--no-documents') && !ONLY_TRACE;
const TRACE_MP = Number(flag('trace-mp') ?? 200);
/** A folder for screenshots of the tracing rows' first previews (optional). */
const SHOTS = flag('shots');
/** Later pointer positions timed after a traced preview has settled. */
const MOVES = Math.max(1, Number(flag('moves') ?? 60));
/** A folder for a Chromium trace of the later pointer positions (`trace-moves.json`), with a summary of the slowest. */
const TRACE_PROFILE = flag('trace-profile');
/** A folder for a CPU profile of each big-document open and continuous drag (`open-12x<n>.cpuprofile`, `drag-12x<n>.cpuprofile`) and of each size's first scan open (`open-scan-<n>mp.cpuprofile`), opened by Chrome's DevTools; a summary is printed. */
const PROFILE = flag('profile');
/** A folder for a Chromium trace of each waited drag's first and second moves (`first-move-12x<n>[-shift].trace.json`, `second-…`), with the main thread's time in each by event. */
const FIRST_MOVE_TRACE = flag('first-move-trace');
/** Leaves out the continuous drags (e.g. to time only the open, first move, Shift-drag and autosave). */
const WITH_CONTINUOUS = !process.argv.includes('--no-continuous');
/** A folder for a Chromium trace of each continuous drag (`drag-12x<n>.trace.json`), taken without the CPU profiler (which slows a move about 2×); one move is printed by phase (scripts/dragTrace.ts). */
const DRAG_TRACE = flag('drag-trace');
/** Leaves out the canvas floor of the continuous drags (a bare page with the section view's canvases, canvasFloor). */
const WITH_CANVAS_FLOOR = !process.argv.includes('--no-canvas-floor');
/** With --drag-trace or --first-move-trace, also list what invalidated style, layout and paint (slows the traced moves several times over). */
const DRAG_INVALIDATIONS = process.argv.includes('--drag-invalidations');
/** A folder for a Chromium trace of each big-document open and each size's first scan open (`open-12x<n>.trace.json`, `open-scan-<n>mp.trace.json`), with the main thread's longest tasks by event. */
const OPEN_TRACE = flag('open-trace');
/** Folder for a Chromium trace of each PNG export's first run (export-<w>x<h>-<n>mp.trace.json), printed by thread. */
const EXPORT_TRACE = flag('export-trace');

class BenchFailure extends Error {}
function check(ok: unknown, what: string): asserts ok {
  if (!ok) throw new BenchFailure(`bench:ui cannot measure: ${what}`);
}

function median(xs: number[]): number {
  check(xs.length > 0, 'a measurement saw no samples');
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
}

function percentile(xs: number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(p * s.length))];
}

/** One printed row: the work, what it took, its floor, the ratio and the longest task (ms). */
interface Row { work: string; ms: number; floor: number; longest?: number; note?: string; unit?: string }
const rows: Row[] = [];
function report(row: Row): void {
  rows.push(row);
  printRow(row);
}
function printRow(r: Row): void {
  const ratio = r.floor > 0 ? `${(r.ms / r.floor).toFixed(2)}×` : '—';
  const longest = r.longest === undefined ? '' : `   longest task ${r.longest.toFixed(0)} ms`;
  const unit = r.unit ?? 'ms';
  console.log(`  ${r.work.padEnd(52)} ${r.ms.toFixed(1).padStart(9)} ${unit}   floor ${r.floor.toFixed(1).padStart(8)} ${unit}   ${ratio.padStart(7)}${longest}${r.note ? `   ${r.note}` : ''}`);
}

// Long tasks: the page keeps every task over 50 ms from before the app loads (scripts/pageTasks.ts).

/**
 * Memory (MB) of the renderer process that hosts the page (found by its main frame: scripts/rendererMemory.ts), from
 * Linux /proc after a collection: resident (VmRSS) and its parts, private anonymous (RssAnon: the heap, bitmaps and
 * canvases the page holds), mapped files (RssFile: Chromium's own program, shared with every process of it) and
 * shared memory (RssShmem: regions shared with the browser and GPU processes); beside it the resident memory of the
 * browser's other renderer processes together (its spare renderer and its interface's, neither holding anything of
 * the app). Null where it cannot be read.
 */
async function rendererMemory(page: Page): Promise<(ProcessMemory & { others: ProcessMemory }) | null> {
  const m = await pageRendererMemory(page).catch(() => null);
  return m ? { ...m.page, others: m.others } : null;
}

/** Resident memory (MB) of the page's renderer process after a collection; null where it cannot be read. */
async function rendererMb(page: Page): Promise<number | null> {
  return (await rendererMemory(page))?.rss ?? null;
}

/** Draws a side × side scan in the page (gradients and a line grid, as a scanned drawing), kept as window.__scanFile. */
async function makeScan(page: Page, side: number, name: string): Promise<void> {
  await page.evaluate(`(async () => {
    const s = ${side};
    const c = new OffscreenCanvas(s, s);
    const ctx = c.getContext('2d');
    const g = ctx.createLinearGradient(0, 0, s, s);
    g.addColorStop(0, '#f4efe2');
    g.addColorStop(1, '#c9b98f');
    ctx.fillStyle = g;
    ctx.fillRect(0, 0, s, s);
    ctx.strokeStyle = '#4a3b2a';
    ctx.lineWidth = Math.max(1, s / 2000);
    for (let k = 0; k <= s; k += s / 50) {
      ctx.beginPath(); ctx.moveTo(k, 0); ctx.lineTo(k, s); ctx.moveTo(0, k); ctx.lineTo(s, k); ctx.stroke();
    }
    const blob = await c.convertToBlob({ type: 'image/jpeg', quality: 0.85 });
    window.__scanFile = new File([blob], ${JSON.stringify(name)}, { type: 'image/jpeg' });
  })()`);
}

/** Floor of opening: createImageBitmap of the generated file in the same page (ms). */
const decodeFloor = (page: Page) => page.evaluate(`(async () => {
  const t = performance.now();
  const b = await createImageBitmap(window.__scanFile);
  const ms = performance.now() - t;
  b.close();
  return ms;
})()`) as Promise<number>;

/**
 * Floor of opening with its first picture: in the same page, createImageBitmap of the file, then, in the next
 * animation frame, the bitmap drawn fitted (24 px margin, as the app fits a scan) on one canvas of the section view's
 * size and place, over it; timed to a task after that frame, as the app's open is timed (its scan layer draws in an
 * animation frame and marks the open a task later). The canvas is removed afterwards (ms).
 */
const drawnFloor = (page: Page) => page.evaluate(`(async () => {
  const view = document.querySelector('[data-testid="section-view"]');
  const box = view.getBoundingClientRect();
  const ratio = window.devicePixelRatio || 1;
  const canvas = document.createElement('canvas');
  canvas.width = Math.round(box.width * ratio);
  canvas.height = Math.round(box.height * ratio);
  Object.assign(canvas.style, { position: 'fixed', left: box.x + 'px', top: box.y + 'px', width: box.width + 'px', height: box.height + 'px', zIndex: 1000, pointerEvents: 'none' });
  document.body.append(canvas);
  await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
  const t = performance.now();
  const b = await createImageBitmap(window.__scanFile);
  await new Promise((resolve) => requestAnimationFrame(() => {
    const ctx = canvas.getContext('2d');
    const k = Math.min((canvas.width - 48 * ratio) / b.width, (canvas.height - 48 * ratio) / b.height);
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(b, (canvas.width - b.width * k) / 2, (canvas.height - b.height * k) / 2, b.width * k, b.height * k);
    setTimeout(resolve, 0);
  }));
  const ms = performance.now() - t;
  b.close();
  canvas.remove();
  await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
  return ms;
})()`) as Promise<number>;

/**
 * Drops window.__scanFile on the view; returns drop → shown (ms), the longest task meanwhile, and drop → its reduced
 * views made (ms). Shown is timed in the page, from the drop's dispatch to the scan layer's SCAN_SHOWN_MARK for this
 * file (a task after the frame that first draws it: src/canvas/ScanLayer.tsx, state/scanTilesPyramid noteScanShown): what the user sees, without the
 * polling of Playwright's waits (20, 50, 100, 100, 500 ms apart), which the floor does not pay either. With --profile
 * a CPU profile of the open (open-scan-<n>mp.cpuprofile) is written and summarised.
 */
async function openScan(page: Page, name: string, profileTag?: string): Promise<{ ms: number; longest: number; reduced: number }> {
  const cdp = PROFILE && profileTag ? await page.context().newCDPSession(page) : null;
  if (cdp) {
    await cdp.send('Profiler.enable');
    await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
    await cdp.send('Profiler.start');
  }
  const traced = OPEN_TRACE && profileTag;
  if (traced) await page.context().browser()!.startTracing(page, { categories: FIRST_MOVE_CATEGORIES });
  const [t0, shownAt] = (await page.evaluate(`new Promise((resolve) => {
    const name = ${JSON.stringify(name)};
    let t0 = 0;
    const seen = new PerformanceObserver((l) => {
      const m = l.getEntries().find((e) => e.name === ${JSON.stringify(SCAN_SHOWN_MARK)} && e.detail === name);
      if (!m) return;
      seen.disconnect();
      resolve([t0, m.startTime]);
    });
    seen.observe({ type: 'mark' });
    const d = new DataTransfer();
    d.items.add(window.__scanFile);
    t0 = performance.now();
    performance.mark('bench-open');
    document.querySelector('.view-box').dispatchEvent(new DragEvent('drop', { dataTransfer: d, bubbles: true, cancelable: true }));
  })`)) as [number, number];
  const ms = shownAt - t0;
  await page.getByTestId('scan-name').filter({ hasText: name }).waitFor({ timeout: 120_000 });
  await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 120_000 });
  if (traced) await saveOpenTrace(page, `open-scan-${profileTag}`, `open a ${profileTag} scan: drop → shown ${ms.toFixed(1)} ms`);
  if (cdp && PROFILE) {
    const { profile } = (await cdp.send('Profiler.stop')) as { profile: CpuProfile };
    await cdp.detach();
    const { writeFileSync, mkdirSync } = await import('node:fs');
    mkdirSync(PROFILE, { recursive: true });
    writeFileSync(`${PROFILE}/open-scan-${profileTag}.cpuprofile`, JSON.stringify(profile));
    console.log(`  open a ${profileTag} scan: drop → shown ${ms.toFixed(1)} ms; the main thread's work from the drop until a little after:`);
    printProfile(profile, 1);
  }
  // The reduced views for zooming out are made after the scan is shown (state/scanTilesPyramid).
  await page.locator('[data-testid="scan-memory"][data-building="no"]').waitFor({ timeout: 120_000 });
  const reduced = (await now(page)) - t0;
  return { ms, longest: await longestSince(page, t0), reduced };
}

/**
 * The figure the PNG export draws, for its floor: the app's own SVG export of the same figure (its markup), split
 * where the scan goes into the part below the scan and the part above it (each a whole SVG document without the
 * scan), with the scan's place (matrix, opacity) and the panel it is clipped to; kept in the page as
 * window.__floorFigure. Its file size is returned.
 */
async function figureForFloor(page: Page): Promise<number> {
  await page.getByTestId('menu-export').click();
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 300_000 }), page.getByTestId('export-svg').click()]);
  await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 120_000 });
  const path = await download.path();
  check(path, 'the SVG export produced no file');
  const { readFileSync } = await import('node:fs');
  const svg = readFileSync(path, 'latin1');
  const at = svg.indexOf('<image class="scan"');
  check(at > 0, 'the SVG export holds no scan');
  const end = svg.indexOf('"/>', svg.indexOf('href="', at) + 6) + 3;
  const before = svg.slice(0, at);
  const groupAt = before.lastIndexOf('<g ');
  const headEnd = svg.indexOf('</defs>') + '</defs>'.length;
  const image = svg.slice(at, svg.indexOf('href="', at));
  const matrix = /transform="matrix\(([^)]*)\)"/.exec(image)?.[1].split(/[\s,]+/).map(Number);
  const opacity = Number(/opacity="([^"]*)"/.exec(image)?.[1] ?? 1);
  const clip = /<clipPath id="panel-clip"><rect x="([^"]*)" y="([^"]*)" width="([^"]*)" height="([^"]*)"\/>/.exec(svg);
  const size = /<svg[^>]*\bwidth="([\d.]+)"[^>]*\bheight="([\d.]+)"/.exec(svg) ?? /viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(svg);
  check(matrix?.length === 6 && matrix.every(Number.isFinite) && clip && size && groupAt > 0 && headEnd > 0, 'the SVG export has no scan place, panel or size');
  const figure = {
    under: `${before.slice(0, groupAt)}</svg>`, over: `${svg.slice(0, headEnd)}${before.slice(groupAt)}${svg.slice(end)}`,
    matrix, opacity, panel: clip.slice(1, 5).map(Number), width: Number(size[1]), height: Number(size[2]),
  };
  await page.evaluate(`window.__floorFigure = ${JSON.stringify(figure)}`);
  return svg.length;
}

/**
 * Export floor: the same figure drawn and encoded at w × h in the same page, by the browser's own means, without the
 * app's code: white, the figure's part below the scan (its SVG markup, rasterised by the browser), the scan through
 * its matrix clipped to the panel, the part above, then the canvas encoded as PNG (OffscreenCanvas.convertToBlob, as
 * the app's worker does). The scan is drawn from a copy already at the PNG's resolution, made before the timing (the
 * app draws from its reduced views, made when the scan opened), and the markup is parsed and decoded before the
 * timing (the app writes it when the Export menu opens). Returns the time, the drawing's share and the PNG's size in bytes.
 */
const exportFloor = (page: Page, w: number, h: number) => page.evaluate(`(async () => {
  const f = window.__floorFigure;
  const svgImage = async (markup) => {
    const img = new Image(f.width, f.height);
    img.src = URL.createObjectURL(new Blob([markup], { type: 'image/svg+xml' }));
    await img.decode();
    return img;
  };
  const [under, over] = [await svgImage(f.under), await svgImage(f.over)];
  const [a, b, c, d] = f.matrix;
  const [sx, sy] = [${w} / f.width, ${h} / f.height];
  const k = Math.min(1, Math.max(Math.hypot(a * sx, b * sy), Math.hypot(c * sx, d * sy)));
  const full = await createImageBitmap(window.__scanFile);
  const scan = await createImageBitmap(full, { resizeWidth: Math.max(1, Math.round(full.width * k)), resizeHeight: Math.max(1, Math.round(full.height * k)), resizeQuality: 'high' });
  const [kx, ky] = [full.width / scan.width, full.height / scan.height];
  full.close();
  const t = performance.now();
  const cv = new OffscreenCanvas(${w}, ${h});
  const ctx = cv.getContext('2d');
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, ${w}, ${h});
  ctx.scale(sx, sy);
  ctx.drawImage(under, 0, 0, f.width, f.height);
  ctx.save();
  ctx.beginPath();
  ctx.rect(f.panel[0], f.panel[1], f.panel[2], f.panel[3]);
  ctx.clip();
  ctx.transform(f.matrix[0], f.matrix[1], f.matrix[2], f.matrix[3], f.matrix[4], f.matrix[5]);
  ctx.scale(kx, ky);
  ctx.globalAlpha = f.opacity;
  ctx.imageSmoothingQuality = 'high';
  ctx.drawImage(scan, 0, 0);
  ctx.restore();
  ctx.drawImage(over, 0, 0, f.width, f.height);
  // One pixel read back makes the canvas draw what it recorded, so the drawing and the encoding are timed apart.
  ctx.getImageData(0, 0, 1, 1);
  const drawn = performance.now();
  const png = await cv.convertToBlob({ type: 'image/png' });
  const ms = performance.now() - t;
  scan.close();
  URL.revokeObjectURL(under.src);
  URL.revokeObjectURL(over.src);
  return { ms, draw: drawn - t, bytes: png.size };
})()`) as Promise<{ ms: number; draw: number; bytes: number }>;

const EXPORT_TRACE_CATEGORIES = ['devtools.timeline', 'disabled-by-default-devtools.timeline', 'blink.user_timing', 'v8.execute', 'toplevel', 'blink', 'cc', 'gpu'];

/**
 * Writes the trace of one PNG export (--export-trace) and prints, for each thread of the page's renderer busy between
 * the export's 'asked' and 'handed' marks, its busy time, its longest top-level events (ms at ms after 'asked') and
 * its time of its own by event.
 */
async function saveExportTrace(page: Page, name: string): Promise<void> {
  const raw = await page.context().browser()!.stopTracing();
  const { writeFileSync, mkdirSync } = await import('node:fs');
  mkdirSync(EXPORT_TRACE!, { recursive: true });
  writeFileSync(`${EXPORT_TRACE}/${name}.trace.json`, raw);
  const trace = JSON.parse(raw.toString()) as { traceEvents: TraceEvent[] };
  const marks = trace.traceEvents.filter((e) => e.name === 'foldroot-png-step');
  const stepOf = (e: TraceEvent) => (e.args as { data?: { detail?: string } } | undefined)?.data?.detail ?? '';
  const asked = marks.find((e) => stepOf(e).includes('asked'));
  const handed = marks.find((e) => stepOf(e).includes('handed'));
  if (!asked || !handed) {
    console.log(`  ${name}: the trace holds no asked/handed marks`);
    return;
  }
  const [from, to] = [asked.ts!, handed.ts!];
  const threads = new Map<string, string>();
  for (const e of trace.traceEvents) if (e.ph === 'M' && e.name === 'thread_name') threads.set(`${e.pid}:${e.tid}`, e.args?.name ?? '');
  console.log(`  ${name} (${name}.trace.json): asked → handed ${((to - from) / 1000).toFixed(1)} ms; marks (ms after asked): ${marks.map((m) => `${stepOf(m).replace(/"/g, '')} ${((m.ts! - from) / 1000).toFixed(0)}`).join(' · ')}`);
  const byThread = new Map<string, TraceEvent[]>();
  for (const e of trace.traceEvents) {
    if (e.pid !== asked.pid || e.ph !== 'X' || !e.dur || e.ts! + e.dur < from || e.ts! > to) continue;
    const k = `${e.pid}:${e.tid}`;
    byThread.set(k, [...(byThread.get(k) ?? []), e]);
  }
  for (const [k, on] of byThread) {
    const { tasks, self } = mainThreadBetween(on, from, to);
    const busy = tasks.reduce((a, t) => a + t.ms, 0);
    if (busy < 1) continue;
    console.log(`    ${threads.get(k) ?? k}: busy ${busy.toFixed(1)} ms in ${tasks.length} tasks; the longest: ${[...tasks].sort((a, b) => b.ms - a.ms).slice(0, 5).map((t) => `${t.ms.toFixed(1)} at ${t.at.toFixed(0)} ${t.key}`).join(', ')}`);
    printSelf(self, 10, '        ');
  }
}

/** The PNG sizes the export offers (src/io/exportFigure.ts PNG_SIZES), or those --png-sizes names. */
const PNG_SIZES = [['screen', 1400, 990], ['a4-150', 1754, 1240], ['a4-300', 3508, 2480], ['a3-300', 4961, 3508]] as const;
const WANTED_SIZES = flag('png-sizes')?.split(',');
const EXPORT_SIZES = PNG_SIZES.filter(([id]) => !WANTED_SIZES || WANTED_SIZES.includes(id));

/**
 * Exports the figure as PNG at one offered size; returns click → file handed to the download (ms: from the button's
 * click event, as the browser dispatched it, to the app's 'handed' mark, both in the page; Playwright's own checks
 * before it clicks and its download event after are not the user's wait and go to the steps as 'driver' and
 * 'download'), the longest task, and the main thread's JavaScript heap peak over its level before the export (bytes;
 * sampled every 5 ms, after a collection).
 */
async function exportPng(page: Page, sizeId: string, traceName?: string): Promise<{ ms: number; longest: number; bytes: number; heapPeak: number; steps: Map<string, number> }> {
  await page.getByTestId('menu-export').click();
  await page.getByTestId('png-size').selectOption(sizeId);
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('HeapProfiler.collectGarbage').catch(() => undefined);
  await cdp.detach();
  await page.evaluate(`(() => {
    const base = performance.memory.usedJSHeapSize;
    window.__heap = { base, peak: base };
    window.__heapTimer = setInterval(() => { const u = performance.memory.usedJSHeapSize; if (u > window.__heap.peak) window.__heap.peak = u; }, 5);
  })()`);
  await page.evaluate(`(() => {
    window.__pressedAt = 0;
    document.querySelector('[data-testid="export-png"]').addEventListener('click', (e) => { window.__pressedAt = e.timeStamp; }, { once: true, capture: true });
  })()`);
  if (traceName) await page.context().browser()!.startTracing(page, { categories: EXPORT_TRACE_CATEGORIES });
  const t0 = await now(page);
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 300_000 }), page.getByTestId('export-png').click()]);
  const t1 = await now(page);
  if (traceName) await saveExportTrace(page, traceName);
  const heapPeak = (await page.evaluate(`(() => { clearInterval(window.__heapTimer); const u = performance.memory.usedJSHeapSize; return Math.max(window.__heap.peak, u) - window.__heap.base; })()`)) as number;
  const path = await download.path();
  check(path, 'the PNG export produced no file');
  const { readFileSync } = await import('node:fs');
  const head = readFileSync(path).subarray(0, 24);
  check(head.length === 24 && head.subarray(1, 4).toString('latin1') === 'PNG', 'the PNG export produced no PNG');
  const size = PNG_SIZES.find(([id]) => id === sizeId)!;
  check(head.readUInt32BE(16) === size[1] && head.readUInt32BE(20) === size[2], `the PNG export is not ${size[1]} × ${size[2]} px`);
  await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 120_000 });
  const pressedAt = (await page.evaluate('window.__pressedAt')) as number;
  check(pressedAt >= t0, 'the export button heard no click');
  const steps = await pngSteps(page, t0, pressedAt, t1);
  return { ms: steps.get(USER_TIME)!, longest: await longestSince(page, t0), bytes: readFileSync(path).length, heapPeak, steps };
}

/**
 * The time from each step of the PNG export to the next (src/io/exportFigure.ts PNG_STEP_MARK marks, set on the
 * page as each step starts or is heard from the worker), keyed by the step it starts with: 'driver' is Playwright
 * before its click reaches the page (`t0` → `pressedAt`, the click event), 'click' → 'asked' the event's way to the
 * menu's handler, 'asked' → 'start' the check of the lines and the figure's markup, 'posted' → 'figure' the
 * worker's start-up and the request's hand-over, 'handed' → 'download' the browser's download and Playwright's
 * event for it (ending at `t1`). USER_TIME is click → handed, APP_TIME asked → handed.
 */
async function pngSteps(page: Page, t0: number, pressedAt: number, t1: number): Promise<Map<string, number>> {
  const marks = (await page.evaluate(`performance.getEntriesByName('foldroot-png-step').filter((m) => m.startTime >= ${t0}).map((m) => [m.detail, m.startTime])`)) as [string, number][];
  await page.evaluate(`performance.clearMarks('foldroot-png-step')`);
  check(marks.length >= 4 && marks.some(([m]) => m === 'done'), 'the PNG export set no step marks');
  const at: [string, number][] = [['driver', t0], ['click', pressedAt], ...marks, ['download', Math.max(t1, marks[marks.length - 1][1])]];
  const steps = new Map(at.slice(0, -1).map(([step, t], i) => [step, at[i + 1][1] - t]));
  steps.set(DRIVER_TIME, t1 - t0);
  // The app's own time: from its click handler to the file handed to the browser (without Playwright's click and download event).
  const asked = marks.find(([m]) => m === 'asked')?.[1];
  const handed = marks.find(([m]) => m === 'handed')?.[1];
  check(asked !== undefined && handed !== undefined, 'the PNG export set no asked/handed marks');
  steps.set(APP_TIME, handed - asked);
  steps.set(USER_TIME, handed - pressedAt);
  return steps;
}

/** The steps' key for the app's own time of an export (click handler → file handed over). */
const APP_TIME = 'in the app';
/** The steps' key for the user's wait: the button's click event → the file handed to the download. */
const USER_TIME = 'click → handed';
/** The steps' key for Playwright's whole click → its download event. */
const DRIVER_TIME = "Playwright's click → download event";

/** The medians of each step over runs, as a note: "click 12 · start 3 · … ms". */
function stepsNote(runs: Map<string, number>[]): string {
  const names = [...new Set(runs.flatMap((r) => [...r.keys()]))].filter((n) => n !== APP_TIME && n !== USER_TIME && n !== DRIVER_TIME);
  return names.map((n) => `${n} ${median(runs.map((r) => r.get(n) ?? 0)).toFixed(0)}`).join(' · ');
}

/** The page's frame intervals (ms) over `frames` frames with nothing happening: the floor of a pan frame. */
const idleFrames = (page: Page, frames: number) => page.evaluate(`new Promise((resolve) => {
  const ts = [];
  const tick = (t) => { ts.push(t); if (ts.length > ${frames}) resolve(ts.slice(1).map((x, i) => x - ts[i])); else requestAnimationFrame(tick); };
  requestAnimationFrame(tick);
})`) as Promise<number[]>;

/** Returns the frame intervals (ms) seen in the page during scripted middle-button pans. */
async function panFrames(page: Page): Promise<number[]> {
  const box = (await page.getByTestId('section-view').boundingBox())!;
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  await page.evaluate(`(() => {
    window.__frames = [];
    window.__recording = true;
    const tick = (t) => { window.__frames.push(t); if (window.__recording) requestAnimationFrame(tick); };
    requestAnimationFrame(tick);
  })()`);
  await page.mouse.move(cx, cy);
  await page.mouse.down({ button: 'middle' });
  for (let round = 0; round < 2; round++) {
    await page.mouse.move(cx - 400, cy - 150, { steps: 60 });
    await page.mouse.move(cx + 400, cy + 150, { steps: 120 });
    await page.mouse.move(cx, cy, { steps: 60 });
  }
  await page.mouse.up({ button: 'middle' });
  const stamps = (await page.evaluate('(window.__recording = false, window.__frames)')) as number[];
  const intervals = stamps.slice(1).map((t, i) => t - stamps[i]).slice(2);
  check(intervals.length > 20, 'the pan drew no frames');
  return intervals;
}

const HORIZONS = 12;

/** A 12-horizon section of about `vertices` vertices per horizon from the forward model (an invented fold train, straight regionals). */
function bigSection(vertices: number): Section {
  // Each of the four folds gives 3 vertices a segment, plus 8 (forwardSection's fold profiles).
  const samplesPerFold = Math.max(4, Math.round((vertices - 8) / 3));
  return forwardSection({
    units: 'm', displacement: 2500, detachmentElevation: -4500, pins: [1000, 21000], extent: [0, 22000], samplesPerFold,
    horizons: Array.from({ length: HORIZONS }, (_, i) => ({ name: `Bench ${vertices} horizon ${i + 1}`, regionalElevation: 1000 - 300 * i })),
    folds: [
      { shape: 'rounded', from: 2000, to: 7000, weight: 1 },
      { shape: 'box', from: 7000, to: 12000, limb: 0.25, weight: 0.6 },
      { shape: 'asymmetric', from: 13000, to: 16000, crest: 0.6, weight: 0.8 },
      { shape: 'rounded', from: 16000, to: 20000, weight: 0.5 },
    ],
  }).section;
}

// In the page: for each armed move, the time from the pointermove reaching the window (capture phase, before the
// app's own listener) to the mutation that changes the strip's detachment depth, to the next frame after it (its
// animation-frame callbacks, t2) and to the end of that frame on the main thread (t3: a message posted from those
// callbacks is handled in the first task after the frame's style, layout, paint and commit).
const DRAG_PROBE = `(() => {
  const b = { armed: false, t0: 0, t1: 0, t2: 0, t3: 0, before: '', done: null, resolve: null };
  const depth = () => document.querySelector('[data-testid="strip-detachment-depth"]')?.textContent ?? '';
  window.addEventListener('pointermove', () => { if (b.armed && !b.t0) { b.t0 = performance.now(); performance.mark('bench-move'); } }, { capture: true });
  new MutationObserver(() => {
    window.__textChanges = (window.__textChanges || 0) + 1;
    if (!b.armed || !b.t0 || b.t1 || depth() === b.before) return;
    b.t1 = performance.now();
    requestAnimationFrame(() => {
      b.t2 = performance.now();
      performance.mark('bench-move-frame');
      const after = new MessageChannel();
      after.port1.onmessage = () => { b.t3 = performance.now(); performance.mark('bench-move-drawn'); b.armed = false; b.resolve(); };
      after.port2.postMessage(0);
    });
  }).observe(document.querySelector('[data-testid="results-strip"]'), { subtree: true, childList: true, characterData: true });
  window.__drag = b;
  window.__arm = (wait) => {
    Object.assign(b, { armed: true, t0: 0, t1: 0, t2: 0, t3: 0, before: depth() });
    b.done = new Promise((res) => { b.resolve = res; setTimeout(() => { b.armed = false; res(); }, wait); });
  };
})()`;

interface Grip { gx: number; gy: number }

/** Opens the big section through the open-project input (accepting the discard question) and checks it is the one open. */
async function openBigSection(page: Page, section: Section, vertices: number): Promise<{ ms: number; longest: number; floor: number; grip: Grip }> {
  // The file is made in the page first: Playwright's setInputFiles hands a big buffer over in the page's own
  // thread (base64 decoded there), seconds at 12 × 100,000 vertices that are not the app's.
  await page.evaluate(([text, name]) => {
    (window as unknown as { __docFile: File }).__docFile = new File([text], name, { type: 'application/json' });
  }, [JSON.stringify(section), `bench-12x${vertices}.json`]);
  // The floor: reading the same file and JSON.parse of its text in the same page.
  const floor = (await page.evaluate(`(async () => {
    const t = performance.now();
    JSON.parse(await window.__docFile.text());
    return performance.now() - t;
  })()`)) as number;
  const cdp = PROFILE ? await page.context().newCDPSession(page) : null;
  if (cdp) {
    await cdp.send('Profiler.enable');
    await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
    await cdp.send('Profiler.start');
  }
  if (OPEN_TRACE) await page.context().browser()!.startTracing(page, { categories: FIRST_MOVE_CATEGORIES });
  const t0 = await now(page);
  // The discard question is answered yes in the page, as a user's instant click would: through Playwright's dialog
  // event the answer takes a round trip to the driver (20–50 ms), all inside the task that asked.
  await page.evaluate(`(() => {
    window.__confirmed = window.confirm;
    window.confirm = () => true;
    performance.mark('bench-open');
    const input = document.querySelector('[data-testid="open-project"]');
    const d = new DataTransfer();
    d.items.add(window.__docFile);
    input.files = d.files;
    input.dispatchEvent(new Event('change', { bubbles: true }));
  })()`);
  const last = section.horizons[section.horizons.length - 1].name;
  await page.getByLabel(`Show ${last}`, { exact: true }).waitFor({ timeout: 120_000 });
  await page.getByTestId('strip-detachment-depth').filter({ hasText: /^[\d,]+ m$/ }).waitFor({ timeout: 120_000 });
  await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 120_000 });
  const ms = (await now(page)) - t0;
  // Work the app defers until after the first drawing (the sensitivity sweeps) still belongs to the open: the
  // longest task is read once the sweeps are shown (or after 20 s without them).
  await page.getByTestId('sensitivity-amplification').waitFor({ state: 'attached', timeout: 20_000 }).catch(() => undefined);
  const longest = await longestSince(page, t0);
  await page.evaluate('window.confirm = window.__confirmed');
  if (OPEN_TRACE) await saveOpenTrace(page, `open-12x${vertices}`, `open 12 × ${vertices}: ${ms.toFixed(1)} ms, longest task ${longest.toFixed(0)} ms`);
  if (cdp && PROFILE) {
    const { profile } = (await cdp.send('Profiler.stop')) as { profile: CpuProfile };
    await cdp.detach();
    const { writeFileSync, mkdirSync } = await import('node:fs');
    mkdirSync(PROFILE, { recursive: true });
    writeFileSync(`${PROFILE}/open-12x${vertices}.cpuprofile`, JSON.stringify(profile));
    console.log(`  open 12 × ${vertices}: longest task ${longest.toFixed(0)} ms`);
    console.log(`    the longest stretch of main-thread work without an idle sample:`);
    printProfile(longestBusyStretch(profile), 1);
  }
  const names = (await page.evaluate('[...document.querySelectorAll("[data-testid^=horizon-show-]")].map((b) => b.getAttribute("aria-label"))')) as string[];
  check(names.length === section.horizons.length && section.horizons.every((h) => names.includes(`Show ${h.name}`)),
    `the section file of 12 × ${vertices} vertices did not open (horizons shown: ${names.join(', ').slice(0, 200)})`);
  // Where the app put the top regional: the same document and fitted view it builds (projectActions.fitViewToDoc).
  const doc = sectionToProjectDoc(section);
  const view = await page.getByTestId('section-view').evaluate((el) => ({ w: el.clientWidth, h: el.clientHeight }));
  const box = (await page.getByTestId('section-view').boundingBox())!;
  let [u0, v0, u1, v1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const h of doc.horizons) {
    for (const [u, v] of h.pointsPx) {
      u0 = Math.min(u0, u);
      v0 = Math.min(v0, v);
      u1 = Math.max(u1, u);
      v1 = Math.max(v1, v);
    }
  }
  const cam = fitCamera(u1 - u0 + 1, v1 - v0 + 1, view.w, view.h, 48);
  const reg = doc.scenarios[0].regionals[doc.horizons[0].id];
  const u = (reg[0][0] + reg[reg.length - 1][0]) / 2;
  const v = reg[0][1] + ((reg[reg.length - 1][1] - reg[0][1]) * (u - reg[0][0])) / (reg[reg.length - 1][0] - reg[0][0]);
  return { ms, longest, floor, grip: { gx: box.x + cam.x + (u - u0) * cam.scale, gy: box.y + cam.y + (v - v0) * cam.scale } };
}

/** Drags the top regional (with Shift: every regional) one pixel a move, waiting for the numbers after each move. */
async function waitedDrag(page: Page, grip: Grip, shift: boolean, moves: number, vertices: number): Promise<{ first: number; firstDrawn: number; firstLongest: number; toFrame: number[]; drawn: number[]; changed: number; upAt: number }> {
  await page.mouse.move(grip.gx, grip.gy);
  if (shift) await page.keyboard.down('Shift');
  await page.mouse.down();
  let y = grip.gy;
  const toFrame: number[] = [];
  const drawn: number[] = [];
  let first = 0;
  let firstDrawn = 0;
  let firstLongest = 0;
  for (let k = 0; k < moves; k++) {
    // Up and down 6 px at a time, one pixel per move, so the regionals stay near where they were.
    y += Math.floor(k / 6) % 2 === 0 ? -1 : 1;
    const t = await now(page);
    // The first move may wait for a busy page (a big document just opened); later ones get 2 s.
    await page.evaluate(`window.__arm(${k === 0 ? 20_000 : 2000})`);
    const cdp = PROFILE && k === 0 ? await page.context().newCDPSession(page) : null;
    if (cdp) {
      await cdp.send('Profiler.enable');
      await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
      await cdp.send('Profiler.start');
    }
    // The second move is traced too, to set beside the first.
    const traced = FIRST_MOVE_TRACE && k <= 1;
    if (traced) await page.context().browser()!.startTracing(page, { categories: DRAG_INVALIDATIONS ? [...FIRST_MOVE_CATEGORIES, INVALIDATION_CATEGORY] : FIRST_MOVE_CATEGORIES });
    await page.mouse.move(grip.gx, y);
    const r = (await page.evaluate('window.__drag.done.then(() => ({ t0: window.__drag.t0, t1: window.__drag.t1, t2: window.__drag.t2, t3: window.__drag.t3 }))')) as { t0: number; t1: number; t2: number; t3: number };
    if (traced) {
      const trace = await page.context().browser()!.stopTracing();
      const { writeFileSync, mkdirSync } = await import('node:fs');
      mkdirSync(FIRST_MOVE_TRACE, { recursive: true });
      const name = `${k === 0 ? 'first' : 'second'}-move-12x${vertices}${shift ? '-shift' : ''}`;
      writeFileSync(`${FIRST_MOVE_TRACE}/${name}.trace.json`, trace);
      console.log(`  ${k === 0 ? 'first' : 'second'} move${shift ? ' (Shift)' : ''} 12 × ${vertices}: ${(r.t2 - r.t0).toFixed(1)} ms to its frame, ${(r.t3 - r.t0).toFixed(1)} ms to the frame drawn (${name}.trace.json)`);
      printMoveTrace(JSON.parse(trace.toString()) as { traceEvents: TraceEvent[] });
    }
    if (cdp && PROFILE) {
      const { profile } = (await cdp.send('Profiler.stop')) as { profile: CpuProfile };
      await cdp.detach();
      const { writeFileSync, mkdirSync } = await import('node:fs');
      mkdirSync(PROFILE, { recursive: true });
      const name = `first-move${shift ? '-shift' : ''}-${Math.round(grip.gx)}x${Math.round(grip.gy)}-${Math.round(performance.now())}`;
      writeFileSync(`${PROFILE}/${name}.cpuprofile`, JSON.stringify(profile));
      console.log(`  first move${shift ? ' (Shift)' : ''}: ${(r.t2 - r.t0).toFixed(1)} ms (${name})`);
      printProfile(profile, 1);
    }
    if (r.t0 && r.t1) toFrame.push(r.t2 - r.t0);
    if (k > 0 && r.t0 && r.t1 && r.t3) drawn.push(r.t3 - r.t0);
    if (k === 0) {
      check(r.t1 && r.t3, 'the first move of the regional drag did not change the detachment depth in the strip');
      first = r.t2 - r.t0;
      firstDrawn = r.t3 - r.t0;
      firstLongest = await longestSince(page, t);
    }
  }
  await page.mouse.up();
  const upAt = await now(page);
  if (shift) await page.keyboard.up('Shift');
  check(toFrame.length >= moves / 2, `only ${toFrame.length} of ${moves} moves changed the detachment depth`);
  return { first, firstDrawn, firstLongest, toFrame, drawn, changed: toFrame.length, upAt };
}

interface ProfileNode { id: number; callFrame: { functionName: string; url: string; lineNumber: number }; children?: number[] }
interface CpuProfile { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[]; startTime: number; endTime: number }

interface TraceEvent { name: string; ph: string; ts?: number; dur?: number; tdur?: number; tid: number; pid: number; args?: { name?: string; data?: { type?: string; functionName?: string } } }

/** Prints the time of each kind of trace event (ms a move) on the renderer's main thread and on every other thread, by thread name. */
function printTrace(trace: { traceEvents: TraceEvent[] }, moves: number): void {
  const threads = new Map<string, string>();
  for (const e of trace.traceEvents) if (e.ph === 'M' && e.name === 'thread_name') threads.set(`${e.pid}:${e.tid}`, e.args?.name ?? '');
  const sums = new Map<string, number>();
  for (const e of trace.traceEvents) {
    if (e.ph !== 'X' || !e.dur) continue;
    const k = `${threads.get(`${e.pid}:${e.tid}`) ?? '?'} ${e.name}`;
    sums.set(k, (sums.get(k) ?? 0) + e.dur / 1000);
  }
  console.log('    trace: ms a move by thread and event (nested events counted in each):');
  for (const [k, ms] of [...sums].sort((a, b) => b[1] - a[1]).slice(0, 30)) console.log(`      ${(ms / moves).toFixed(2).padStart(7)}  ${k}`);
}

const FIRST_MOVE_CATEGORIES = ['devtools.timeline', 'disabled-by-default-devtools.timeline', 'blink.user_timing', 'v8', 'v8.execute', 'disabled-by-default-v8.gc', 'toplevel', 'blink'];

/**
 * Prints the renderer main thread's time in a trace of one move, from the pointermove the probe marked to the end of
 * the frame after the numbers changed: each task, and the time of each kind of event of its own (without the events in it),
 * JavaScript by the function the trace names.
 */
function printMoveTrace(trace: { traceEvents: TraceEvent[] }): void {
  const main = trace.traceEvents.find((e) => e.ph === 'M' && e.name === 'thread_name' && e.args?.name === 'CrRendererMain' &&
    trace.traceEvents.some((m) => m.pid === e.pid && m.name === 'bench-move'));
  check(main, 'the trace of the first move has no main thread with the move mark');
  const on = trace.traceEvents.filter((e) => e.pid === main.pid && e.tid === main.tid);
  const from = on.find((e) => e.name === 'bench-move')?.ts;
  const to = on.find((e) => e.name === 'bench-move-drawn')?.ts;
  check(from !== undefined && to !== undefined, 'the trace of the first move lacks its marks');
  const { tasks, self } = mainThreadBetween(on, from, to);
  console.log(`    main thread from the move to the end of the frame after the numbers (${((to - from) / 1000).toFixed(1)} ms): tasks (ms) ${tasks.map((t) => `${t.ms.toFixed(1)} ${t.key}`).join(', ')}`);
  console.log('    time of its own by event (ms):');
  printSelf(self, 24);
  // With --drag-invalidations: what asked for style, layout and paint again in that window, by node, reason and the
  // script frame that did it.
  const why = new Map<string, number>();
  for (const e of on) {
    if (!e.name.endsWith('InvalidationTracking') || e.ts === undefined || e.ts < from || e.ts > to) continue;
    const d = (e.args as { data?: { nodeName?: string; reason?: string; stackTrace?: { functionName?: string; url?: string; lineNumber?: number }[] } } | undefined)?.data;
    const f = d?.stackTrace?.[0];
    const at = f ? `${f.functionName || '(anonymous)'} ${(f.url ?? '').split('/').pop()}:${(f.lineNumber ?? 0) + 1}` : '(no stack)';
    const k = `${e.name.replace('InvalidationTracking', '')}: ${d?.nodeName ?? '?'} — ${d?.reason ?? '?'} ← ${at}`;
    why.set(k, (why.get(k) ?? 0) + 1);
  }
  if (why.size) console.log('    invalidations (kind: node — reason ← script):');
  for (const [k, n] of [...why].sort((a, b) => b[1] - a[1]).slice(0, 30)) console.log(`      ${String(n).padStart(5)}  ${k}`);
}

/** The main thread's tasks between two trace times (µs), and each event's time of its own (ms), overall and per task. */
function mainThreadBetween(on: TraceEvent[], from: number, to: number): { tasks: { ms: number; at: number; key: string; self: Map<string, number> }[]; self: Map<string, number> } {
  const spans = on.filter((e) => e.ph === 'X' && e.dur && e.ts! + e.dur > from && e.ts! < to).sort((a, b) => a.ts! - b.ts! || b.dur! - a.dur!);
  const self = new Map<string, number>();
  const stack: { end: number; key: string }[] = [];
  const tasks: { ms: number; at: number; key: string; self: Map<string, number> }[] = [];
  const keyOf = (e: TraceEvent) => (e.name === 'FunctionCall' || e.name === 'EvaluateScript' || e.name === 'V8.Execute') && e.args?.data?.functionName ? `${e.name} ${e.args.data.functionName}` : e.name;
  const add = (m: Map<string, number>, k: string, ms: number) => m.set(k, (m.get(k) ?? 0) + ms);
  for (const e of spans) {
    while (stack.length && stack[stack.length - 1].end <= e.ts!) stack.pop();
    const key = keyOf(e);
    if (stack.length === 0) tasks.push({ ms: e.dur! / 1000, at: (e.ts! - from) / 1000, key, self: new Map() });
    else {
      add(self, stack[stack.length - 1].key, -e.dur! / 1000);
      add(tasks[tasks.length - 1].self, stack[stack.length - 1].key, -e.dur! / 1000);
    }
    add(self, key, e.dur! / 1000);
    add(tasks[tasks.length - 1].self, key, e.dur! / 1000);
    stack.push({ end: e.ts! + e.dur!, key });
  }
  return { tasks, self };
}

function printSelf(self: Map<string, number>, k: number, indent = '      '): void {
  for (const [key, ms] of [...self].sort((a, b) => b[1] - a[1]).slice(0, k)) console.log(`${indent}${ms.toFixed(2).padStart(7)}  ${key}`);
}

/**
 * Prints a trace of an open (--open-trace) between the page's marks `bench-open` and `bench-open-done`: the main
 * thread's busy time, its longest tasks with what each spent its own time in, and the whole open's time by event.
 */
function printOpenTrace(trace: { traceEvents: TraceEvent[] }): void {
  const main = trace.traceEvents.find((e) => e.ph === 'M' && e.name === 'thread_name' && e.args?.name === 'CrRendererMain' &&
    trace.traceEvents.some((m) => m.pid === e.pid && m.name === 'bench-open'));
  check(main, 'the trace of the open has no main thread with the open mark');
  const on = trace.traceEvents.filter((e) => e.pid === main.pid && e.tid === main.tid);
  const from = on.find((e) => e.name === 'bench-open')?.ts;
  const to = on.find((e) => e.name === 'bench-open-done')?.ts;
  check(from !== undefined && to !== undefined, 'the trace of the open lacks its marks');
  const { tasks, self } = mainThreadBetween(on, from, to);
  const busy = tasks.reduce((a, t) => a + t.ms, 0);
  console.log(`    main thread over the open (${((to - from) / 1000).toFixed(1)} ms): ${tasks.length} tasks, busy ${busy.toFixed(1)} ms; the longest (ms at ms after the start):`);
  for (const t of [...tasks].sort((a, b) => b.ms - a.ms).slice(0, 6)) {
    console.log(`      ${t.ms.toFixed(1).padStart(7)} at ${t.at.toFixed(0).padStart(5)}  ${t.key}; of its own:`);
    printSelf(t.self, 10, '          ');
  }
  console.log('    the whole open, time of its own by event (ms):');
  printSelf(self, 24);
}

/** Marks the open's end in the page, stops the trace begun before it, writes it to --open-trace and prints it. */
async function saveOpenTrace(page: Page, name: string, title: string): Promise<void> {
  await page.evaluate("performance.mark('bench-open-done')");
  const trace = await page.context().browser()!.stopTracing();
  const { writeFileSync, mkdirSync } = await import('node:fs');
  mkdirSync(OPEN_TRACE!, { recursive: true });
  writeFileSync(`${OPEN_TRACE}/${name}.trace.json`, trace);
  console.log(`  ${title} (${name}.trace.json)`);
  printOpenTrace(JSON.parse(trace.toString()) as { traceEvents: TraceEvent[] });
}

/** The profile cut to its longest run of samples with no idle one between them (about the longest task). */
function longestBusyStretch(profile: CpuProfile): CpuProfile {
  const idle = new Set(profile.nodes.filter((n) => n.callFrame.functionName === '(idle)').map((n) => n.id));
  let best = [0, 0];
  let from = 0;
  let ms = 0;
  let bestMs = 0;
  for (let i = 0; i <= profile.samples.length; i++) {
    if (i === profile.samples.length || idle.has(profile.samples[i])) {
      if (ms > bestMs) [best, bestMs] = [[from, i], ms];
      from = i + 1;
      ms = 0;
    } else ms += (profile.timeDeltas[i + 1] ?? 0) / 1000;
  }
  return { ...profile, samples: profile.samples.slice(best[0], best[1]), timeDeltas: profile.timeDeltas.slice(best[0], best[1] + 1), endTime: profile.startTime + bestMs * 1000 };
}

/** Prints where a CPU profile's time went: the functions with most time of their own, and most time with their callees. */
function printProfile(profile: CpuProfile, moves: number): void {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const parent = new Map<number, number>();
  for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const label = (n: ProfileNode) => {
    const file = n.callFrame.url.split('/').pop() || '';
    return `${n.callFrame.functionName || '(anonymous)'} ${file}${file ? `:${n.callFrame.lineNumber + 1}` : ''}`;
  };
  const self = new Map<string, number>();
  const total = new Map<string, number>();
  for (let i = 0; i < profile.samples.length; i++) {
    const dt = (profile.timeDeltas[i + 1] ?? 0) / 1000;
    let node = byId.get(profile.samples[i]);
    if (!node) continue;
    self.set(label(node), (self.get(label(node)) ?? 0) + dt);
    const seen = new Set<string>();
    for (let id: number | undefined = node.id; id !== undefined; id = parent.get(id)) {
      node = byId.get(id)!;
      const l = label(node);
      if (seen.has(l)) continue;
      seen.add(l);
      total.set(l, (total.get(l) ?? 0) + dt);
    }
  }
  const top = (m: Map<string, number>, k: number) => [...m].sort((a, b) => b[1] - a[1]).slice(0, k);
  const span = (profile.endTime - profile.startTime) / 1000;
  console.log(`    profile: ${span.toFixed(0)} ms over ${moves} move(s); ms a move of its own (self) and with callees (total):`);
  for (const [l, ms] of top(self, 14)) console.log(`      self  ${(ms / moves).toFixed(2).padStart(6)}  ${l}`);
  for (const [l, ms] of top(total, 30)) console.log(`      total ${(ms / moves).toFixed(2).padStart(6)}  ${l}`);
}

/**
 * A continuous drag: after the press, `moves` pointer moves generated in the page on a 60-a-second clock (one per
 * 16.7 ms, as a mouse reports while held), each timed from its dispatch to the end of its handling (the task and its
 * microtasks, where React commits) and to the next frame after it; frame intervals meanwhile. A move is dropped when
 * it was handled after the next move's time on the clock (that move, and the screen, had to wait). With `pressed`
 * false the same moves pass over the view with no button held: the floor of the page's own event handling.
 */
interface Continuous { handle: number[]; toFrame: number[]; frames: number[]; dropped: number; movesPerSecond: number; longest: number; canvases?: StageCanvases }
async function continuousDrag(page: Page, grip: Grip, moves: number, tag: string, pressed = true, options: { canvases?: boolean } = {}): Promise<Continuous> {
  await page.mouse.move(grip.gx, grip.gy);
  if (pressed) await page.mouse.down();
  // A few real moves first: the drag has begun (its first move is its own row).
  for (let k = 1; k <= 3; k++) await page.mouse.move(grip.gx, grip.gy - k);
  const t0 = await now(page);
  const cdp = PROFILE && pressed ? await page.context().newCDPSession(page) : null;
  if (cdp) {
    await page.context().browser()!.startTracing(page, { categories: ['devtools.timeline', 'disabled-by-default-devtools.timeline', 'v8.execute', 'blink', 'cc', 'gpu', 'viz', 'toplevel'] });
    await cdp.send('Profiler.enable');
    await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
    await cdp.send('Profiler.start');
  }
  const traced = DRAG_TRACE && pressed && !cdp;
  if (traced) await page.context().browser()!.startTracing(page, { categories: DRAG_INVALIDATIONS ? [...DRAG_TRACE_CATEGORIES, INVALIDATION_CATEGORY] : DRAG_TRACE_CATEGORIES });
  const got = (await page.evaluate(`new Promise((resolve) => {
    const target = document.querySelector('[data-testid="section-view"]');
    const x = ${grip.gx}; let y = ${grip.gy - 3};
    const handle = []; const toFrame = []; const frames = []; let recording = true; let k = 0; let dropped = 0;
    const tick = (t) => { frames.push(t); if (recording) requestAnimationFrame(tick); };
    requestAnimationFrame(tick);
    const start = performance.now();
    const step = () => {
      y += Math.floor(k / 6) % 2 === 0 ? 1 : -1;
      const t = performance.now();
      target.dispatchEvent(new PointerEvent('pointermove', { clientX: x, clientY: y, bubbles: true, pointerId: 1, pointerType: 'mouse', isPrimary: true, buttons: ${pressed ? 1 : 0} }));
      requestAnimationFrame(() => toFrame.push(performance.now() - t));
      setTimeout(() => {
        const end = performance.now();
        handle.push(end - t);
        k++;
        if (end > start + k * ${FRAME_MS}) dropped++;
        if (k < ${moves}) setTimeout(step, Math.max(0, start + k * ${FRAME_MS} - performance.now()));
        else requestAnimationFrame(() => { recording = false; resolve({ handle, toFrame, dropped, frames: frames.slice(1).map((f, i) => f - frames[i]), seconds: (end - start) / 1000 }); });
      }, 0);
    };
    step();
  })`)) as { handle: number[]; toFrame: number[]; dropped: number; frames: number[]; seconds: number };
  if (cdp && PROFILE) {
    const { profile } = (await cdp.send('Profiler.stop')) as { profile: CpuProfile };
    await cdp.detach();
    const trace = await page.context().browser()!.stopTracing();
    const { writeFileSync, mkdirSync } = await import('node:fs');
    mkdirSync(PROFILE, { recursive: true });
    writeFileSync(`${PROFILE}/drag-12x${tag}.trace.json`, trace);
    printTrace(JSON.parse(trace.toString()) as { traceEvents: TraceEvent[] }, moves);
    writeFileSync(`${PROFILE}/drag-12x${tag}.cpuprofile`, JSON.stringify(profile));
    printProfile(profile, moves);
  }
  if (traced) {
    const trace = await page.context().browser()!.stopTracing();
    const { writeFileSync, mkdirSync } = await import('node:fs');
    mkdirSync(DRAG_TRACE, { recursive: true });
    writeFileSync(`${DRAG_TRACE}/drag-12x${tag}.trace.json`, trace);
    printDragTrace(JSON.parse(trace.toString()) as { traceEvents: DragTraceEvent[] }, moves);
  }
  // Still held: what the section view's canvases hold, and which of them a move redraws, for the canvas floor.
  const canvases = pressed && options.canvases ? ((await page.evaluate(stageCanvases(grip.gx, grip.gy - 3))) as StageCanvases) : undefined;
  if (pressed) await page.mouse.up();
  check(got.frames.length > 10 && got.handle.length === moves && got.toFrame.length === moves, 'the continuous drag drew nothing');
  return {
    handle: got.handle, toFrame: got.toFrame, frames: got.frames, dropped: got.dropped,
    movesPerSecond: moves / got.seconds, longest: await longestSince(page, t0), canvases,
  };
}

/** The section view's canvases during a drag: the view's place and size, and each Konva layer's bitmap and whether a move redrew it. */
interface StageCanvases { x: number; y: number; width: number; height: number; ratio: number; layers: { name: string; url: string; live: boolean }[] }
// One more move of the drag in progress (to page point x, y), noting which layers draw for it (Konva's draw event), then
// each layer's bitmap.
const stageCanvases = (x: number, y: number) => `new Promise((resolve) => {
  const stage = window.Konva.stages[0];
  const view = document.querySelector('[data-testid="section-view"]');
  const box = view.getBoundingClientRect();
  const layers = stage.getLayers();
  const drew = new Set();
  layers.forEach((l, i) => l.on('draw.canvasFloor', () => drew.add(i)));
  view.dispatchEvent(new PointerEvent('pointermove', { clientX: ${x}, clientY: ${y}, bubbles: true, pointerId: 1, pointerType: 'mouse', isPrimary: true, buttons: 1 }));
  requestAnimationFrame(() => requestAnimationFrame(() => {
    layers.forEach((l) => l.off('draw.canvasFloor'));
    resolve({ x: box.x, y: box.y, width: stage.width(), height: stage.height(), ratio: window.devicePixelRatio || 1,
      layers: layers.map((l, i) => ({ name: l.name() || '(unnamed)', url: l.getCanvas()._canvas.toDataURL(), live: drew.has(i) })) });
  }));
})`;

/**
 * The browser's floor for the section view's canvas work during a drag: a bare page (nothing else on it) with the same
 * number of canvases, of the same size and place, showing what the app's showed; each pointer move puts back the
 * bitmap of every canvas the app redrew for a move, moved a pixel (one clear and one drawImage each: the least
 * drawing a move can do), and the same clock and timing as the app's continuous drag measure it.
 */
async function canvasFloor(page: Page, canvases: StageCanvases, tag: string): Promise<Continuous> {
  const bare = await page.context().browser()!.newPage({ viewport: page.viewportSize()! });
  try {
    await bare.setContent('<!doctype html><body style="margin:0;background:#e8ebee"></body>');
    await bare.evaluate(LONG_TASKS);
    await bare.evaluate(`(async (c) => {
      const view = document.createElement('div');
      view.dataset.testid = 'section-view';
      Object.assign(view.style, { position: 'absolute', left: c.x + 'px', top: c.y + 'px', width: c.width + 'px', height: c.height + 'px', overflow: 'hidden' });
      document.body.append(view);
      const live = [];
      for (const l of c.layers) {
        const canvas = document.createElement('canvas');
        canvas.width = Math.round(c.width * c.ratio);
        canvas.height = Math.round(c.height * c.ratio);
        Object.assign(canvas.style, { position: 'absolute', top: '0', left: '0', width: c.width + 'px', height: c.height + 'px' });
        view.append(canvas);
        const bitmap = await createImageBitmap(await (await fetch(l.url)).blob());
        const ctx = canvas.getContext('2d');
        ctx.drawImage(bitmap, 0, 0);
        if (l.live) live.push({ ctx, bitmap });
      }
      view.addEventListener('pointermove', (e) => {
        const dy = e.clientY % 2;
        for (const { ctx, bitmap } of live) {
          ctx.clearRect(0, 0, ctx.canvas.width, ctx.canvas.height);
          ctx.drawImage(bitmap, 0, dy);
        }
      });
    })(${JSON.stringify(canvases)})`);
    const grip = { gx: canvases.x + canvases.width / 2, gy: canvases.y + canvases.height / 2 };
    return await continuousDrag(bare, grip, 120, `${tag}-canvas-floor`);
  } finally {
    await bare.close();
  }
}

async function bigDocuments(page: Page, label: string): Promise<void> {
  await page.evaluate(DRAG_PROBE);
  for (const vertices of VERTICES) {
    const section = bigSection(vertices);
    const n = section.horizons[0].line.length;
    const tag = `12 × ${n.toLocaleString('en')}`;
    const open: number[] = [];
    const openLongest: number[] = [];
    const openFloor: number[] = [];
    const first: number[] = [];
    const firstDrawn: number[] = [];
    const laterDrawn: number[] = [];
    const firstLongest: number[] = [];
    const plain: number[] = [];
    const shifted: number[] = [];
    const autosave: number[] = [];
    let grip: Grip | null = null;
    for (let run = 0; run < RUNS; run++) {
      const o = await openBigSection(page, section, vertices);
      open.push(o.ms);
      openLongest.push(o.longest);
      openFloor.push(o.floor);
      grip = o.grip;
      await page.getByTestId('tool-regional').click();
      const d = await waitedDrag(page, o.grip, false, 24, vertices);
      first.push(d.first);
      firstDrawn.push(d.firstDrawn);
      laterDrawn.push(median(d.drawn));
      firstLongest.push(d.firstLongest);
      plain.push(median(d.toFrame.slice(1)));
      // The autosave write follows the edit after its delay: its longest task, within 3 s of the release.
      await page.waitForFunction('document.querySelector("[data-testid=autosave-status]")?.textContent?.length > 0', null, { timeout: 30_000 });
      await new Promise((r) => setTimeout(r, 3000));
      autosave.push(await longestSince(page, d.upAt));
      const s = await waitedDrag(page, o.grip, true, 24, vertices);
      shifted.push(median(s.toFrame.slice(1)));
      await page.keyboard.press('Control+z');
      await page.keyboard.press('Control+z');
    }
    report({ work: `open section file ${tag}`, ms: median(open), floor: median(openFloor), longest: median(openLongest), note: 'floor: read + JSON.parse of the file in the page' });
    report({ work: `open section file ${tag}, longest task`, ms: median(openLongest), floor: FRAME_MS, note: 'target: no task over 100 ms' });
    report({ work: `first move of a regional drag ${tag}`, ms: median(first), floor: FRAME_MS, longest: median(firstLongest), note: 'event → the frame that shows it (its animation-frame callbacks)' });
    report({
      work: `first move of a regional drag ${tag}, frame drawn`, ms: median(firstDrawn), floor: median(laterDrawn),
      note: 'event → the end of that frame on the main thread (its layout, paint and commit); floor: the same drag\'s later moves by the same measure',
    });
    report({ work: `regional drag ${tag}, per move (event → frame)`, ms: median(plain), floor: FRAME_MS });
    report({ work: `Shift-drag every regional ${tag}, per move`, ms: median(shifted), floor: FRAME_MS });
    report({ work: `autosave after an edit ${tag}, longest task`, ms: median(autosave), floor: FRAME_MS, note: 'target: no task over 100 ms (0: none over 50 ms); includes the release\'s analysis' });
    if (!WITH_CONTINUOUS) {
      await page.keyboard.press('Control+z');
      continue;
    }
    // The floor first: the same moves over the view with no button held (the page's own handling of a move).
    const idle = await continuousDrag(page, grip!, 120, String(vertices), false);
    const changesBefore = (await page.evaluate('window.__textChanges || 0')) as number;
    const c = await continuousDrag(page, grip!, 120, String(vertices), true, { canvases: WITH_CANVAS_FLOOR });
    // The strip must have followed the drag (DRAG_PROBE counts its text changes): a drag that moved nothing measures nothing.
    const changes = ((await page.evaluate('window.__textChanges || 0')) as number) - changesBefore;
    check(changes >= 60, `the continuous drag changed the strip ${changes} times in 120 moves`);
    report({ work: `continuous drag ${tag}: moves handled a second`, ms: c.movesPerSecond, floor: 60, unit: '/s', note: `of 60 sent; ${c.dropped} of ${c.handle.length} moves dropped (handled after the next move was due)` });
    report({
      work: `continuous drag ${tag}: per move, median`, ms: median(c.handle), floor: median(idle.handle), longest: c.longest,
      note: `p95 ${percentile(c.handle, 0.95).toFixed(1)} ms (floor's p95 ${percentile(idle.handle, 0.95).toFixed(1)}); target ≤ ${FRAME_MS.toFixed(1)} ms each`,
    });
    report({ work: `continuous drag ${tag}: event → next frame`, ms: median(c.toFrame), floor: median(idle.toFrame), note: `p95 ${percentile(c.toFrame, 0.95).toFixed(1)} ms (floor's p95 ${percentile(idle.toFrame, 0.95).toFixed(1)})` });
    report({ work: `continuous drag ${tag}: frame interval`, ms: median(c.frames), floor: median(idle.frames), note: `p95 ${percentile(c.frames, 0.95).toFixed(1)} ms` });
    if (c.canvases) {
      const f = await canvasFloor(page, c.canvases, String(vertices));
      const live = c.canvases.layers.filter((l) => l.live).map((l) => l.name);
      const what = `${c.canvases.layers.length} canvases of ${c.canvases.width} × ${c.canvases.height} px (pixel ratio ${c.canvases.ratio}), ${live.length} redrawn a move (${live.join(', ')})`;
      report({
        work: `continuous drag ${tag}: per move against its canvases`, ms: median(c.handle), floor: median(f.handle),
        note: `floor: a bare page with ${what}, each put back with one drawImage a move; the floor's p95 ${percentile(f.handle, 0.95).toFixed(1)} ms, ${f.movesPerSecond.toFixed(1)} moves handled a second, ${f.dropped} of ${f.handle.length} dropped`,
      });
      report({ work: `continuous drag ${tag}: frame interval against its canvases`, ms: median(c.frames), floor: median(f.frames), note: `p95 ${percentile(c.frames, 0.95).toFixed(1)} ms (the floor's ${percentile(f.frames, 0.95).toFixed(1)})` });
    }
    await page.keyboard.press('Control+z');
  }
  void label;
}

async function scans(page: Page): Promise<void> {
  const big = SCAN_MP.reduce((m, x) => Math.max(m, x), 0);
  const before = await rendererMemory(page);
  if (before) {
    report({
      work: 'renderer memory before any scan (the demo open)', ms: before.rss, floor: 0, unit: 'MB',
      note: `the page's renderer process (pid ${before.pid}): ${residentLine(before)} MB; the browser's other renderer processes (spare, interface) ${before.others.rss.toFixed(0)} MB`,
    });
  }
  let lastRgba = 0;
  let lastMp = 0;
  for (const mp of SCAN_MP) {
    const side = Math.round(Math.sqrt(mp * 1e6));
    const open: number[] = [];
    const openLongest: number[] = [];
    const reduced: number[] = [];
    const floor: number[] = [];
    const drawn: number[] = [];
    const exp = EXPORT_SIZES.map(() => ({ ms: [] as number[], longest: [] as number[], floor: [] as number[], heap: [] as number[], steps: [] as Map<string, number>[], bytes: [] as number[], floorBytes: [] as number[], floorDraw: [] as number[] }));
    await makeScan(page, side, `bench-${mp}mp.jpg`);
    // The heavy sizes once: a 100 MP scan takes seconds per step on a shared machine.
    const runs = mp >= 100 ? 1 : RUNS;
    for (let run = 0; run < runs; run++) {
      const name = `bench-${mp}mp-${run}.jpg`;
      await page.evaluate(`window.__scanFile = new File([window.__scanFile], ${JSON.stringify(name)}, { type: 'image/jpeg' })`);
      floor.push(await decodeFloor(page));
      drawn.push(await drawnFloor(page));
      const o = await openScan(page, name, run === 0 ? `${mp}mp` : undefined);
      open.push(o.ms);
      openLongest.push(o.longest);
      reduced.push(o.reduced);
      if (run === 0) {
        // Memory with this scan open (the previous one replaced): against its decoded RGBA size, in all and over the
        // renderer before any scan (the app itself).
        const rgba = (side * side * 4) / 1048576;
        lastRgba = rgba;
        lastMp = mp;
        const m = await rendererMemory(page);
        if (m) {
          const over = before ? `; over the app before any scan ${(m.rss - before.rss).toFixed(0)} MB = ${((m.rss - before.rss) / rgba).toFixed(2)}× (private ${((m.anon - before.anon) / rgba).toFixed(2)}×)` : '';
          report({
            work: `renderer memory with a ${mp} MP scan open`, ms: m.rss, floor: rgba, unit: 'MB',
            note: `the page's renderer process, resident; floor: its RGBA size; target ≤ 1.5× (${(1.5 * rgba).toFixed(0)} MB); ${residentLine(m)} MB; private = ${(m.anon / rgba).toFixed(2)}×${over}; with the browser's other renderer processes ${(m.rss + m.others.rss).toFixed(0)} MB = ${((m.rss + m.others.rss) / rgba).toFixed(2)}×`,
          });
          if (before) {
            // What holding the decoded scan cannot go under: the renderer as it was before any scan, plus the RGBA.
            const alloc = await rendererAllocators(page.context().browser()!, 2, m.pid).catch(() => null);
            report({ work: `  … against the app before any scan + its RGBA (${mp} MP)`, ms: m.rss, floor: before.rss + rgba, unit: 'MB', note: `floor: ${before.rss.toFixed(0)} + ${rgba.toFixed(0)} MB${alloc ? `; the page's renderer by allocator (MB): ${allocatorLine(alloc, 8)}` : ''}` });
          }
        }
        if (mp === big && m) await bareScanMemory(page, side, m.rss - (before?.rss ?? 0));
        if (mp === big && before) await replacedMemory(page, mp, rgba, before, name);
      }
      if (EXPORT_SIZES.length > 0 && run === 0) await figureForFloor(page);
      for (const [k, [id, w, h]] of EXPORT_SIZES.entries()) {
        const e = await exportPng(page, id, EXPORT_TRACE && run === 0 ? `export-${w}x${h}-${mp}mp` : undefined);
        exp[k].ms.push(e.ms);
        exp[k].longest.push(e.longest);
        exp[k].heap.push(e.heapPeak);
        exp[k].steps.push(e.steps);
        exp[k].bytes.push(e.bytes);
        const fl = await exportFloor(page, w, h);
        exp[k].floor.push(fl.ms);
        exp[k].floorBytes.push(fl.bytes);
        exp[k].floorDraw.push(fl.draw);
      }
    }
    report({ work: `open a ${mp} MP scan (${side} × ${side} JPEG)`, ms: median(open), floor: median(floor), longest: median(openLongest), note: `floor: createImageBitmap of the file; target ≤ 1.3×${runs < RUNS ? '; 1 run' : ''}` });
    report({ work: `  … against decode + one drawn frame (${mp} MP)`, ms: median(open), floor: median(drawn), longest: median(openLongest), note: `floor: createImageBitmap of the file, drawn fitted on one canvas of the view's size in the next frame, to a task after it (the decode alone ${median(floor).toFixed(1)} ms)` });
    report({ work: `  … and its reduced views made (${mp} MP)`, ms: median(reduced), floor: median(floor), longest: median(openLongest), note: 'after it is shown, in slices; the view zooms out smoothly from then' });
    for (const [k, [, w, h]] of EXPORT_SIZES.entries()) {
      const pixelMb = (w * h * 4) / 1048576;
      report({
        work: `export PNG ${w} × ${h} with a ${mp} MP scan`, ms: median(exp[k].ms), floor: median(exp[k].floor), longest: median(exp[k].longest),
        note: `in the app (its click handler → the file handed over) ${median(exp[k].steps.map((st) => st.get(APP_TIME) ?? 0)).toFixed(0)} ms = ${(median(exp[k].steps.map((st) => st.get(APP_TIME) ?? 0)) / median(exp[k].floor)).toFixed(2)}×; ${DRIVER_TIME} ${median(exp[k].steps.map((st) => st.get(DRIVER_TIME) ?? 0)).toFixed(0)} ms; heap peak +${(median(exp[k].heap) / 1048576).toFixed(1)} MB (target < 2 × ${pixelMb.toFixed(1)} MB pixels); PNG ${(median(exp[k].bytes) / 1e6).toFixed(2)} MB, the floor's ${(median(exp[k].floorBytes) / 1e6).toFixed(2)} MB (floor: draw ${median(exp[k].floorDraw).toFixed(0)} · encode ${(median(exp[k].floor) - median(exp[k].floorDraw)).toFixed(0)} ms)${runs < RUNS ? '; 1 run' : ''}; steps (ms): ${stepsNote(exp[k].steps)}`,
      });
    }
    if (mp === 1 || mp === big) {
      const fitted = await panFrames(page);
      const idle = await idleFrames(page, 60);
      report({ work: `pan over a ${mp} MP scan, fitted: frame`, ms: median(fitted), floor: median(idle), note: `p95 ${percentile(fitted, 0.95).toFixed(1)} ms` });
      await page.getByTestId('zoom-actual').click();
      const actual = await panFrames(page);
      report({ work: `pan over a ${mp} MP scan, 1:1: frame`, ms: median(actual), floor: median(idle), note: `p95 ${percentile(actual, 0.95).toFixed(1)} ms` });
    }
  }
  // At the end, after the exports and their floors: the floors decode the scan file again in this page
  // (createImageBitmap of the file, resized), which leaves Chromium's shared memory for image decoding behind
  // (about a third of the RGBA at 200 MP); the app's own release is the row measured before them (replacedMemory).
  await makeScan(page, 1000, 'bench-replacement-1mp-end.jpg');
  await openScan(page, 'bench-replacement-1mp-end.jpg');
  const after = await rendererMemory(page);
  if (after && before) {
    report({
      work: `  … replaced again after its exports and their floors`, ms: after.rss, floor: before.rss, unit: 'MB',
      note: `the page's renderer process, resident; floor: before any scan; ${residentLine(after)} MB (the floors' image decoding in this page, not the app's); ${lastMp} MP RGBA is ${lastRgba.toFixed(0)} MB`,
    });
  }
}

/**
 * The browser's floor for holding a decoded scan: a bare page of the same size (a new tab, so a renderer process of
 * its own) that makes the same file, decodes it with createImageBitmap and draws it fitted on a canvas the size of
 * the view, measured as the app's page is (its renderer process, resident, after a collection), against that page
 * before. `appMb` is what the app's page gained with the scan open.
 */
async function bareScanMemory(page: Page, side: number, appMb: number): Promise<void> {
  const bare = await page.context().browser()!.newPage({ viewport: page.viewportSize()! });
  try {
    await bare.setContent('<canvas id="view" style="display:block"></canvas>');
    await makeScan(bare, side, 'bare.jpg');
    const empty = await rendererMemory(bare);
    await bare.evaluate(`(async () => {
      const bitmap = await createImageBitmap(window.__scanFile);
      window.__scanFile = null;
      window.__bitmap = bitmap;
      const c = document.getElementById('view');
      c.width = innerWidth;
      c.height = innerHeight;
      const k = Math.min(c.width / bitmap.width, c.height / bitmap.height);
      c.getContext('2d').drawImage(bitmap, 0, 0, bitmap.width * k, bitmap.height * k);
      await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
    })()`);
    const held = await rendererMemory(bare);
    if (!empty || !held) return;
    const floorMb = held.rss - empty.rss;
    report({
      work: `  … what the scan added, against a bare page (${Math.round((side * side) / 1e6)} MP)`, ms: appMb, floor: floorMb, unit: 'MB',
      note: `floor: a bare page's renderer (pid ${held.pid}) decoding the same file and drawing it fitted, ${residentLine(empty)} MB before, ${residentLine(held)} MB after`,
    });
  } finally {
    await bare.close();
  }
}

/**
 * The scan `name` (mp MP, open now) replaced by a 1 MP one before anything else decodes it in this page: the page's
 * renderer against itself before any scan, then the scan opened again (from the same file) for the rows that follow.
 */
async function replacedMemory(page: Page, mp: number, rgba: number, before: ProcessMemory & { others: ProcessMemory }, name: string): Promise<void> {
  await page.evaluate('window.__heldScanFile = window.__scanFile');
  await makeScan(page, 1000, 'bench-replacement-1mp.jpg');
  await openScan(page, 'bench-replacement-1mp.jpg');
  const after = await rendererMemory(page);
  if (after) {
    report({
      work: `renderer memory after the ${mp} MP scan is replaced by 1 MP`, ms: after.rss, floor: before.rss, unit: 'MB',
      note: `the page's renderer process, resident; floor: before any scan; ${residentLine(after)} MB (before ${residentLine(before)}); with the browser's other renderer processes ${(after.rss + after.others.rss).toFixed(0)} MB (before ${(before.rss + before.others.rss).toFixed(0)}); ${mp} MP RGBA is ${rgba.toFixed(0)} MB`,
    });
  }
  const again = name.replace(/(\.jpg)$/, '-again$1');
  await page.evaluate(`window.__scanFile = new File([window.__heldScanFile], ${JSON.stringify(again)}, { type: 'image/jpeg' }); window.__heldScanFile = null`);
  await openScan(page, again);
}

// The preview line as the overlay draws it: each drawing sets a user-timing mark (canvas/OverlayLayer.tsx,
// PREVIEW_DRAWN_MARK) whose detail holds its point count, last point and whether a stand-in is still shown while
// tracing; a log of [time, points, tracing] of every drawing that differs from the one before is kept as
// window.__previewLog.
const WATCH_PREVIEW = `(() => {
  window.__previewLog = [];
  let last = '';
  window.__previewObserver = new PerformanceObserver((l) => {
    for (const e of l.getEntries()) {
      if (e.name !== 'foldroot-preview-drawn') continue;
      const sig = e.detail.points + ':' + e.detail.last.join(',') + ':' + e.detail.tracing;
      if (sig !== last) { last = sig; window.__previewLog.push([e.startTime, e.detail.points, e.detail.tracing]); }
    }
  });
  window.__previewObserver.observe({ type: 'mark' });
})()`;

/** Polls an expression in the page until it is true (the page's policy forbids waitForFunction's eval); times come from the page's own log. */
async function until(page: Page, expr: string, timeoutMs: number, what: string): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (!(await page.evaluate(expr))) {
    check(Date.now() < end, what);
    await new Promise((r) => setTimeout(r, 40));
  }
}

/**
 * Moves the pointer MOVES times to `at(k)`, each after the last move's full-resolution trace was drawn; returns, per
 * move, the time to the first redrawn preview and to the first one with no stand-in left (page ms from just before
 * the move), and from the page's receipt of the move (its pointermove) to that trace drawn. With --trace-profile the moves are recorded in a Chromium trace and the slowest are broken down.
 */
async function laterMoves(page: Page, at: (k: number) => { x: number; y: number }): Promise<{ first: number[]; traced: number[]; received: number[] }> {
  const first: number[] = [];
  const traced: number[] = [];
  const received: number[] = [];
  const browser = page.context().browser()!;
  // When the page received each move (its pointermove dispatched): what is left of move → traced is Chromium's own
  // delivery, which waits for the next frame.
  await page.evaluate(`window.addEventListener('pointermove', () => { window.__movedAt = performance.now(); }, true)`);
  const cdp = TRACE_PROFILE ? await page.context().newCDPSession(page) : null;
  if (cdp) {
    await cdp.send('Profiler.enable');
    await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
    await cdp.send('Profiler.start');
  }
  if (TRACE_PROFILE) await browser.startTracing(page, { categories: ['devtools.timeline', 'disabled-by-default-devtools.timeline', 'blink.user_timing', 'v8', 'v8.execute', 'disabled-by-default-v8.gc', 'toplevel', 'blink'] });
  for (let k = 0; k < MOVES; k++) {
    const p = at(k);
    const n = (await page.evaluate('window.__previewLog.length')) as number;
    const t = (await page.evaluate(`(performance.mark('bench-move', { detail: ${k} }), performance.now())`)) as number;
    await page.mouse.move(p.x, p.y);
    await until(page, `window.__previewLog.length > ${n}`, 60_000, 'a pointer move redrew no preview');
    await until(page, `window.__previewLog.slice(${n}).some((e) => !e[2])`, 60_000, 'a pointer move was never traced');
    const log = ((await page.evaluate(`window.__previewLog.slice(${n})`)) as [number, number, boolean][]);
    first.push(log[0][0] - t);
    traced.push(log.find((e) => !e[2])![0] - t);
    received.push(log.find((e) => !e[2])![0] - ((await page.evaluate('window.__movedAt')) as number));
  }
  if (TRACE_PROFILE && cdp) {
    const trace = await browser.stopTracing();
    const { profile } = (await cdp.send('Profiler.stop')) as { profile: CpuProfile };
    await cdp.detach();
    const { writeFileSync, mkdirSync } = await import('node:fs');
    mkdirSync(TRACE_PROFILE, { recursive: true });
    writeFileSync(`${TRACE_PROFILE}/trace-moves.json`, trace);
    writeFileSync(`${TRACE_PROFILE}/trace-moves.cpuprofile`, JSON.stringify(profile));
    printSlowMoves(JSON.parse(trace.toString()) as { traceEvents: TraceEvent[] }, traced);
    printProfile(profile, MOVES);
  }
  return { first, traced, received };
}

/** Prints, for the five slowest moves (move → traced), the longest events of each thread between the move and its trace drawn. */
function printSlowMoves(trace: { traceEvents: TraceEvent[] }, traced: number[]): void {
  const threads = new Map<string, string>();
  for (const e of trace.traceEvents) if (e.ph === 'M' && e.name === 'thread_name') threads.set(`${e.pid}:${e.tid}`, e.args?.name ?? '');
  const moves = trace.traceEvents.filter((e) => e.name === 'bench-move' && (e.ph === 'R' || e.ph === 'I' || e.ph === 'b' || e.ph === 'n')).sort((a, b) => (a.ts ?? 0) - (b.ts ?? 0));
  if (moves.length !== traced.length) {
    console.log(`    trace: ${moves.length} move marks for ${traced.length} moves; no breakdown`);
    return;
  }
  const slow = traced.map((ms, k) => ({ ms, k })).sort((a, b) => b.ms - a.ms).slice(0, 5);
  for (const { ms, k } of slow) {
    const t0 = moves[k].ts ?? 0;
    const t1 = t0 + ms * 1000;
    console.log(`    move ${k}: ${ms.toFixed(1)} ms to its trace; events over 0.5 ms (start after the move, +wall, (thread time), ms):`);
    const wrappers = new Set(['ThreadControllerImpl::RunTask', 'v8.callFunction', 'ThreadPool_RunTask', 'Receive mojo message', 'HandlePostMessage']);
    const seen = trace.traceEvents.filter((e) => e.ph === 'X' && !wrappers.has(e.name) && (e.dur ?? 0) > 500 && (e.ts ?? 0) < t1 && (e.ts ?? 0) + (e.dur ?? 0) > t0);
    for (const e of seen.sort((a, b) => (a.ts ?? 0) - (b.ts ?? 0)).slice(0, 40)) {
      const detail = e.args?.data?.type ?? e.args?.data?.functionName ?? '';
      const cpu = e.tdur === undefined ? '' : `(${(e.tdur / 1000).toFixed(1)})`;
      console.log(`      ${(((e.ts ?? 0) - t0) / 1000).toFixed(1).padStart(7)} +${((e.dur ?? 0) / 1000).toFixed(1).padStart(6)} ${cpu.padStart(7)}  ${(threads.get(`${e.pid}:${e.tid}`) ?? '?').padEnd(22)} ${e.name} ${detail}`);
    }
  }
}

async function tracing(page: Page): Promise<void> {
  const side = Math.round(Math.sqrt(TRACE_MP * 1e6));
  const name = `trace-${TRACE_MP}mp.jpg`;
  // A fresh project, then a scan with one drawn line to follow: paper tone and a gently waving ink line
  // (v = side / 2 + 40 sin(u / 300), 3 px wide) across the whole scan.
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await page.evaluate(`(async () => {
    const s = ${side};
    const c = new OffscreenCanvas(s, s);
    const ctx = c.getContext('2d');
    ctx.fillStyle = '#f1ead8';
    ctx.fillRect(0, 0, s, s);
    ctx.strokeStyle = '#2a2420';
    ctx.lineWidth = 3;
    ctx.beginPath();
    for (let u = 0; u <= s; u += 4) ctx.lineTo(u, s / 2 + 40 * Math.sin(u / 300));
    ctx.stroke();
    const blob = await c.convertToBlob({ type: 'image/jpeg', quality: 0.85 });
    window.__scanFile = new File([blob], ${JSON.stringify(name)}, { type: 'image/jpeg' });
  })()`);
  await openScan(page, name);
  await page.getByTestId('zoom-fit').click();
  const before = await rendererMb(page);
  const box = (await page.getByTestId('section-view').boundingBox())!;
  const cam = fitCamera(side, side, box.width, box.height);
  const toScreen = (u: number, v: number) => ({ x: box.x + cam.x + u * cam.scale, y: box.y + cam.y + v * cam.scale });
  // The line from u0 for 3,000 px.
  const lineV = (u: number) => side / 2 + 40 * Math.sin(u / 300);
  const u0 = Math.round(side / 10);
  const u1 = u0 + 3000;
  const v = lineV(u0);
  await page.getByTestId('tool-draw').click();
  const a = toScreen(u0, v);
  await page.mouse.move(a.x, a.y);
  await page.mouse.click(a.x, a.y);
  await page.evaluate(WATCH_PREVIEW);
  const b = toScreen(u1, lineV(u1));
  const t0 = await now(page);
  await page.mouse.move(b.x, b.y);
  // Wait until the preview follows the line (more than anchor and pointer), then until it has not changed for 3 s.
  await until(page, 'window.__previewLog.some((e) => e[1] > 2)', 120_000, 'no traced preview appeared');
  if (SHOTS) await page.screenshot({ path: `${SHOTS}/bench-trace-first-preview-${TRACE_MP}mp.png` });
  await until(page, 'performance.now() - window.__previewLog[window.__previewLog.length - 1][0] > 3000', 180_000, 'the preview never settled');
  if (SHOTS) await page.screenshot({ path: `${SHOTS}/bench-trace-full-preview-${TRACE_MP}mp.png` });
  const log = (await page.evaluate('window.__previewLog')) as [number, number][];
  const firstFollowing = log.find((e) => e[1] > 2)!;
  const settled = log[log.length - 1];
  report({ work: `trace preview, 3,000 px on a ${TRACE_MP} MP scan: first that follows`, ms: firstFollowing[0] - t0, floor: FRAME_MS, longest: await longestSince(page, t0), note: `${firstFollowing[1]} points; the rough search (window reduced to about 16,000 px, the darkest pixel of each block)` });
  report({ work: `trace preview, 3,000 px on a ${TRACE_MP} MP scan: full resolution`, ms: settled[0] - t0, floor: FRAME_MS, note: `${settled[1]} points; tiles and tree in the worker` });
  // Later pointer positions: 12.3 image px along the line each (under a screen pixel when fitted), back to the start
  // past 700 px so they stay in the window searched, waiting for the redrawn preview and then for the
  // full-resolution trace to that position.
  const later = await laterMoves(page, (k) => {
    const u = u1 + (((k + 1) * 12.3) % 700);
    return toScreen(u, lineV(u));
  });
  const load = loadavg().map((x) => x.toFixed(2)).join(' ');
  const most = (xs: number[]) => xs.reduce((m, x) => Math.max(m, x), 0).toFixed(1);
  const overFrame = (xs: number[]) => xs.filter((x) => x > FRAME_MS).length;
  report({ work: `trace preview, later pointer positions (${TRACE_MP} MP): redrawn`, ms: median(later.first), floor: FRAME_MS, note: `largest ${most(later.first)} ms of ${later.first.length}, ${overFrame(later.first)} over a frame; move → redrawn; load average ${load}` });
  report({ work: `trace preview, later pointer positions (${TRACE_MP} MP): traced`, ms: median(later.traced), floor: FRAME_MS, note: `largest ${most(later.traced)} ms of ${later.traced.length}, ${overFrame(later.traced)} over a frame; move → full trace to it drawn` });
  report({ work: `trace preview, later pointer positions (${TRACE_MP} MP): received → traced`, ms: median(later.received), floor: FRAME_MS, note: `largest ${most(later.received)} ms of ${later.received.length}, ${overFrame(later.received)} over a frame; pointermove dispatched → full trace drawn` });
  // Place the anchor, let a second pass (the user's hand moving on), then preview the next 3,000 px: the trees
  // around the new anchor were started when it was placed.
  const end = toScreen(u1, lineV(u1));
  await page.mouse.click(end.x, end.y);
  await new Promise((r) => setTimeout(r, 1000));
  const u2 = Math.min(side - 200, u1 + 3000);
  const next = toScreen(u2, lineV(u2));
  const n2 = (await page.evaluate('window.__previewLog.length')) as number;
  const t2 = await now(page);
  await page.mouse.move(next.x, next.y);
  await until(page, `window.__previewLog.slice(${n2}).some((e) => e[1] > 2)`, 120_000, 'no traced preview from the second anchor');
  await until(page, 'performance.now() - window.__previewLog[window.__previewLog.length - 1][0] > 3000', 180_000, 'the second preview never settled');
  const log2 = ((await page.evaluate('window.__previewLog')) as [number, number][]).slice(n2);
  const first2 = log2.find((e) => e[1] > 2)!;
  const settled2 = log2[log2.length - 1];
  report({ work: `trace preview from the next anchor, ${u2 - u1} px: first that follows`, ms: first2[0] - t2, floor: FRAME_MS, note: `${first2[1]} points; anchor placed 1 s before the move` });
  report({ work: `trace preview from the next anchor, ${u2 - u1} px: full resolution`, ms: settled2[0] - t2, floor: FRAME_MS, note: `${settled2[1]} points; its tree built ahead since the click` });
  await page.evaluate('window.__previewObserver.disconnect()');
  await page.mouse.click(next.x, next.y);
  await page.keyboard.press('Enter');
  await page.getByTestId('horizon-list').locator('li').first().waitFor();
  const after = await rendererMb(page);
  if (before !== null && after !== null) {
    report({ work: `renderer memory with a ${TRACE_MP} MP scan: before tracing`, ms: before, floor: (side * side * 4) / 1048576, unit: 'MB', note: 'floor: its RGBA size (the renderer before any scan is in the scan rows)' });
    report({ work: `renderer memory with a ${TRACE_MP} MP scan: after two traced stretches`, ms: after, floor: before, unit: 'MB', note: `tracing holds ${(after - before).toFixed(0)} MB (workers, tiles, trees)` });
  }
}

async function run(base: string, uncapped: boolean): Promise<void> {
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: uncapped ? [...ARGS, ...UNCAPPED] : ARGS });
  try {
    const fresh = async () => {
      const p = await browser.newPage({ viewport: { width: 1400, height: 900 }, acceptDownloads: true });
      // A big document keeps the page busy for seconds on a shared machine: actions wait that long before failing.
      p.setDefaultTimeout(120_000);
      // Opening a file over unsaved work asks first: the benchmark means to open it.
      p.on('dialog', (d) => void d.accept());
      await p.addInitScript(LONG_TASKS);
      await p.goto(base);
      await p.locator('[data-startup="done"]').waitFor({ timeout: 60_000 });
      return p;
    };
    let page = await fresh();
    console.log(`\n${uncapped ? 'Frame rate uncapped (a frame takes what its work takes)' : 'Frame rate capped at the display rate (as in playwright.config.ts)'}`);
    try {
      if (WITH_SCANS) {
        await scans(page);
        // The documents from a fresh page: what the scans left behind (memory, collections) is not theirs to pay.
        await page.close();
        page = await fresh();
      }
      if (WITH_TRACE && !uncapped) {
        await tracing(page);
        await page.close();
        page = await fresh();
      }
      if (WITH_DOCUMENTS) await bigDocuments(page, uncapped ? 'uncapped' : 'capped');
    } catch (e) {
      const shot = `${process.env.BENCH_OUT || '/tmp'}/bench-ui-failure.png`;
      await page.screenshot({ path: shot }).catch(() => undefined);
      console.error(`(the page at the failure: ${shot})`);
      throw e;
    }
  } finally {
    await browser.close();
  }
}

async function main(): Promise<void> {
  console.log(`bench:ui — scans ${SCAN_MP.join(', ')} MP; documents 12 × ${VERTICES.join(', ')} vertices; ${RUNS} run(s) a row (medians)`);
  if (!process.env.BENCH_DIST) {
    console.log(`Building into ${DIST} …`);
    execFileSync(process.execPath, [VITE, 'build', '--outDir', DIST, '--emptyOutDir', '--logLevel', 'warn'], { stdio: 'inherit' });
  }
  const preview = await startPreview(DIST, { port: Number(process.env.BENCH_PORT) || undefined });
  try {
    await run(preview.url, false);
    if (WITH_UNCAPPED && !ONLY_TRACE) await run(preview.url, true);
  } finally {
    preview.stop();
  }
  console.log(`\n${rows.length} rows measured.`);
  if (WITH_TRACE && !ONLY_TRACE) execFileSync(process.execPath, ['--import', 'tsx', 'scripts/benchTrace.ts'], { stdio: 'inherit' });
}

main().catch((e) => {
  console.error(e instanceof BenchFailure ? `\n${e.message}` : e);
  process.exit(1);
});
