// The limits of what Foldroot holds, declared once. They are checked where data enters — a text field,
// a rename, an import, a section or project file opened in the app or on the command line, the kept
// copy in the browser — with the same words everywhere, so that nothing is accepted in one place and
// refused in another (work accepted by the editor but refused on restore would be lost).
// Generous for real sections, finite so that a hostile or broken file cannot exhaust memory or time.
import { formatNumber, formatSmallNumber } from './numberText';

export const LIMITS = {
  /** Characters in a name (horizon, scenario, project title, author). */
  nameLength: 500,
  horizons: 2000,
  faults: 2000,
  /** Vertices in one line (horizon or regional). */
  pointsPerLine: 200_000,
  /** Vertices in all lines of a document together. */
  totalPoints: 2_000_000,
  scenarios: 200,
  calibrationPoints: 1000,
  /** Bytes of a CSV, GeoJSON or SVG file to import. */
  importBytes: 64 * 1024 * 1024,
  /** Bytes of a section or project file (below the engine's longest string, about 512 MiB). */
  fileBytes: 500 * 1024 * 1024,
  /** Nesting depth of a JSON file (arrays and objects inside each other). */
  jsonDepth: 64,
  /** Largest magnitude of a coordinate in section units: beyond it squares and areas lose all precision. */
  coordinateMagnitude: 1e9,
  /** Smallest extent of a section in its units: below it bed lengths and areas vanish in rounding. */
  minimumExtent: 1e-3,
} as const;

const MiB = 1024 * 1024;

/** Returns a count for messages as a plain whole number ("150000"): no thousands separators, the one rule of src/format/formatQuantity.ts. */
export function countText(n: number): string {
  return Math.round(n).toString();
}

/** Returns the message for a count over its limit, e.g. "too many vertices for the app (250000; the limit is 200000)". */
export function tooManyMessage(what: string, n: number, limit: number): string {
  return `too many ${what} for the app (${countText(n)}; the limit is ${countText(limit)})`;
}

/** Returns the message for a file over its size limit: "file too large (600 MB; the limit is 500 MB)". */
export function fileTooLargeMessage(bytes: number, limit: number): string {
  const mb = (b: number) => formatNumber(b / MiB >= 10 ? Math.round(b / MiB) : b / MiB, 2);
  return `file too large (${mb(bytes)} MB; the limit is ${mb(limit)} MB)`;
}

/** Returns the message for a name over the length limit, or null when it fits. */
export function nameLengthProblem(name: string, what = 'name'): string | null {
  return name.length > LIMITS.nameLength ? `the ${what} is too long (${countText(name.length)} characters; the limit is ${countText(LIMITS.nameLength)})` : null;
}

/** Returns the message for a coordinate outside the range Foldroot computes in, or null when it is inside. */
export function coordinateProblem(v: number): string | null {
  if (!Number.isFinite(v)) return `a coordinate is not a finite number (${String(v)})`;
  if (Math.abs(v) > LIMITS.coordinateMagnitude) return `a coordinate is outside the range Foldroot computes in (${formatNumber(v, 3)}; coordinates must lie within ±${formatNumber(LIMITS.coordinateMagnitude, 1)} section units)`;
  return null;
}

/** Returns the message for a section whose lines span less than the smallest extent, or null. `extent` is the larger of its x and z spans. */
export function extentProblem(extent: number): string | null {
  if (extent > 0 && extent < LIMITS.minimumExtent) {
    return `the section is too small to measure (it spans ${formatSmallNumber(extent, 3)} units; the smallest is ${LIMITS.minimumExtent} units)`;
  }
  return null;
}

/** What a set of lines looks like to the limits: how many lines, the longest, and all vertices together. */
export interface LineCounts { lines: number; longest: number; total: number }

/** Returns the counts of the lines given as lengths. */
export function countLines(lengths: Iterable<number>): LineCounts {
  let lines = 0, longest = 0, total = 0;
  for (const n of lengths) {
    lines += 1;
    total += n;
    if (n > longest) longest = n;
  }
  return { lines, longest, total };
}

/** Returns the first limit the counts break, in the shared words, or null. `horizons` counts horizons (regionals not among them). */
export function lineCountProblem(c: { horizons: number; longest: number; total: number }): string | null {
  if (c.horizons > LIMITS.horizons) return tooManyMessage('horizons', c.horizons, LIMITS.horizons);
  if (c.longest > LIMITS.pointsPerLine) return tooManyMessage('vertices in one line', c.longest, LIMITS.pointsPerLine);
  if (c.total > LIMITS.totalPoints) return tooManyMessage('vertices', c.total, LIMITS.totalPoints);
  return null;
}

/** Returns `base` followed by `suffix` (" (2)", " copy"), `base` cut short so that the whole fits the name length limit. */
export function nameWithSuffix(base: string, suffix: string): string {
  const room = LIMITS.nameLength - suffix.length;
  return (base.length > room ? base.slice(0, Math.max(0, room)).trimEnd() : base) + suffix;
}
