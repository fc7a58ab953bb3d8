// A small invented project used by the file tests: two horizons with regionals and pins.
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
import type { Section } from '../../src/core/model/section';

export const SAMPLE_SECTION: Section = {
  units: 'm',
  pins: [0, 1000],
  horizons: [
    { name: 'Upper marker', line: [[-100, 500], [0, 500], [500, 900], [1000, 500], [1100, 500]], regional: [[-100, 500], [1100, 500]] },
    { name: 'Middle marker', line: [[-100, 250], [0, 250], [500, 600], [1000, 250], [1100, 250]], regional: [[-100, 250], [1100, 250]] },
    { name: 'Lower marker', line: [[-100, 0], [0, 0], [500, 300], [1000, 0], [1100, 0]], regional: [[-100, 0], [1100, 0]] },
  ],
};

/** Returns a fresh copy of the sample document. */
export function sampleDoc(): ProjectDoc {
  return { ...sectionToProjectDoc(SAMPLE_SECTION, 'Invented test fold'), author: 'Test author' };
}
