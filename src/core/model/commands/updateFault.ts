import type { DocFault, ProjectDoc } from '../projectDoc';

/** Returns the document with one fault replaced by `change(fault)`; the same document when the id is unknown or nothing changed. */
export function updateFault(doc: ProjectDoc, faultId: string, change: (f: DocFault) => DocFault): ProjectDoc {
  const i = doc.faults.findIndex((f) => f.id === faultId);
  if (i < 0) return doc;
  const next = change(doc.faults[i]);
  if (next === doc.faults[i]) return doc;
  const faults = doc.faults.slice();
  faults[i] = next;
  return { ...doc, faults };
}
