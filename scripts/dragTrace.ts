// A Chromium trace of a continuous drag broken into the browser's phases, for bench:ui's --drag-trace. Each moment
// of the renderer's main thread is counted once, in the innermost event whose phase is known (script, style, layout,
// paint, …), as DevTools' summary does, in thread time (the CPU the thread had, which a loaded machine stretches far
// less than the wall clock; the wall-clock total is printed beside it); a layout or style pass inside script is counted apart as forced. The other
// threads (raster workers, compositor, display compositor) are given by their busy time. What invalidated layout
// and paint (the invalidation-tracking events) is listed by node and reason, and each forced layout by the script
// frame that asked for it.

/** The trace categories the breakdown reads. */
export const DRAG_TRACE_CATEGORIES = [
  'devtools.timeline', 'disabled-by-default-devtools.timeline', 'disabled-by-default-devtools.timeline.stack',
  'v8.execute', 'blink', 'cc', 'viz', 'toplevel',
];
/** Added for the list of invalidations: it records a stack for each one, which slows script several times over. */
export const INVALIDATION_CATEGORY = 'disabled-by-default-devtools.timeline.invalidationTracking';

interface StackFrame { functionName?: string; url?: string; lineNumber?: number }
export interface DragTraceEvent {
  name: string; ph: string; ts?: number; dur?: number; tdur?: number; tid: number; pid: number;
  args?: {
    name?: string;
    beginData?: { dirtyObjects?: number; totalObjects?: number; stackTrace?: StackFrame[] };
    data?: { nodeName?: string; reason?: string; stackTrace?: StackFrame[]; clip?: number[] };
  };
}

const SCRIPT = new Set(['FunctionCall', 'EventDispatch', 'TimerFire', 'FireAnimationFrame', 'RunMicrotasks', 'EvaluateScript', 'v8.callFunction', 'V8.Execute', 'HandlePostMessage', 'FireIdleCallback']);
/** The phase of a main-thread event, or null to count it in the event around it. */
function phaseOf(name: string): string | null {
  if (SCRIPT.has(name)) return 'script';
  if (name === 'MinorGC' || name === 'MajorGC' || name.startsWith('V8.GC') || name.startsWith('BlinkGC')) return 'gc';
  if (name === 'UpdateLayoutTree' || name === 'RecalculateStyles') return 'style';
  if (name === 'Layout') return 'layout';
  if (name === 'PrePaint') return 'pre-paint';
  if (name === 'Paint' || name === 'PaintImage') return 'paint';
  if (name === 'Layerize' || name === 'UpdateLayer' || name === 'UpdateLayerTree') return 'layerize';
  if (name === 'Commit') return 'commit';
  if (name === 'ProxyMain::BeginMainFrame' || name === 'WebFrameWidgetImpl::UpdateLifecycle') return 'frame (other)';
  return null;
}

const frameOf = (s: StackFrame[] | undefined) => {
  const f = s?.[0];
  return f ? `${f.functionName || '(anonymous)'} ${(f.url ?? '').split('/').pop()}:${(f.lineNumber ?? 0) + 1}` : '(no stack)';
};

const add = (m: Map<string, number>, k: string, v: number) => m.set(k, (m.get(k) ?? 0) + v);
const top = (m: Map<string, number>, k: number) => [...m].sort((a, b) => b[1] - a[1]).slice(0, k);

