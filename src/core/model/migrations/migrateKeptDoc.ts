// Work kept in the browser is the document alone, without a file's envelope. It comes back through
// the same steps as a project file (migrateProjectFile): wrapped as a file of the document's own
// version, migrated one version at a time, and checked against the current schema.
import type { ProjectDoc } from '../projectDoc';
import { migrateProjectFile } from './migrateProjectFile';
import { PROJECT_FORMAT } from './projectFileFormat';

export type KeptDocCheck = { ok: true; doc: ProjectDoc; migratedFrom: number | null } | { ok: false; message: string };

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/**
 * Returns a kept document brought up to the current version, with the version it was kept at when that
 * was older (else null), or a message saying why it cannot be restored; never throws. A document with a
 * `schemaVersion` is read at that version; content without one is read as version 0 (`title`, `section`).
 */
export function migrateKeptDoc(kept: unknown): KeptDocCheck {
  if (!isObject(kept)) return { ok: false, message: 'The work kept in this browser is not a project document.' };
  const file = 'schemaVersion' in kept
    ? { format: PROJECT_FORMAT, version: kept.schemaVersion, doc: kept, scan: null }
    : { ...kept, format: PROJECT_FORMAT, version: 0, scan: null };
  const r = migrateProjectFile(file);
  if (!r.ok) return { ok: false, message: r.message.replace(/^The project file/, 'The work kept in this browser') };
  return { ok: true, doc: r.file.doc, migratedFrom: r.migratedFrom };
}
