// The renderer's memory as Linux and Chromium account for it, for the benchmarks (scripts, not tests).
// Headless Chromium runs three renderer processes beside a page: the page's own (its main thread, workers and
// compositor), a spare one started for the next navigation, and one for the browser's own interface (its omnibox
// popup, a WebUI page). Only the first holds anything of the app, so it is found by the frame it hosts and measured
// apart from the others.
import { readFileSync } from 'node:fs';
import type { Browser, Page } from '@playwright/test';

/** One process's memory (MB) from /proc/<pid>/status: resident, and resident by kind (anonymous, file-backed, shared memory). */
export interface ProcessMemory { pid: number; rss: number; anon: number; file: number; shmem: number }

/** The process's resident memory by kind (MB), or null once it is gone. */
export function processMemory(pid: number): ProcessMemory | null {
  try {
    const status = readFileSync(`/proc/${pid}/status`, 'utf8');
    const kb = (key: string) => Number(new RegExp(`${key}:\\s+(\\d+)`).exec(status)?.[1] ?? 0) / 1024;
    return { pid, rss: kb('VmRSS'), anon: kb('RssAnon'), file: kb('RssFile'), shmem: kb('RssShmem') };
  } catch {
    return null;
  }
}

const pagePids = new WeakMap<Page, number>();

/**
 * The id of the renderer process that hosts the page's main frame, from a short trace (the frames Chromium lists
 * when tracing starts, with their process); null where the trace does not say. Kept per page: a page stays in its
 * process while it shows the same site.
 */
export async function pageRendererPid(page: Page): Promise<number | null> {
  const known = pagePids.get(page);
  if (known) return known;
  const browser = page.context().browser()!;
  await browser.startTracing(page, { categories: ['disabled-by-default-devtools.timeline'] });
  const trace = JSON.parse((await browser.stopTracing()).toString()) as { traceEvents?: TraceEvent[] } | TraceEvent[];
  const events = Array.isArray(trace) ? trace : (trace.traceEvents ?? []);
  const url = page.url();
  for (const e of events) {
    if (e.name !== 'TracingStartedInBrowser') continue;
    const frames = (e.args as { data?: { frames?: { processId?: number; url?: string; isOutermostMainFrame?: boolean }[] } } | undefined)?.data?.frames ?? [];
    const frame = frames.find((f) => f.isOutermostMainFrame && f.url === url) ?? frames.find((f) => f.isOutermostMainFrame);
    if (frame?.processId) {
      pagePids.set(page, frame.processId);
      return frame.processId;
    }
  }
  return null;
}

/** The browser's renderer process ids (SystemInfo.getProcessInfo). */
export async function rendererPids(browser: Browser): Promise<number[]> {
  const cdp = await browser.newBrowserCDPSession();
  try {
    const info = (await cdp.send('SystemInfo.getProcessInfo')) as { processInfo: { type: string; id: number }[] };
    return info.processInfo.filter((p) => p.type === 'renderer').map((p) => p.id);
  } finally {
    await cdp.detach();
  }
}

/**
 * After a collection in the page: the memory of the page's own renderer process, and that of the browser's other
 * renderer processes summed (none of them hosts the app); null where either cannot be read.
 */
export async function pageRendererMemory(page: Page): Promise<{ page: ProcessMemory; others: ProcessMemory } | null> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('HeapProfiler.collectGarbage').catch(() => undefined);
  await cdp.detach();
  const pid = await pageRendererPid(page).catch(() => null);
  if (!pid) return null;
  const own = processMemory(pid);
  if (!own) return null;
  const others: ProcessMemory = { pid: 0, rss: 0, anon: 0, file: 0, shmem: 0 };
  for (const id of await rendererPids(page.context().browser()!)) {
    const m = id === pid ? null : processMemory(id);
    if (!m) continue;
    others.rss += m.rss;
    others.anon += m.anon;
    others.file += m.file;
    others.shmem += m.shmem;
  }
  return { page: own, others };
}

/** "resident R MB = private A + files F + shared memory S" (MB) of one process. */
export function residentLine(m: ProcessMemory): string {
  return `resident ${m.rss.toFixed(0)} MB = private ${m.anon.toFixed(0)} + files ${m.file.toFixed(0)} + shared memory ${m.shmem.toFixed(0)}`;
}

interface TraceEvent { ph: string; pid: number; name: string; args?: { name?: string; data?: unknown; dumps?: { allocators?: Record<string, { attrs?: { size?: { value: string } } }> } } }

/**
 * The renderer's memory by allocator (MB), from one detailed memory-infra dump (Chromium's own accounting, the
 * same the browser's task manager reads): top-level allocators and their direct children, e.g. malloc,
 * partition_alloc/partitions/buffer, v8, blink_gc, skia/sk_resource_cache, canvas, discardable, gpu. With `pid`, that
 * renderer process only (pageRendererPid); else every process Chromium names "Renderer".
 */
export async function rendererAllocators(browser: Browser, depth = 2, pid?: number): Promise<Map<string, number>> {
  const cdp = await browser.newBrowserCDPSession();
  const events: TraceEvent[] = [];
  cdp.on('Tracing.dataCollected', (e) => {
    for (const v of e.value) events.push(v as unknown as TraceEvent);
  });
  const complete = new Promise<void>((resolve) => cdp.once('Tracing.tracingComplete', () => resolve()));
  await cdp.send('Tracing.start', { traceConfig: { includedCategories: ['disabled-by-default-memory-infra'], memoryDumpConfig: { triggers: [] } }, transferMode: 'ReportEvents' } as never);
  await cdp.send('Tracing.requestMemoryDump', { deterministic: true, levelOfDetail: 'detailed' } as never);
  await cdp.send('Tracing.end');
  await complete;
  await cdp.detach();
  const renderers = pid ? new Set([pid]) : new Set(events.filter((e) => e.ph === 'M' && e.name === 'process_name' && e.args?.name === 'Renderer').map((e) => e.pid));
  const out = new Map<string, number>();
  for (const e of events) {
    if (e.ph !== 'v' || !renderers.has(e.pid)) continue;
    for (const [name, a] of Object.entries(e.args?.dumps?.allocators ?? {})) {
      const size = a.attrs?.size?.value;
      if (!size || name.split('/').length > depth || (depth <= 2 && name.includes('0x'))) continue;
      out.set(name, (out.get(name) ?? 0) + parseInt(size, 16) / 1048576);
    }
  }
  return out;
}

/** The allocators holding at least `minMb`, largest first, as "name 123" pairs (MB). */
export function allocatorLine(m: Map<string, number>, minMb = 8): string {
  return [...m].filter(([, mb]) => mb >= minMb).sort((a, b) => b[1] - a[1]).map(([name, mb]) => `${name} ${mb.toFixed(0)}`).join(', ');
}

