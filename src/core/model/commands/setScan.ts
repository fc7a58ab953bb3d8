import type { ProjectDoc, ScanRef } from '../projectDoc';

/** Returns the document with its scan replaced; the digitised work is kept (it lives in image pixels). */
export function setScan(doc: ProjectDoc, scan: ScanRef): ProjectDoc {
  return { ...doc, scan };
}
