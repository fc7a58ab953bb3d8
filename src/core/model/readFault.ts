import { selfIntersections } from '../geometry/selfIntersections';
import { readPoints, type Allocate } from './readPoints';
import type { SectionProblem } from './sectionProblem';

// Reads one fault of a section file: a name and a polyline of at least two points that does not
// cross itself (a fault trace in a section is one surface; a line that crosses itself cannot be
// followed from one cutoff to the other). Problems name the fault, or its position without a name.

/** A validated fault with its points as typed arrays (section units). */
export interface FaultArrays { name: string; xs: Float64Array; zs: Float64Array }

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The fault at position `index` (0-based) as FaultArrays, or null with every problem pushed to `out`; never throws. */
export function readFault(v: unknown, index: number, out: SectionProblem[], allocate: Allocate): FaultArrays | null {
  if (!isObject(v)) {
    out.push({ code: 'bad-shape', message: `Fault #${index + 1} is not an object; write it as { "name", "line" }.` });
    return null;
  }
  const name = typeof v.name === 'string' && v.name.trim() !== '' ? v.name : undefined;
  const who = name !== undefined ? `Fault "${name}"` : `Fault #${index + 1}`;
  const before = out.length;
  if (name === undefined) out.push({ code: 'bad-shape', message: `${who} has no name; give it a non-empty "name".` });
  const line = readPoints(v.line, who, 'line', undefined, out, allocate);
  for (let k = before; k < out.length; k++) if (name !== undefined) out[k].fault = name;
  if (line) {
    const pairs = selfIntersections(line.xs, line.zs, 1);
    if (pairs.length > 0) {
      const [i, j] = pairs[0];
      out.push({ code: 'self-intersecting', fault: name, message: `${who}: the line crosses itself (segments ${i}–${i + 1} and ${j}–${j + 1}); redraw it so it does not cross itself.` });
    }
  }
  if (out.length > before || !line || name === undefined) return null;
  return { name, xs: line.xs, zs: line.zs };
}
