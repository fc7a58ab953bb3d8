// Version 2 adds faults: the document gets a list of faults and every horizon a list of joins (where
// it is cut by a fault into pieces). A version-1 document had neither: no faults, every horizon one
// unbroken line. Anything else in the document is left for the schema check that follows.
import type { MigrationStep } from './migrateProjectFile';

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Migrates a version-1 file to version 2: `faults: []` on the document and `joins: []` on every horizon (kept when already there). */
export const v1ToV2: MigrationStep = (file) => {
  const doc = file.doc;
  if (!isObject(doc)) return { ok: false, message: 'The project file is not valid — it has no document ("doc").' };
  const horizons = Array.isArray(doc.horizons)
    ? doc.horizons.map((h: unknown) => (isObject(h) ? { ...h, joins: Array.isArray(h.joins) ? h.joins : [] } : h))
    : doc.horizons;
  const faults = Array.isArray(doc.faults) ? doc.faults : [];
  return { ok: true, file: { ...file, version: 2, doc: { ...doc, schemaVersion: 2, horizons, faults } } };
};
