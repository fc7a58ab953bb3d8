// Version 1 → 2: a version-1 document had no faults and every horizon was one unbroken line.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { migrateProjectFile } from '../../../../src/core/model/migrations/migrateProjectFile';
import { v1ToV2 } from '../../../../src/core/model/migrations/v1ToV2';

const v1 = JSON.parse(readFileSync(new URL('../../../fixtures/projects/v1-two-horizons.json', import.meta.url), 'utf8')) as Record<string, unknown>;

describe('v1ToV2', () => {
  it('adds an empty list of faults and no joins to every horizon, leaving the rest as it was', () => {
    const r = v1ToV2(v1);
    if (!r.ok) throw new Error(r.message);
    const doc = r.file.doc as Record<string, unknown> & { horizons: Record<string, unknown>[] };
    const before = v1.doc as Record<string, unknown> & { horizons: Record<string, unknown>[] };
    expect(r.file.version).toBe(2);
    expect(doc.schemaVersion).toBe(2);
    expect(doc.faults).toEqual([]);
    doc.horizons.forEach((h, i) => expect(h).toEqual({ ...before.horizons[i], joins: [] }));
    expect(doc.scenarios).toEqual(before.scenarios);
  });

  it('opens the version-1 file to a current document that says it was migrated from version 1', () => {
    const r = migrateProjectFile(v1);
    if (!r.ok) throw new Error(r.message);
    expect(r.migratedFrom).toBe(1);
    expect(r.file.doc.faults).toEqual([]);
  });

  it('refuses a version-1 file without a document, with a message', () => {
    const r = v1ToV2({ ...v1, doc: null });
    expect(r.ok).toBe(false);
  });
});
