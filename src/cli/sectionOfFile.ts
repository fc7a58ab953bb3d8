// What the command line analyses in a parsed file: a plain section file, a section under
// "section", or the app's project file ({ format: "foldroot-project", version, doc, … }), which
// is migrated with the core migrations and turned into the chosen scenario's section.
import { activeScenario, docToSection } from '../core/model/docToSection';
import { migrateProjectFile } from '../core/model/migrations/migrateProjectFile';
import { formatFieldProblem, PROJECT_FORMAT } from '../core/model/migrations/projectFileFormat';
import type { ProjectDoc } from '../core/model/projectDoc';

export type FileSection =
  /** `section` is still unchecked JSON for a section file; `notes` lead the report; `source` names the project and scenario. */
  | { ok: true; section: unknown; notes: string[]; source: string | null }
  | { ok: false; message: string };

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The section to analyse in the parsed file (the named scenario of a project file, else its active one), or one message saying why there is none. */
export function sectionOfFile(raw: unknown, scenarioName?: string): FileSection {
  if (isObject(raw) && raw.format === PROJECT_FORMAT) {
    const migrated = migrateProjectFile(raw);
    if (!migrated.ok) return migrated;
    return projectSection(migrated.file.doc, scenarioName);
  }
  // A "format" field marks a project file: a misspelt one is named, not taken for a section with no units.
  if (isObject(raw) && 'format' in raw) return { ok: false, message: formatFieldProblem(raw.format) };
  if (scenarioName !== undefined) return { ok: false, message: '--scenario applies only to a project file (one with "format": "foldroot-project").' };
  // A section embedded under "section" (the shape version-0 project files had); else the file is the section.
  const section = isObject(raw) && !('horizons' in raw) && 'section' in raw ? raw.section : raw;
  return { ok: true, section, notes: [], source: null };
}

function projectSection(doc: ProjectDoc, scenarioName: string | undefined): FileSection {
  const scenario = scenarioName === undefined ? activeScenario(doc) : doc.scenarios.find((s) => s.name === scenarioName);
  if (!scenario) {
    return { ok: false, message: `the project has no scenario named "${scenarioName}"; its scenarios are ${doc.scenarios.map((s) => `"${s.name}"`).join(', ')}.` };
  }
  const who = `scenario "${scenario.name}"`;
  if (!doc.calibration) return { ok: false, message: 'the project is not calibrated: calibrate the scan in the app (known x and z positions), save, and run again.' };
  const ds = docToSection(doc, scenario.id);
  if (!ds.ok) {
    return { ok: false, message: ds.fit ? `${who} has no pins: place the two pins in the app, save, and run again.` : `the project's calibration cannot be used: ${ds.message}` };
  }
  // Horizons not ready are left out with a note, as the app does; with none left there is nothing to analyse.
  const left = [
    ...ds.skippedFaults.map((f) => `Fault "${f.name}" is left out: ${f.reason}.`),
    ...ds.skipped.map((s) => `Horizon "${s.name}" is left out: ${s.reason}.`),
  ];
  if (ds.section.horizons.length === 0) {
    if (doc.horizons.length === 0) return { ok: false, message: 'the project has no horizons: digitise at least one horizon in the app, save, and run again.' };
    const why = ds.skipped.map((s) => `"${s.name}" (${s.reason})`).join(', ');
    return { ok: false, message: `${who} has no horizon ready to analyse: ${why}; draw the regionals in the app, save, and run again.` };
  }
  return { ok: true, section: ds.section, notes: left, source: `Project "${doc.title}", ${who}.` };
}
