// Clip a polyline that crosses each pin once to the part between the pins.
import type { XZ } from '../model/section';

/** Returns the polyline from its crossing with x = pL to its crossing with x = pR (new array); throws if it misses a pin. */
export function clipAtPins(line: XZ[], pins: [number, number]): XZ[] {
  const [pL, pR] = pins;
  const at = (i: number, x: number): XZ => {
    const [x0, z0] = line[i];
    const [x1, z1] = line[i + 1];
    const t = (x - x0) / (x1 - x0);
    return [x, z0 + t * (z1 - z0)];
  };
  const crosses = (i: number, x: number): boolean =>
    (line[i][0] - x) * (line[i + 1][0] - x) <= 0 && line[i][0] !== line[i + 1][0];
  let first = -1;
  for (let i = 0; i + 1 < line.length && first < 0; i++) if (crosses(i, pL)) first = i;
  let last = -1;
  for (let i = line.length - 2; i >= 0 && last < 0; i--) if (crosses(i, pR)) last = i;
  if (first < 0 || last < 0 || last < first) throw new Error('line does not cross both pins');
  const out: XZ[] = [at(first, pL)];
  for (let i = first + 1; i <= last; i++) out.push([line[i][0], line[i][1]]);
  out.push(at(last, pR));
  return out;
}
