// The page's side of a file worker (src/io/fileWorker.ts), against a stand-in worker that answers as the real
// ones do: the file is read (checking starts), then its value; a worker that cannot start or dies leaves the work
// to the page; an abort ends the worker. The workers themselves run in the browser tests (files, largeData).
import { describe, expect, it } from 'vitest';
import { askFileWorker, convertFileHere, type FileWorkerReply } from '../../src/io/fileWorker';

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

describe('convertFileHere', () => {
  it('reads the text, says checking, converts it', async () => {
    const stages: string[] = [];
    expect(await convertFileHere(file, () => stages.push('checking'), (t) => t.length)).toBe(12);
    expect(stages).toEqual(['checking']);
  });
});
