// A file read and converted off the main thread, one rule for every such worker (opening a project or section
// file, reading a horizon file for import): the worker reads the file's text, says so (the page shows "checking"),
// converts it and sends the result with its buffers transferred. The page starts one worker a file and falls back to
// the same steps on its own thread where no worker can start (the unit tests under Node) or the worker dies.

/** A file worker's messages: the file is read (checking starts), its result, or the disk refused the file. */
export type FileWorkerReply<T> = { type: 'read' } | { type: 'done'; value: T } | { type: 'unreadable' };

/** What the page asks a file worker: the file chosen, and what the converter needs besides (a name, an importer). */
export type FileWorkerRequest<Extra> = { file: File } & Extra;

/** A macrotask boundary: the page draws and handles input before the next step. */
export const yieldToPage = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

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
 * On the page: sends `request` to a worker made by `make` (one a file, ended when it answers) and resolves with its
 * value, 'unreadable' (the disk refused the file), 'no-worker' (none could start, or it died: do the work here) or
 * 'cancelled' when `signal` aborts. `onRead` hears that the file is read and checking has started.
 */
export function askFileWorker<Extra, T>(make: () => Worker, request: FileWorkerRequest<Extra>, onRead: () => void, signal?: AbortSignal): Promise<T | 'unreadable' | 'no-worker' | 'cancelled'> {
  let worker: Worker;
  try {
    worker = make();
  } catch {
    return Promise.resolve('no-worker');
  }
  return new Promise((resolve) => {
    const finish = (v: T | 'unreadable' | 'no-worker' | 'cancelled') => {
      worker.terminate();
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
