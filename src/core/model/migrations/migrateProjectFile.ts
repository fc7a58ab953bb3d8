// Brings a parsed project file up to the current version, one step at a time (DEVELOPERS.md §File versions:
// files carry a version; an unknown or newer version fails with a clear message).
import { checkProjectDoc } from '../projectSchema';
import { formatFieldProblem, PROJECT_FILE_VERSION, PROJECT_FORMAT, type EmbeddedScan, type ProjectFile } from './projectFileFormat';
import { v0ToV1 } from './v0ToV1';
import { v1ToV2 } from './v1ToV2';
import { checkedText, contentCheck } from './contentCheck';

export type MigrationResult = { ok: true; file: Record<string, unknown> } | { ok: false; message: string };
/** One step: a file of version n (already known to be that version) to version n + 1. */
export type MigrationStep = (file: Record<string, unknown>) => MigrationResult;

/** steps[n] migrates version n to n + 1; adding a version appends its step here (README.md in this folder). */
export const MIGRATION_STEPS: MigrationStep[] = [v0ToV1, v1ToV2];

export type ProjectFileCheck = { ok: true; file: ProjectFile; migratedFrom: number | null } | { ok: false; message: string };

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function checkScan(v: unknown): EmbeddedScan | null | string {
  if (v === null || v === undefined) return null;
  if (!isObject(v) || typeof v.type !== 'string' || typeof v.name !== 'string' || typeof v.dataBase64 !== 'string') {
    return 'the embedded scan must be { "type", "name", "dataBase64" } strings';
  }
  if (v.type.length > 100 || v.name.length > 500) return 'the embedded scan has an over-long type or name';
  if (!/^[A-Za-z0-9+/]*={0,2}$/.test(v.dataBase64)) return 'the embedded scan is not valid base64';
  return { type: v.type, name: v.name, dataBase64: v.dataBase64 };
}

/** Returns the file at the current version with its document checked against the schema, or a clear message; never throws. */
export function migrateProjectFile(raw: unknown): ProjectFileCheck {
  try {
    return migrate(raw);
  } catch (e) {
    // Hostile nesting can exhaust the stack inside a validator; that is a damaged file, not a crash.
    return { ok: false, message: `The project file cannot be read (${e instanceof Error ? e.name : 'error'}): it is damaged or not a project file.` };
  }
}

function migrate(raw: unknown): ProjectFileCheck {
  if (isObject(raw) && 'format' in raw && raw.format !== PROJECT_FORMAT) return { ok: false, message: formatFieldProblem(raw.format) };
  if (!isObject(raw) || raw.format !== PROJECT_FORMAT) {
    return { ok: false, message: `This is not a Foldroot project file (it has no "format": "${PROJECT_FORMAT}").` };
  }
  const version = raw.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return { ok: false, message: `The project file has an unknown version (${JSON.stringify(version) ?? 'none'}); it cannot be opened.` };
  }
  if (version > PROJECT_FILE_VERSION) {
    return { ok: false, message: `The project file is version ${version}, made by a newer Foldroot; this one reads up to version ${PROJECT_FILE_VERSION}. Open it in a newer build.` };
  }
  // The check covers the file as written, before any migration or schema copy.
  if (version === PROJECT_FILE_VERSION && raw.check !== undefined) {
    const scanText = typeof raw.scan === 'object' && raw.scan !== null && typeof (raw.scan as Record<string, unknown>).dataBase64 === 'string' ? (raw.scan as Record<string, string>).dataBase64 : null;
    let matches = false;
    try {
      matches = typeof raw.check === 'string' && raw.check === contentCheck(checkedText(raw.doc, scanText));
    } catch {
      // A document nested too deeply to write back out is damaged too.
    }
    if (!matches) {
      return { ok: false, message: 'The project file is damaged: its content no longer matches the check value written when it was saved. Open an earlier copy (if you edited the file by hand on purpose, delete its "check" line).' };
    }
  }
  let file: Record<string, unknown> = raw;
  for (let v = version; v < PROJECT_FILE_VERSION; v++) {
    const step = MIGRATION_STEPS[v](file);
    if (!step.ok) return step;
    file = step.file;
  }
  const doc = checkProjectDoc(file.doc);
  if (!doc.ok) return doc;
  const scan = checkScan(file.scan);
  if (typeof scan === 'string') return { ok: false, message: `The project file is not valid — ${scan}.` };
  const savedAt = typeof file.savedAt === 'string' ? { savedAt: file.savedAt } : {};
  return { ok: true, file: { format: PROJECT_FORMAT, version: PROJECT_FILE_VERSION, ...savedAt, doc: doc.doc, scan }, migratedFrom: version === PROJECT_FILE_VERSION ? null : version };
}
