// A file read and converted off the main thread, one rule for every such worker (opening a project or section
// file, reading a horizon file for import): the worker reads the file's text, says so (the page shows "checking"),
// converts it and sends the result with its buffers transferred. The page starts one worker a file and falls back to
// the same steps on its own thread where no worker can start (the unit tests under Node) or the worker dies.

/** A file worker's messages: the file is read (checking starts), its result, or the disk refused the file. */
export type FileWorkerReply<T> = { type: 'read' } | { type: 'done'; value: T } | { type: 'unreadable' };

/** What the page asks a file worker: the file chosen, and what the converter needs besides (a name, an importer). */
export type FileWorkerRequest<Extra> = { file: File } & Extra;

/**
 * A macrotask boundary: the page draws and handles input before the next step. Not setTimeout(0): from the fifth in
 * a row the browser holds each at least 4 ms, so a dozen small steps waited twice as long as their work.
 */
export function yieldToPage(): Promise<void> {
  const scheduler = (globalThis as { scheduler?: { yield?: () => Promise<void> } }).scheduler;
  if (scheduler?.yield) return scheduler.yield();
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => {
      channel.port1.close();
      resolve();
    };
    channel.port2.postMessage(null);
  });
}

/** In a worker: answers each request by reading its file's text and converting it (the value and the buffers to transfer). */
export function serveFiles<Extra, T>(convert: (text: string, request: FileWorkerRequest<Extra>) => { value: T; transfer: Transferable[] }): void {
  const reply = (msg: FileWorkerReply<T>, transfer: Transferable[] = []) => (self as unknown as { postMessage(m: unknown, t: Transferable[]): void }).postMessage(msg, transfer);
  self.onmessage = async (e: MessageEvent<FileWorkerRequest<Extra>>) => {
    let text: string;
    try {
      text = await e.data.file.text();
    } catch {
      return reply({ type: 'unreadable' });
    }
    reply({ type: 'read' });
    const { value, transfer } = convert(text, e.data);
    reply({ type: 'done', value }, transfer);
  };
}

/**
 * Workers of one kind, started before a file needs one and kept between files: opening then does not wait for a
 * worker to start and evaluate its module (tens of milliseconds), and from the second file on its converter runs
 * compiled rather than interpreted (three to five times faster). A worker that answered a file of up to `keepBytes`
 * is kept for the next one; after a bigger file (its heap may hold that file's garbage a while), a failure or a
 * cancel it is ended, and a fresh one is started when the page is next idle.
 */
export interface FileWorkers {
  /** The worker started ahead, or a new one (throws where no worker can start). */
  take: () => Worker;
  /** Takes a worker back after a file: kept when it answered a file of up to keepBytes, else ended. */
  done: (worker: Worker, answered: boolean, bytes: number) => void;
  /** Starts one ahead when the page is next idle, unless one waits already. */
  startAhead: () => void;
}

/** Returns the kept workers made by `make` (see FileWorkers). */
export function fileWorkers(make: () => Worker, keepBytes: number): FileWorkers {
  let waiting: Worker | null = null;
  let asked = false;
  const startAhead = () => {
    if (waiting || asked || typeof Worker === 'undefined') return;
    asked = true;
    whenIdle(() => {
      asked = false;
      if (waiting) return;
      try {
        waiting = make();
      } catch {
        waiting = null;
      }
    });
  };
  return {
    take: () => {
      const w = waiting ?? make();
      waiting = null;
      return w;
    },
    done: (worker, answered, bytes) => {
      worker.onmessage = null;
      worker.onerror = null;
      if (answered && bytes <= keepBytes && !waiting) waiting = worker;
      else worker.terminate();
      startAhead();
    },
    startAhead,
  };
}

/** Runs `run` when the page is next idle (within a second), so a worker's start does not compete with a frame. */
function whenIdle(run: () => void): void {
  const idle = (globalThis as { requestIdleCallback?: (cb: () => void, o: { timeout: number }) => number }).requestIdleCallback;
  if (idle) idle(run, { timeout: 1000 });
  else setTimeout(run, 0);
}

/**
 * On the page: sends `request` to a worker made by `make` (one a file, ended when it answers) or taken from kept
 * workers (given back when it answers) and resolves with its value, 'unreadable' (the disk refused the file),
 * 'no-worker' (none could start, or it died: do the work here) or 'cancelled' when `signal` aborts. `onRead` hears
 * that the file is read and checking has started.
 */
export function askFileWorker<Extra, T>(make: (() => Worker) | FileWorkers, request: FileWorkerRequest<Extra>, onRead: () => void, signal?: AbortSignal): Promise<T | 'unreadable' | 'no-worker' | 'cancelled'> {
  let worker: Worker;
  try {
    worker = typeof make === 'function' ? make() : make.take();
  } catch {
    return Promise.resolve('no-worker');
  }
  return new Promise((resolve) => {
    const finish = (v: T | 'unreadable' | 'no-worker' | 'cancelled') => {
      if (typeof make === 'function') worker.terminate();
      else make.done(worker, v !== 'no-worker' && v !== 'cancelled', request.file.size);
      signal?.removeEventListener('abort', cancel);
      resolve(v);
    };
    const cancel = () => finish('cancelled');
    signal?.addEventListener('abort', cancel);
    worker.onmessage = (e: MessageEvent<FileWorkerReply<T>>) => {
      if (e.data.type === 'read') onRead();
      else if (e.data.type === 'unreadable') finish('unreadable');
      else finish(e.data.value);
    };
    worker.onerror = () => finish('no-worker');
    worker.postMessage(request);
  });
}

/** Where no worker runs: the same steps on this thread. */
export async function convertFileHere<T>(file: File, onRead: () => void, convert: (text: string) => T): Promise<T | 'unreadable'> {
  let text: string;
  try {
    text = await file.text();
  } catch {
    return 'unreadable';
  }
  onRead();
  return convert(text);
}
