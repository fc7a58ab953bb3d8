import { LIMITS, nameLengthProblem, tooManyMessage } from './limits';
import type { ProjectDoc } from './projectDoc';

// The limits of core/model/limits.ts applied to a whole document, in the shared words. Cheap (it counts,
// it does not read every vertex), so that it can run before every write of the kept copy: work the
// restore would refuse is never written over work it can restore.

/** Returns the first limit the document breaks, in the shared words ("too many horizons for the app (2001; the limit is 2000)"), or null. */
export function docLimitProblem(doc: ProjectDoc): string | null {
  const names: [string, string][] = [[doc.title, 'project title'], [doc.author, 'author']];
  for (const h of doc.horizons) names.push([h.name, 'horizon name']);
  for (const f of doc.faults ?? []) names.push([f.name, 'fault name']);
  for (const s of doc.scenarios) names.push([s.name, 'scenario name']);
  for (const [name, what] of names) {
    const p = nameLengthProblem(name, what);
    if (p) return p;
  }
  if (doc.horizons.length > LIMITS.horizons) return tooManyMessage('horizons', doc.horizons.length, LIMITS.horizons);
  if ((doc.faults ?? []).length > LIMITS.faults) return tooManyMessage('faults', doc.faults.length, LIMITS.faults);
  if (doc.scenarios.length > LIMITS.scenarios) return tooManyMessage('scenarios', doc.scenarios.length, LIMITS.scenarios);
  let total = 0;
  const line = (n: number) => {
    total += n;
    return n > LIMITS.pointsPerLine ? tooManyMessage('vertices in one line', n, LIMITS.pointsPerLine) : null;
  };
  for (const h of doc.horizons) {
    const p = line(h.pointsPx.length);
    if (p) return p;
  }
  for (const f of doc.faults ?? []) {
    const p = line(f.pointsPx.length);
    if (p) return p;
  }
  for (const s of doc.scenarios) {
    for (const r of Object.values(s.regionals)) {
      const p = line(r.length);
      if (p) return p;
    }
  }
  if (total > LIMITS.totalPoints) return tooManyMessage('vertices', total, LIMITS.totalPoints);
  const c = doc.calibration;
  const calibrationPoints = c === null ? 0 : c.kind === 'axes' ? Math.max(c.xPoints.length, c.zPoints.length) : c.points.length;
  if (calibrationPoints > LIMITS.calibrationPoints) return tooManyMessage('calibration points', calibrationPoints, LIMITS.calibrationPoints);
  return null;
}
