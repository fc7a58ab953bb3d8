// Length of a polyline.
import type { XZ } from '../model/section';

/** Returns the summed segment length in section units; 0 for fewer than 2 points. */
export function polylineLength(line: XZ[]): number {
  let sum = 0;
  for (let i = 0; i + 1 < line.length; i++) sum += Math.hypot(line[i + 1][0] - line[i][0], line[i + 1][1] - line[i][1]);
  return sum;
}
