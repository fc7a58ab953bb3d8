// The renderer's memory as Chromium itself accounts for it, for the benchmarks (scripts, not tests).
import type { Browser } from '@playwright/test';

interface TraceEvent { ph: string; pid: number; name: string; args?: { name?: string; dumps?: { allocators?: Record<string, { attrs?: { size?: { value: string } } }> } } }

/**
 * The renderer's memory by allocator (MB), from one detailed memory-infra dump (Chromium's own accounting, the
 * same the browser's task manager reads): top-level allocators and their direct children, e.g. malloc,
 * partition_alloc/partitions/buffer, v8, blink_gc, skia/sk_resource_cache, canvas, discardable, gpu.
 */
export async function rendererAllocators(browser: Browser, depth = 2): Promise<Map<string, number>> {
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
  const renderers = new Set(events.filter((e) => e.ph === 'M' && e.name === 'process_name' && e.args?.name === 'Renderer').map((e) => e.pid));
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

