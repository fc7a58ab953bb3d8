// The page's side of a file worker (src/io/fileWorker.ts), against a stand-in worker that answers as the real
// ones do: the file is read (checking starts), then its value; a worker that cannot start or dies leaves the work
// to the page; an abort ends the worker. The workers themselves run in the browser tests (files, largeData).
import { describe, expect, it } from 'vitest';
import { askFileWorker, convertFileHere, fileWorkers, yieldToPage, type FileWorkerReply } from '../../src/io/fileWorker';

class StandIn {
  onmessage: ((e: { data: FileWorkerReply<string> }) => void) | null = null;
  onerror: (() => void) | null = null;
  terminated = false;
  posted: unknown[] = [];
  constructor(private readonly script: (w: StandIn) => void) {}
  postMessage(m: unknown) { this.posted.push(m); queueMicrotask(() => this.script(this)); }
  terminate() { this.terminated = true; }
  send(data: FileWorkerReply<string>) { this.onmessage?.({ data }); }
}

const file = new File(['horizon,x,z\n'], 'h.csv');

describe('askFileWorker', () => {
  it('hears "read", resolves with the value, and ends the worker', async () => {
    let w!: StandIn;
    const stages: string[] = [];
    const value = await askFileWorker<{ kind: string }, string>(() => (w = new StandIn((s) => { s.send({ type: 'read' }); s.send({ type: 'done', value: 'parsed' }); })) as unknown as Worker,
      { file, kind: 'csv' }, () => stages.push('checking'));
    expect(value).toBe('parsed');
    expect(stages).toEqual(['checking']);
    expect(w.posted).toEqual([{ file, kind: 'csv' }]);
    expect(w.terminated).toBe(true);
  });

  it('says unreadable, no-worker (cannot start, or dies) and cancelled', async () => {
    const make = (script: (w: StandIn) => void) => () => new StandIn(script) as unknown as Worker;
    expect(await askFileWorker(make((s) => s.send({ type: 'unreadable' })), { file }, () => undefined)).toBe('unreadable');
    expect(await askFileWorker(() => { throw new Error('no workers here'); }, { file }, () => undefined)).toBe('no-worker');
    expect(await askFileWorker(make((s) => s.onerror?.()), { file }, () => undefined)).toBe('no-worker');
    const abort = new AbortController();
    const pending = askFileWorker(make(() => abort.abort()), { file }, () => undefined, abort.signal);
    expect(await pending).toBe('cancelled');
  });
});

describe('fileWorkers', () => {
  const answering = () => new StandIn((s) => { s.send({ type: 'read' }); s.send({ type: 'done', value: 'parsed' }); });

  it('keeps the worker that answered a small file for the next file, and ends none of them', async () => {
    const made: StandIn[] = [];
    const kept = fileWorkers(() => { const w = answering(); made.push(w); return w as unknown as Worker; }, 100);
    expect(await askFileWorker(kept, { file }, () => undefined)).toBe('parsed');
    expect(await askFileWorker(kept, { file }, () => undefined)).toBe('parsed');
    expect(made).toHaveLength(1);
    expect(made[0].terminated).toBe(false);
    expect(made[0].posted).toEqual([{ file }, { file }]);
    // Its handlers are let go between files: a stray message after the answer reaches nobody.
    expect(made[0].onmessage).toBeNull();
  });

  it('ends the worker after a file over the size kept, a failure or a cancel, and makes a new one for the next', async () => {
    const made: StandIn[] = [];
    const big = new File(['x'.repeat(200)], 'big.json');
    const kept = fileWorkers(() => { const w = answering(); made.push(w); return w as unknown as Worker; }, 100);
    expect(await askFileWorker(kept, { file: big }, () => undefined)).toBe('parsed');
    expect(made[0].terminated).toBe(true);
    const dying = fileWorkers(() => { const w = new StandIn((s) => s.onerror?.()); made.push(w); return w as unknown as Worker; }, 100);
    expect(await askFileWorker(dying, { file }, () => undefined)).toBe('no-worker');
    expect(made[1].terminated).toBe(true);
    const abort = new AbortController();
    const cancelled = fileWorkers(() => { const w = new StandIn(() => abort.abort()); made.push(w); return w as unknown as Worker; }, 100);
    expect(await askFileWorker(cancelled, { file }, () => undefined, abort.signal)).toBe('cancelled');
    expect(made[2].terminated).toBe(true);
    expect(await askFileWorker(kept, { file }, () => undefined)).toBe('parsed');
    expect(made).toHaveLength(4);
  });
});

describe('yieldToPage', () => {
  it('resolves in a later task: what the current task queued runs first', async () => {
    const order: string[] = [];
    const yielded = yieldToPage().then(() => order.push('after the yield'));
    setTimeout(() => order.push('a timer queued before'), 0);
    queueMicrotask(() => order.push('microtask'));
    await yielded;
    expect(order[0]).toBe('microtask');
    expect(order).toContain('after the yield');
  });
});

describe('convertFileHere', () => {
  it('reads the text, says checking, converts it', async () => {
    const stages: string[] = [];
    expect(await convertFileHere(file, () => stages.push('checking'), (t) => t.length)).toBe(12);
    expect(stages).toEqual(['checking']);
  });
});
