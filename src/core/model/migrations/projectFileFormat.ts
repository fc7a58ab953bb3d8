// The project file's envelope: a format name and a version, around the document and the scan bytes.
import { SCHEMA_VERSION, type ProjectDoc } from '../projectDoc';

export const PROJECT_FORMAT = 'foldroot-project';
/** The version this build writes (the document's SCHEMA_VERSION); older ones are migrated one step at a time, newer ones refused. */
export const PROJECT_FILE_VERSION = SCHEMA_VERSION;

/** The scan embedded in a project file: MIME type, file name and the original bytes in base64. */
export interface EmbeddedScan { type: string; name: string; dataBase64: string }

/** A project file at the current version. */
export interface ProjectFile {
  format: typeof PROJECT_FORMAT;
  version: typeof SCHEMA_VERSION;
  savedAt?: string;
  /** The caution of docs/method.md §Cautions (written on every save, not checked on open; files without it open). */
  caution?: string;
  /** contentCheck(checkedText(doc, scan base64)); optional, verified when present. */
  check?: string;
  doc: ProjectDoc;
  scan: EmbeddedScan | null;
}

/** Returns the message for a "format" field that is not PROJECT_FORMAT, naming the field and what it holds. */
export function formatFieldProblem(format: unknown): string {
  const got = typeof format === 'string' ? `"${format.slice(0, 60)}"` : (JSON.stringify(format) ?? 'undefined').slice(0, 60);
  return `the "format" field is ${got}, not "${PROJECT_FORMAT}": fix that field (a project file has "format": "${PROJECT_FORMAT}"; a section file has no "format" field).`;
}
