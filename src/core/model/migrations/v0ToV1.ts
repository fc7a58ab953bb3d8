// Version 0 of the project file was the plain section (section units) under "section", with no
// scan and no calibration. Version 1 stores the document in image pixels; the step draws the
// section on a true-scale stand-in canvas (sectionToProjectDoc).
import { validateSection } from '../validateSection';
import { PROJECT_FORMAT } from './projectFileFormat';
import { sectionToProjectDoc } from './sectionToProjectDoc';
import type { MigrationStep } from './migrateProjectFile';

/** Migrates a version-0 file ({ format, version: 0, title?, section }) to version 1, or says which part of the section is wrong. */
export const v0ToV1: MigrationStep = (file) => {
  const checked = validateSection(file.section);
  if (!checked.ok) {
    const first = checked.problems.slice(0, 3).map((p) => p.message).join(' ');
    return { ok: false, message: `The section in this version-0 file is not valid: ${first}` };
  }
  const title = typeof file.title === 'string' && file.title.length <= 500 ? file.title : 'Section';
  return { ok: true, file: { format: PROJECT_FORMAT, version: 1, doc: sectionToProjectDoc(checked.section, title), scan: null } };
};