/** Prints the trace's breakdown, ms (or counts) a move over `moves` moves. */
export function printDragTrace(trace: { traceEvents: DragTraceEvent[] }, moves: number): void {
  const threads = new Map<string, string>();
  for (const e of trace.traceEvents) if (e.ph === 'M' && e.name === 'thread_name') threads.set(`${e.pid}:${e.tid}`, e.args?.name ?? '');
  const mainKey = [...threads].find(([, n]) => n === 'CrRendererMain')?.[0];
  const byThread = new Map<string, DragTraceEvent[]>();
  for (const e of trace.traceEvents) {
    if (e.ph !== 'X' || e.ts === undefined || !e.dur) continue;
    const k = `${e.pid}:${e.tid}`;
    let list = byThread.get(k);
    if (!list) byThread.set(k, (list = []));
    list.push(e);
  }
  const phases = new Map<string, number>();
  const busy = new Map<string, number>();
  const wall = new Map<string, number>();
  const forcedBy = new Map<string, number>();
  let frames = 0;
  let layouts = 0;
  let dirty = 0;
  let total = 0;
  for (const [k, list] of byThread) {
    list.sort((a, b) => a.ts! - b.ts! || b.dur! - a.dur!);
    const main = k === mainKey;
    // The open events, outermost first, with each one's phase (inherited) and the thread time its children took.
    const stack: { e: DragTraceEvent; phase: string; inner: number }[] = [];
    const close = (upTo: number) => {
      while (stack.length && stack[stack.length - 1].e.ts! + stack[stack.length - 1].e.dur! <= upTo) {
        const s = stack.pop()!;
        const cpu = s.e.tdur ?? s.e.dur!;
        if (main) add(phases, s.phase, Math.max(0, cpu - s.inner) / 1000);
        if (stack.length) stack[stack.length - 1].inner += cpu;
        else {
          add(busy, threads.get(k) ?? '?', cpu / 1000);
          add(wall, threads.get(k) ?? '?', s.e.dur! / 1000);
        }
      }
    };
    for (const e of list) {
      close(e.ts!);
      const outer = stack[stack.length - 1];
      let phase = phaseOf(e.name) ?? outer?.phase ?? 'other';
      if (main && (phase === 'layout' || phase === 'style') && stack.some((s) => s.phase === 'script')) {
        phase = `${phase} (forced by script)`;
        if (e.name === 'Layout' || e.name === 'UpdateLayoutTree') add(forcedBy, `${e.name} ← ${frameOf(e.args?.beginData?.stackTrace)}`, 1);
      }
      if (main && e.name === 'ProxyMain::BeginMainFrame') frames++;
      if (main && e.name === 'Layout') {
        layouts++;
        dirty += e.args?.beginData?.dirtyObjects ?? 0;
        total += e.args?.beginData?.totalObjects ?? 0;
      }
      stack.push({ e, phase, inner: 0 });
    }
    close(Infinity);
  }
  const mainMs = [...phases.values()].reduce((a, b) => a + b, 0);
  console.log(`    trace: ${(frames / moves).toFixed(2)} main frames a move; renderer main thread ${(mainMs / moves).toFixed(2)} ms of thread time a move (wall clock ${((wall.get('CrRendererMain') ?? 0) / moves).toFixed(2)} ms), by phase:`);
  for (const [p, ms] of top(phases, 20)) console.log(`      ${(ms / moves).toFixed(2).padStart(7)}  ${p}`);
  console.log(`    layouts: ${(layouts / moves).toFixed(2)} a move, ${layouts ? (dirty / layouts).toFixed(0) : 0} of ${layouts ? (total / layouts).toFixed(0) : 0} objects dirty on average`);
  for (const [f, n] of top(forcedBy, 6)) console.log(`      ${(n / moves).toFixed(2).padStart(7)}  forced: ${f}`);
  console.log('    busy time of each thread, ms of thread time a move (wall clock):');
  for (const [t, ms] of top(busy, 8)) console.log(`      ${(ms / moves).toFixed(2).padStart(7)}  ${t} (${((wall.get(t) ?? 0) / moves).toFixed(2)})`);
  // What asked for layout, style and paint again: node and reason, counted a move.
  const why = new Map<string, number>();
  for (const e of trace.traceEvents) {
    if (!e.name.endsWith('InvalidationTracking')) continue;
    const d = e.args?.data;
    add(why, `${e.name.replace('InvalidationTracking', '')}: ${d?.nodeName ?? '?'} — ${d?.reason ?? '?'}`, 1);
  }
  if (why.size) console.log('    invalidations a move (kind: node — reason):');
  for (const [w, n] of top(why, 16)) console.log(`      ${(n / moves).toFixed(2).padStart(7)}  ${w}`);
  const paints = new Map<string, number>();
  for (const e of trace.traceEvents) {
    if (e.name !== 'Paint' || e.ph !== 'X' || `${e.pid}:${e.tid}` !== mainKey) continue;
    const c = e.args?.data?.clip;
    const area = c && c.length >= 8 ? `${Math.round(c[2] - c[0])} × ${Math.round(c[5] - c[1])}` : '?';
    add(paints, `${e.args?.data?.nodeName ?? '?'} ${area}`, 1);
  }
  if (paints.size) console.log('    painted (node, clip in px), a move:');
  for (const [p, n] of top(paints, 8)) console.log(`      ${(n / moves).toFixed(2).padStart(7)}  ${p}`);
}
