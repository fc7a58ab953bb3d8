import type { DocFault, ProjectDoc } from '../projectDoc';
import { updateFault } from './updateFault';

export type FaultStyle = Partial<Pick<DocFault, 'colour' | 'visible' | 'locked'>>;

/** Returns the document with the fault's colour, visibility or lock changed; unchanged when nothing differs. */
export function setFaultStyle(doc: ProjectDoc, faultId: string, style: FaultStyle): ProjectDoc {
  return updateFault(doc, faultId, (f) => {
    const same = (Object.keys(style) as (keyof FaultStyle)[]).every((k) => style[k] === undefined || style[k] === f[k]);
    return same ? f : { ...f, ...style };
  });
}
