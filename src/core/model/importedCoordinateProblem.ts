import { coordinateProblem, extentProblem } from './limits';
import type { XZ } from './section';

// Imported lines (CSV, GeoJSON, SVG after its reference points) in section units held to the same range as a
// section file opened in the app or on the command line (core/model/limits.ts): a coordinate beyond it, or a
// set of lines too small to measure, is refused before it reaches the document, in the same words.

/** Returns the first problem of the imported lines' coordinates, naming the line and the vertex, or null when all are in range. */
export function importedCoordinateProblem(lines: readonly { name: string; line: readonly XZ[] }[], what = 'Horizon'): string | null {
  let minX = Infinity, maxX = -Infinity, minZ = Infinity, maxZ = -Infinity;
  for (const l of lines) {
    for (let i = 0; i < l.line.length; i++) {
      const [x, z] = l.line[i];
      const p = coordinateProblem(x) ?? coordinateProblem(z);
      if (p) return `${what} "${l.name}", vertex ${i + 1}: ${p}; convert the coordinates to smaller units or move their origin`;
      if (x < minX) minX = x;
      if (x > maxX) maxX = x;
      if (z < minZ) minZ = z;
      if (z > maxZ) maxZ = z;
    }
  }
  if (minX > maxX) return null;
  const small = extentProblem(Math.max(maxX - minX, maxZ - minZ));
  return small ? `${small}; give the coordinates in larger units` : null;
}
