import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
import type { Section } from '../../src/core/model/section';
import { serializeProject } from '../../src/io/projectFile';

// The app's real project file for the command-line tests: the synthetic example (docs/method.md §Check values) drawn
// by sectionToProjectDoc (as opening a section file in the app does), with a second scenario,
// written by the app's own serializeProject. tests/fixtures/sections/project-embedded.json holds
// this text; `REGEN=1 npx vitest run tests/cli` rewrites it.

export const fixtures = join(import.meta.dirname, '..', 'fixtures', 'sections');
export const PROJECT_FIXTURE = join(fixtures, 'project-embedded.json');
/** A fixed save time, so the file is the same on every run. */
export const SAVED_AT = '2024-01-01T00:00:00.000Z';
export const SECOND_SCENARIO = 'Without H4';

/** The project document: scenario "Base case" (active, all four horizons) and "Without H4" (H4 left out of the fit). */
export function methodExampleProject(): ProjectDoc {
  const section = JSON.parse(readFileSync(join(fixtures, 'method-example.json'), 'utf8')) as Section;
  const doc = sectionToProjectDoc(section, 'Method example');
  const base = doc.scenarios[0];
  const h4 = doc.horizons.find((h) => h.name === 'H4')!.id;
  const second = { ...base, id: 'scenario-2', name: SECOND_SCENARIO, excluded: [h4] };
  return { ...doc, scenarios: [base, second], activeScenarioId: base.id };
}

/** The project file text exactly as the app saves it (no scan embedded). */
export function projectFileText(doc: ProjectDoc = methodExampleProject()): string {
  return serializeProject(doc, null, SAVED_AT);
}
