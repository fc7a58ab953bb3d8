import { readPoints, type Allocate } from './readPoints';
import { readProjectedRuns } from './readProjectedRuns';
import type { SectionProblem } from './sectionProblem';

// Reads one horizon object of a section file: name, line, regional, include and projected runs.
// Every problem found is pushed (named after the horizon, or its position when it has no name).

/** A validated horizon with its points as typed arrays (section units), the form the analysis reads. */
export interface HorizonArrays {
  name: string;
  include?: boolean;
  projected?: [number, number][];
  lineX: Float64Array;
  lineZ: Float64Array;
  regionalX: Float64Array;
  regionalZ: Float64Array;
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The horizon at position `index` (0-based) as HorizonArrays, or null with every problem pushed to `out`; never throws. */
export function readHorizon(v: unknown, index: number, out: SectionProblem[], allocate: Allocate): HorizonArrays | null {
  if (!isObject(v)) {
    out.push({ code: 'bad-shape', message: `Horizon #${index + 1} is not an object; write it as { "name", "line", "regional" }.` });
    return null;
  }
  const name = typeof v.name === 'string' && v.name.trim() !== '' ? v.name : undefined;
  const who = name !== undefined ? `Horizon "${name}"` : `Horizon #${index + 1}`;
  const before = out.length;
  if (name === undefined) out.push({ code: 'bad-shape', message: `${who} has no name; give it a non-empty "name".` });
  const line = readPoints(v.line, who, 'line', name, out, allocate);
  const regional = readPoints(v.regional, who, 'regional', name, out, allocate);
  if (v.include !== undefined && typeof v.include !== 'boolean') {
    out.push({ code: 'bad-shape', horizon: name, message: `${who}: "include" must be true or false.` });
  }
  const runs = v.projected !== undefined && line ? readProjectedRuns(v.projected, line.xs.length, who, name, out) : undefined;
  if (out.length > before || !line || !regional || name === undefined) return null;
  const h: HorizonArrays = { name, lineX: line.xs, lineZ: line.zs, regionalX: regional.xs, regionalZ: regional.zs };
  if (typeof v.include === 'boolean') h.include = v.include;
  if (runs) h.projected = runs;
  return h;
}
