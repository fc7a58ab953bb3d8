import type { SectionProblem } from './sectionProblem';

// Reads a horizon's projected runs ([fromIndex, toIndex] vertex ranges of eroded or interpreted
// line) from unknown JSON, pushing one problem that says what is wrong instead of throwing.

/** The runs as [from, to] integer pairs (0 ≤ from < to ≤ nPoints − 1, not overlapping, input order), or null with the problem pushed to `out`. */
export function readProjectedRuns(v: unknown, nPoints: number, who: string, horizon: string | undefined, out: SectionProblem[]): [number, number][] | null {
  const bad = (detail: string) => {
    out.push({ code: 'bad-projected-run', horizon, message: `${who}: projected run ${detail}; give runs as [fromIndex, toIndex] with 0 ≤ from < to ≤ ${nPoints - 1}, not overlapping.` });
    return null;
  };
  if (!Array.isArray(v)) return bad('list is not an array');
  const runs: [number, number][] = [];
  for (const r of v) {
    if (!Array.isArray(r) || r.length !== 2 || !Number.isInteger(r[0]) || !Number.isInteger(r[1])) return bad(`${JSON.stringify(r)} is not a pair of integer indices`);
    const [from, to] = r as [number, number];
    if (from < 0 || to > nPoints - 1) return bad(`[${from}, ${to}] is outside the line's vertices`);
    if (from >= to) return bad(`[${from}, ${to}] does not span a segment`);
    runs.push([from, to]);
  }
  const sorted = [...runs].sort((a, b) => a[0] - b[0]);
  for (let i = 1; i < sorted.length; i++) {
    if (sorted[i][0] < sorted[i - 1][1]) return bad(`[${sorted[i][0]}, ${sorted[i][1]}] overlaps [${sorted[i - 1][0]}, ${sorted[i - 1][1]}]`);
  }
  return runs;
}
