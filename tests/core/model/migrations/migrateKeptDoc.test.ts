// Kept work and project files come back through one migration: for a fixture of every earlier version
// (tests/fixtures/projects/v<n>-*.json), the document kept in the browser and the project file give the
// same current document, and the same analysis as the version-0 section analysed directly.
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../../src/core/analysis/analyseSection';
import { docToSection } from '../../../../src/core/model/docToSection';
import { migrateKeptDoc } from '../../../../src/core/model/migrations/migrateKeptDoc';
import { migrateProjectFile } from '../../../../src/core/model/migrations/migrateProjectFile';
import { SCHEMA_VERSION } from '../../../../src/core/model/projectDoc';
import type { Section } from '../../../../src/core/model/section';

const dir = new URL('../../../fixtures/projects/', import.meta.url);
const fixtures = readdirSync(dir)
  .filter((f) => /^v\d+-.*\.json$/.test(f))
  .map((name) => ({ name, file: JSON.parse(readFileSync(new URL(name, dir), 'utf8')) as Record<string, unknown> }));

/** What the browser would hold for this file: the document alone (version 0: the file's content without its envelope). */
function keptFormOf(file: Record<string, unknown>): unknown {
  if (file.version === 0) {
    const { format: _format, version: _version, ...content } = file;
    return content;
  }
  return file.doc;
}

const v0Section = (fixtures.find((f) => f.file.version === 0)!.file.section) as Section;

describe('migrateKeptDoc(kept)', () => {
  it('has a fixture of every earlier version and of the current one', () => {
    const versions = new Set(fixtures.map((f) => f.file.version));
    for (let v = 0; v <= SCHEMA_VERSION; v++) expect(versions.has(v), `a fixture tests/fixtures/projects/v${v}-*.json`).toBe(true);
  });

  for (const { name, file } of fixtures) {
    it(`restores the kept form of ${name} to the document the project file opens to`, () => {
      const opened = migrateProjectFile(file);
      if (!opened.ok) throw new Error(opened.message);
      const kept = migrateKeptDoc(keptFormOf(file));
      if (!kept.ok) throw new Error(kept.message);
      expect(kept.doc).toEqual(opened.file.doc);
      expect(kept.doc.schemaVersion).toBe(SCHEMA_VERSION);
      expect(kept.migratedFrom).toBe(file.version === SCHEMA_VERSION ? null : file.version);
    });

    it(`gives, from the kept form of ${name}, the analysis of the version-0 section analysed directly`, () => {
      // Both fixtures draw one section (two triangle folds, invented); the excess areas are exact triangles
      // (analytic: 1000 × 400 / 2 = 200 000 m² and 1000 × 300 / 2 = 150 000 m²).
      const kept = migrateKeptDoc(keptFormOf(file));
      if (!kept.ok) throw new Error(kept.message);
      const ds = docToSection(kept.doc);
      if (!ds.ok) throw new Error(ds.message);
      const viaKept = analyseSection(ds.section);
      const direct = analyseSection(v0Section);
      if (!viaKept.ok || !direct.ok) throw new Error('analysis failed');
      viaKept.analysis.horizons.forEach((h, i) => expect(h.excessArea).toBeCloseTo(direct.analysis.horizons[i].excessArea, 4));
      expect(direct.analysis.horizons[0].excessArea).toBeCloseTo(200_000, 6);
      expect(direct.analysis.horizons[1].excessArea).toBeCloseTo(150_000, 6);
    });
  }

  it('refuses a document kept by a newer build, naming both versions', () => {
    const current = fixtures.find((f) => f.file.version === SCHEMA_VERSION)!.file.doc as Record<string, unknown>;
    const r = migrateKeptDoc({ ...current, schemaVersion: SCHEMA_VERSION + 1 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.message).toContain(`version ${SCHEMA_VERSION + 1}`);
    expect(r.message).toContain(`up to version ${SCHEMA_VERSION}`);
    expect(r.message.startsWith('The work kept in this browser')).toBe(true);
  });

  it('refuses what is not a document, and a document that fails the schema, without throwing', () => {
    expect(migrateKeptDoc(null).ok).toBe(false);
    expect(migrateKeptDoc([1, 2]).ok).toBe(false);
    const current = fixtures.find((f) => f.file.version === SCHEMA_VERSION)!.file.doc as Record<string, unknown>;
    const r = migrateKeptDoc({ ...current, horizons: 'nope' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('horizons');
  });
});
