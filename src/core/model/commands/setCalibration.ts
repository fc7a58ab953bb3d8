import type { Calibration, ProjectDoc } from '../projectDoc';

/** Returns the document with its calibration replaced (null clears it); every result follows, as shapes are stored in pixels. */
export function setCalibration(doc: ProjectDoc, calibration: Calibration | null): ProjectDoc {
  return doc.calibration === calibration ? doc : { ...doc, calibration };
}
