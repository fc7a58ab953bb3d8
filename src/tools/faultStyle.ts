// How faults are drawn, apart from horizons: dark colours none of the horizon palette has (core's
// FAULT_COLOURS, the ones addFault gives), a heavier line, and a long dash, so a fault never reads as a
// horizon on the scan.
import { FAULT_COLOURS } from '../core/model/commands/addFault';

export { FAULT_COLOURS };

/** Line width of a fault on the screen (screen px; a horizon is 2.2) and its dash (screen px). */
export const FAULT_WIDTH = 3.2;
export const FAULT_DASH = [16, 5];

/** Returns the colour addFault gives the n-th fault (cycling through the fault colours). */
export function faultColour(n: number): string {
  return FAULT_COLOURS[((n % FAULT_COLOURS.length) + FAULT_COLOURS.length) % FAULT_COLOURS.length];
}
