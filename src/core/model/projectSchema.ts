// The schema of the project document at SCHEMA_VERSION, checked on every open and restore.
// Written with zod (a registry schema library) so that the messages name the exact path of each
// problem. The type ProjectDoc (projectDoc.ts, with a doc line per field) and this schema are the
// same shape: the compile-time check at the end of this file fails when one changes without the
// other. Limits keep hostile files from exhausting memory.
import { z } from 'zod';
import { SCHEMA_VERSION, type ProjectDoc } from './projectDoc';
import { LIMITS, nameLengthProblem, tooManyMessage } from './limits';
import { docLimitProblem } from './docLimitProblem';

/** Largest counts accepted in a project file: the one set of limits (limits.ts), generous for real work, finite for hostile input. */
export const PROJECT_LIMITS = LIMITS;

const num = z.number().finite();
const px = z.tuple([num, num]);
const line = z.array(px).max(PROJECT_LIMITS.pointsPerLine);
const name = z.string().max(PROJECT_LIMITS.nameLength);
const id = z.string().min(1).max(200);

const axisPoint = z.object({ u: num, v: num, value: num });
const controlPoint = z.object({ u: num, v: num, x: num, z: num });

const calibration = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('axes'), xPoints: z.array(axisPoint).max(PROJECT_LIMITS.calibrationPoints), zPoints: z.array(axisPoint).max(PROJECT_LIMITS.calibrationPoints) }),
  z.object({ kind: z.literal('affine'), points: z.array(controlPoint).max(PROJECT_LIMITS.calibrationPoints) }),
]);

const scanRef = z.object({
  id, name,
  widthPx: z.number().int().positive().max(1_000_000),
  heightPx: z.number().int().positive().max(1_000_000),
  type: z.string().max(100),
  page: z.number().int().nonnegative().optional(),
});

const horizon = z.object({
  id, name,
  colour: z.string().max(64),
  visible: z.boolean(),
  locked: z.boolean(),
  pointsPx: line,
  projected: z.array(z.tuple([z.number().int().nonnegative(), z.number().int().nonnegative()])).max(PROJECT_LIMITS.pointsPerLine),
  joins: z.array(z.object({ at: z.number().int().positive(), faultId: id })).max(PROJECT_LIMITS.pointsPerLine),
});

const fault = z.object({
  id, name,
  colour: z.string().max(64),
  visible: z.boolean(),
  locked: z.boolean(),
  pointsPx: line,
});

const scenario = z.object({
  id, name,
  pinsPx: z.tuple([px, px]).nullable(),
  regionals: z.record(z.string().max(200), line),
  excluded: z.array(z.string().max(200)).max(PROJECT_LIMITS.horizons),
  referenceElevation: num.optional(),
});

const settingsShape = { showDetachment: z.boolean(), showGrid: z.boolean(), showFills: z.boolean() };

const docShape = {
  schemaVersion: z.literal(SCHEMA_VERSION),
  title: name,
  author: name,
  units: z.enum(['m', 'ft']),
  scan: scanRef.nullable(),
  calibration: calibration.nullable(),
  horizons: z.array(horizon).max(PROJECT_LIMITS.horizons),
  faults: z.array(fault).max(PROJECT_LIMITS.faults),
  scenarios: z.array(scenario).min(1).max(PROJECT_LIMITS.scenarios),
  activeScenarioId: id,
  settings: z.looseObject(settingsShape),
  resolution: num.positive().optional(),
};

/** The zod schema of a current project document; unknown keys are kept (loose) so newer optional fields survive. */
export const projectDocSchema = z.looseObject(docShape);

// Compile-time check that the schema (without the kept unknown keys) and ProjectDoc are one shape,
// optional fields included: the type check fails on SCHEMA_MATCHES_TYPE when they differ.
type SchemaDoc = Omit<z.infer<z.ZodObject<typeof docShape>>, 'settings'> & { settings: z.infer<z.ZodObject<typeof settingsShape>> };
type Flat<T> = { [K in keyof T]: T[K] };
type Identical<A, B> = (<T>() => T extends A ? 1 : 2) extends (<T>() => T extends B ? 1 : 2) ? true : false;
export const SCHEMA_MATCHES_TYPE: Identical<Flat<SchemaDoc>, Flat<ProjectDoc>> = true;

