// Saving and opening the project file (format in README-formats.md). Parsing is pure and never
// throws: a bad file yields a message and the caller leaves the open project as it was.
import { SECTION_CAUTION } from '../core/analysis/caution';
import type { ProjectDoc } from '../core/model/projectDoc';
import { validateSection } from '../core/model/validateSection';
import { jsonDepthProblem } from '../core/model/jsonDepthProblem';
import { LIMITS } from '../core/model/limits';
import { migrateProjectFile } from '../core/model/migrations/migrateProjectFile';
import { sectionToProjectDoc } from '../core/model/migrations/sectionToProjectDoc';
import { PROJECT_FILE_VERSION, PROJECT_FORMAT, type ProjectFile } from '../core/model/migrations/projectFileFormat';
import { base64ToBytes, bytesToBase64 } from './base64';
import { checkedText, contentCheck } from '../core/model/migrations/contentCheck';

/** Largest project or section file opened, in bytes: the one limit of limits.ts, as on the command line (the browser cannot hold a longer text). */
export const MAX_PROJECT_FILE_BYTES = LIMITS.fileBytes;

/** Words of the note given when a project file's scan is not stored in it (the open action rewords it when the scan is still cached). */
export const SCAN_NOT_STORED_MARK = 'is not stored in this file';

export interface ScanBytes { type: string; name: string; bytes: Uint8Array }

export type OpenedProject =
  | { ok: true; doc: ProjectDoc; scan: ScanBytes | null; kind: 'project' | 'section'; migratedFrom: number | null; notes: string[] }
  | { ok: false; message: string };

/** Returns the project file text (JSON, with the caution in a "caution" field) for the document and the scan's original bytes. */
export function serializeProject(doc: ProjectDoc, scan: ScanBytes | null, savedAt = new Date().toISOString()): string {
  const embedded = scan ? { type: scan.type, name: scan.name, dataBase64: bytesToBase64(scan.bytes) } : null;
  const file: ProjectFile = {
    format: PROJECT_FORMAT,
    version: PROJECT_FILE_VERSION,
    savedAt,
    // Outside the check and the document: the caution is for whoever reads the file, not project data.
    caution: SECTION_CAUTION,
    check: contentCheck(checkedText(doc, embedded?.dataBase64 ?? null)),
    doc,
    scan: embedded,
  };
  return JSON.stringify(file);
}

function baseName(fileName: string): string {
  return fileName.replace(/\.[^.]*$/, '').slice(0, 200) || 'Section';
}

/** Returns the document (and scan bytes) in a project file or plain section file, or a message saying why it cannot be opened. */
export function parseProjectText(text: string, fileName = 'The file'): OpenedProject {
  try {
    return parse(text, fileName);
  } catch (e) {
    // Last guard: hostile nesting can exhaust the stack in a validator; report it as a damaged file.
    return { ok: false, message: `${fileName} cannot be read (${e instanceof Error ? e.name : 'error'}): it is damaged or not a project file.` };
  }
}

function parse(text: string, fileName: string): OpenedProject {
  const who = fileName;
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return { ok: false, message: `${who} is empty.` };
  const deep = jsonDepthProblem(body);
  if (deep) return { ok: false, message: `${who} cannot be opened: ${deep}; it is not a section or project file.` };
  let raw: unknown;
  try {
    raw = JSON.parse(body);
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    return { ok: false, message: `${who} is not valid JSON — it may be truncated or damaged (${detail.slice(0, 120)}).` };
  }
  if (typeof raw === 'object' && raw !== null && !Array.isArray(raw) && !('format' in raw) && 'horizons' in raw && 'pins' in raw) {
    const checked = validateSection(raw);
    if (!checked.ok) {
      return { ok: false, message: `${who} looks like a section file but is not valid: ${checked.problems.slice(0, 3).map((p) => p.message).join(' ')}` };
    }
    return { ok: true, doc: sectionToProjectDoc(checked.section, baseName(fileName)), scan: null, kind: 'section', migratedFrom: null, notes: ['Opened as a section file: the horizons are drawn on a true-scale canvas (no scan).'] };
  }
  const migrated = migrateProjectFile(raw);
  if (!migrated.ok) return { ok: false, message: `${who}: ${migrated.message}` };
  const { doc, scan } = migrated.file;
  const notes: string[] = [];
  if (migrated.migratedFrom !== null) notes.push(`Updated from project file version ${migrated.migratedFrom}.`);
  let scanBytes: ScanBytes | null = null;
  if (scan && doc.scan) {
    const bytes = base64ToBytes(scan.dataBase64);
    if (!bytes) return { ok: false, message: `${who}: the embedded scan is damaged (not valid base64).` };
    scanBytes = { type: scan.type, name: scan.name, bytes };
  } else if (doc.scan) {
    notes.push(`The scan "${doc.scan.name}" ${SCAN_NOT_STORED_MARK}; open the image again to see it.`);
  }
  return { ok: true, doc, scan: scanBytes, kind: 'project', migratedFrom: migrated.migratedFrom, notes };
}
