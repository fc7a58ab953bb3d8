import type { LengthUnit } from '../section';
import type { ProjectDoc } from '../projectDoc';

/** Returns the document with its length unit (the unit of every known calibration value) set; values are not converted. */
export function setUnits(doc: ProjectDoc, units: LengthUnit): ProjectDoc {
  return doc.units === units ? doc : { ...doc, units };
}
