// The project file opened (parseProjectText) in the form that crosses from the opening worker to the page:
// the document's lines packed into Float64Arrays whose buffers, and the scan's bytes, are transferred.
// The page turns it back into the document with unpackOpened, a few lines a task.
import type { ProjectDoc } from '../core/model/projectDoc';
import { packDoc, packedDocBuffers, unpackDocInSteps, type PackedDoc } from './packedDoc';
import { parseProjectText, type OpenedProject, type ScanBytes } from './projectFile';

/** OpenedProject with the document's lines packed. */
export type PackedOpened =
  | { ok: true; doc: PackedDoc; scan: ScanBytes | null; kind: 'project' | 'section'; migratedFrom: number | null; notes: string[] }
  | { ok: false; message: string };

/** Returns the file text opened by parseProjectText with the lines packed, and the buffers to transfer. */
export function openedForTransfer(text: string, fileName: string): { opened: PackedOpened; transfer: ArrayBuffer[] } {
  const opened = parseProjectText(text, fileName);
  if (!opened.ok) return { opened, transfer: [] };
  const doc = packDoc(opened.doc);
  const transfer = packedDocBuffers(doc);
  if (opened.scan) transfer.push(opened.scan.bytes.buffer as ArrayBuffer);
  return { opened: { ...opened, doc }, transfer };
}

/** Vertices unpacked between two yields to the page: a few milliseconds of work. */
const VERTICES_PER_STEP = 150_000;

/**
 * Returns the OpenedProject that parseProjectText gave in the worker, its lines unpacked about 150,000 vertices a
 * task; `step(done, total)` (vertices) is awaited between, where the caller yields to the page and shows progress.
 */
export async function unpackOpened(opened: PackedOpened, step: (done: number, total: number) => Promise<void>): Promise<OpenedProject> {
  if (!opened.ok) return opened;
  // The document was checked by the schema in the worker; unpacking only turns the packed lines back into pairs.
  const doc = (await unpackDocInSteps(opened.doc, VERTICES_PER_STEP, step)) as ProjectDoc;
  return { ...opened, doc };
}