export type ProjectDocCheck = { ok: true; doc: ProjectDoc } | { ok: false; message: string };

/** Returns the value as a checked project document, or a message naming the first few problems by path; never throws. */
export function checkProjectDoc(value: unknown): ProjectDocCheck {
  const r = projectDocSchema.safeParse(value);
  if (!r.success) {
    const issues = r.error.issues.slice(0, 3).map((i) => `${i.path.length ? i.path.join('.') : 'document'}: ${limitWords(value, i) ?? i.message}`);
    const more = r.error.issues.length > 3 ? ` (and ${r.error.issues.length - 3} more)` : '';
    return { ok: false, message: `The project document is not valid — ${issues.join('; ')}${more}.` };
  }
  const doc: ProjectDoc = r.data;
  const over = docLimitProblem(doc);
  if (over) return { ok: false, message: `The project document is not valid — ${over}.` };
  const ids = new Set<string>();
  for (const h of doc.horizons) {
    if (ids.has(h.id)) return { ok: false, message: `The project document is not valid — two horizons share the id "${h.id}".` };
    ids.add(h.id);
  }
  const faultIds = new Set<string>();
  const faultNames = new Set<string>();
  for (const f of doc.faults) {
    if (faultIds.has(f.id)) return { ok: false, message: `The project document is not valid — two faults share the id "${f.id}".` };
    if (faultNames.has(f.name)) return { ok: false, message: `The project document is not valid — two faults share the name "${f.name}".` };
    faultIds.add(f.id);
    faultNames.add(f.name);
  }
  for (const h of doc.horizons) {
    const bad = joinProblem(h.joins, h.pointsPx.length, faultIds);
    if (bad) return { ok: false, message: `The project document is not valid — horizon "${h.name}": ${bad}.` };
  }
  if (!doc.scenarios.some((s) => s.id === doc.activeScenarioId)) {
    return { ok: false, message: 'The project document is not valid — activeScenarioId names no scenario.' };
  }
  return { ok: true, doc };
}

/** What a path's array is a list of, for the shared words of a count over its limit. */
function listWhat(key: PropertyKey | undefined): string {
  if (key === 'faults') return 'faults';
  if (key === 'joins') return 'cuts by faults';
  if (key === 'horizons' || key === 'scenarios' || key === 'excluded') return key === 'excluded' ? 'left-out horizons' : key;
  if (key === 'xPoints' || key === 'zPoints' || key === 'points') return 'calibration points';
  if (key === 'projected') return 'projected runs';
  return 'vertices in one line';
}

/** The shared words of limits.ts for a "too big" schema issue (the name or list measured from the value), or null for other issues. */
function limitWords(value: unknown, issue: z.core.$ZodIssue): string | null {
  if (issue.code !== 'too_big') return null;
  let at: unknown = value;
  for (const key of issue.path) at = typeof at === 'object' && at !== null ? (at as Record<PropertyKey, unknown>)[key] : undefined;
  if (typeof at === 'string') return nameLengthProblem(at, issue.path.some((k) => k === 'horizons') ? 'horizon name' : issue.path.some((k) => k === 'faults') ? 'fault name' : issue.path.some((k) => k === 'scenarios') ? 'scenario name' : String(issue.path[issue.path.length - 1] ?? 'name'));
  if (Array.isArray(at)) return tooManyMessage(listWhat(issue.path[issue.path.length - 1] === undefined ? undefined : issue.path[issue.path.length - 1]), at.length, Number(issue.maximum));
  return null;
}

/** Why a horizon's joins do not fit its vertices and the faults (every piece >= 2 vertices, `at` increasing), or null. */
function joinProblem(joins: readonly { at: number; faultId: string }[], n: number, faultIds: ReadonlySet<string>): string | null {
  let prev = 0;
  for (const j of joins) {
    if (!faultIds.has(j.faultId)) return `a join names fault id "${j.faultId}", which the document does not have`;
    if (j.at < prev + 2 || j.at > n - 2) return `the join at vertex ${j.at} leaves a piece with fewer than two vertices (joins must increase and every piece needs two)`;
    prev = j.at;
  }
  return null;
}
