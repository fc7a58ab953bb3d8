import { faultColour } from '../horizonPalette';
import type { DocFault, ImagePx, ProjectDoc } from '../projectDoc';

/** Returns the next free fault id ("fault-1", "fault-2", …), from the highest numbered id in the document. */
export function nextFaultId(doc: ProjectDoc): string {
  let max = 0;
  for (const f of doc.faults) {
    const m = /^fault-(\d+)$/.exec(f.id);
    if (m) max = Math.max(max, Number(m[1]));
  }
  return `fault-${max + 1}`;
}

/** True when a fault other than `faultId` is called `name` (trimmed). */
export function faultNameTaken(doc: ProjectDoc, faultId: string, name: string): boolean {
  const n = name.trim();
  return doc.faults.some((f) => f.id !== faultId && f.name === n);
}

/** Returns `name` (trimmed) or, when blank, "Fault 1", "Fault 2", …; with " (2)", " (3)" … when another fault has it. */
export function freeFaultName(doc: ProjectDoc, faultId: string, name = ''): string {
  let base = name.trim();
  if (base === '') {
    let k = doc.faults.length + 1;
    while (faultNameTaken(doc, faultId, `Fault ${k}`)) k++;
    return `Fault ${k}`;
  }
  if (!faultNameTaken(doc, faultId, base)) return base;
  let k = 2;
  while (faultNameTaken(doc, faultId, `${base} (${k})`)) k++;
  base = `${base} (${k})`;
  return base;
}

/**
 * Returns the document with a new fault at the end of the list (image-pixel vertices); unchanged if the id
 * exists. Defaults: id nextFaultId, a free name ("Fault n"), the next fault colour (faultColour), visible, unlocked.
 */
export function addFault(doc: ProjectDoc, fault: { pointsPx: ImagePx[] } & Partial<Omit<DocFault, 'pointsPx'>>): ProjectDoc {
  const id = fault.id ?? nextFaultId(doc);
  if (doc.faults.some((f) => f.id === id)) return doc;
  const f: DocFault = {
    id,
    name: freeFaultName(doc, id, fault.name),
    colour: fault.colour ?? faultColour(doc.faults.length),
    visible: fault.visible ?? true,
    locked: fault.locked ?? false,
    pointsPx: fault.pointsPx.map(([u, v]) => [u, v]),
  };
  return { ...doc, faults: [...doc.faults, f] };
}
