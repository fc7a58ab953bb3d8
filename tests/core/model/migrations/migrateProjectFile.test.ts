import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../../src/core/analysis/analyseSection';
import { fitCalibration } from '../../../../src/core/calibration/fitCalibration';
import { migrateProjectFile, MIGRATION_STEPS } from '../../../../src/core/model/migrations/migrateProjectFile';
import { PROJECT_FILE_VERSION } from '../../../../src/core/model/migrations/projectFileFormat';
import { sectionToProjectDoc } from '../../../../src/core/model/migrations/sectionToProjectDoc';
import { docToSection } from '../../../../src/core/model/docToSection';
import { emptyProjectDoc } from '../../../../src/core/model/projectDoc';
import { checkProjectDoc } from '../../../../src/core/model/projectSchema';
import { checkedText, contentCheck } from '../../../../src/core/model/migrations/contentCheck';
import { SECTION_CAUTION } from '../../../../src/core/analysis/caution';
import type { Section } from '../../../../src/core/model/section';

const v0 = JSON.parse(readFileSync(new URL('../../../fixtures/projects/v0-two-horizons.json', import.meta.url), 'utf8'));

describe('migrateProjectFile', () => {
  it('has one step per version below the current one', () => {
    expect(MIGRATION_STEPS.length).toBe(PROJECT_FILE_VERSION);
  });

  it('migrates a version-0 file step by step to a valid current document', () => {
    const r = migrateProjectFile(v0);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe(0);
    expect(r.file.version).toBe(PROJECT_FILE_VERSION);
    expect(r.file.doc.title).toBe('Version-0 sample (invented)');
    expect(r.file.doc.horizons.map((h) => h.name)).toEqual(['Upper marker', 'Lower marker']);
    expect(checkProjectDoc(r.file.doc).ok).toBe(true);
    // The stand-in canvas is true scale: vertical exaggeration exactly 1.
    const fit = fitCalibration(r.file.doc.calibration!);
    expect(fit.ok && fit.fit.verticalExaggeration).toBeCloseTo(1, 12);
  });

  it('gives the same analysis after migration as the section analysed directly', () => {
    const r = migrateProjectFile(v0);
    if (!r.ok) throw new Error(r.message);
    const ds = docToSection(r.file.doc);
    if (!ds.ok) throw new Error(ds.message);
    const direct = analyseSection(v0.section as Section);
    const viaDoc = analyseSection(ds.section);
    if (!direct.ok || !viaDoc.ok) throw new Error('analysis failed');
    // Exact triangle areas (analytic): 1000 × 400 / 2 = 200 000 m² and 1000 × 300 / 2 = 150 000 m².
    expect(direct.analysis.horizons[0].excessArea).toBeCloseTo(200_000, 6);
    direct.analysis.horizons.forEach((h, i) => {
      expect(viaDoc.analysis.horizons[i].excessArea).toBeCloseTo(h.excessArea, 4);
      expect(viaDoc.analysis.horizons[i].bedLength).toBeCloseTo(h.bedLength, 8);
    });
    expect(viaDoc.analysis.areaDepth!.detachmentDepth!).toBeCloseTo(direct.analysis.areaDepth!.detachmentDepth!, 6);
  });

  it('keeps a file of the current version unchanged (migratedFrom null)', () => {
    const doc = sectionToProjectDoc(v0.section as Section, 'x');
    const r = migrateProjectFile({ format: 'foldroot-project', version: PROJECT_FILE_VERSION, doc, scan: null });
    expect(r.ok && r.migratedFrom).toBe(null);
    expect(r.ok && r.file.doc).toEqual(doc);
  });

  it('refuses a newer version with a message naming both versions', () => {
    const r = migrateProjectFile({ format: 'foldroot-project', version: 7, doc: emptyProjectDoc(), scan: null });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(new RegExp(`version 7.*newer.*up to version ${PROJECT_FILE_VERSION}`));
  });

  it('refuses unknown versions, other formats and a version-0 file with a bad section', () => {
    for (const version of [-1, 0.5, '1', null]) {
      const r = migrateProjectFile({ format: 'foldroot-project', version, doc: emptyProjectDoc() });
      expect(!r.ok && r.message).toMatch(/unknown version/);
    }
    expect(migrateProjectFile({ format: 'something-else', version: 1 }).ok).toBe(false);
    const bad = migrateProjectFile({ format: 'foldroot-project', version: 0, section: { units: 'cubits', pins: [0, 1], horizons: [] } });
    expect(!bad.ok && bad.message).toMatch(/version-0.*units/);
  });

  it('refuses a version-1 file whose document breaks the schema, naming the path', () => {
    const doc = { ...emptyProjectDoc(), horizons: [{ id: 'a', name: 'A', colour: '#000', visible: true, locked: false, pointsPx: [[0, 'x']], projected: [] }] };
    const r = migrateProjectFile({ format: 'foldroot-project', version: PROJECT_FILE_VERSION, doc, scan: null });
    expect(!r.ok && r.message).toMatch(/horizons\.0\.pointsPx\.0\.1/);
  });

  it('opens a current file with or without the "caution" field; the check covers the document, not the caution', () => {
    const doc = sectionToProjectDoc(v0.section as Section, 'x');
    const check = contentCheck(checkedText(doc, null));
    const withCaution = migrateProjectFile({ format: 'foldroot-project', version: PROJECT_FILE_VERSION, caution: SECTION_CAUTION, check, doc, scan: null });
    const without = migrateProjectFile({ format: 'foldroot-project', version: PROJECT_FILE_VERSION, check, doc, scan: null });
    expect(withCaution.ok && withCaution.file.doc).toEqual(doc);
    expect(without.ok && without.file.doc).toEqual(doc);
    // The check still catches a changed document when a caution is present.
    const changed = migrateProjectFile({ format: 'foldroot-project', version: PROJECT_FILE_VERSION, caution: SECTION_CAUTION, check, doc: { ...doc, title: 'y' }, scan: null });
    expect(!changed.ok && changed.message).toMatch(/damaged.*check value/);
  });
});
