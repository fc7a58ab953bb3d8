// How faults are drawn, apart from horizons: dark colours none of the horizon palette has (FAULT_COLOURS in
// core/model/horizonPalette.ts, the ones addFault gives), a heavier line, and a long dash, so a fault never
// reads as a horizon on the scan.

/** Line width of a fault on the screen (screen px; a horizon is 2.2) and its dash (screen px). */
export const FAULT_WIDTH = 3.2;
export const FAULT_DASH = [16, 5];
