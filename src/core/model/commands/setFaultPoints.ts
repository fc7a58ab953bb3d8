import type { ImagePx, ProjectDoc } from '../projectDoc';
import { updateFault } from './updateFault';

/**
 * Returns the document with the fault's vertices (image pixels) replaced; joins on it are kept, and a piece
 * end the new trace no longer passes through is reported by the analysis (docToSection) until it is moved.
 */
export function setFaultPoints(doc: ProjectDoc, faultId: string, pointsPx: ImagePx[]): ProjectDoc {
  return updateFault(doc, faultId, (f) => ({ ...f, pointsPx: pointsPx.map(([u, v]) => [u, v]) }));
}
