import type { ProjectDoc, ProjectSettings } from '../projectDoc';

/** Returns the document with some display settings changed (fills, grid, detachment); unchanged when nothing differs. */
export function setSettings(doc: ProjectDoc, change: Partial<ProjectSettings>): ProjectDoc {
  const same = (Object.keys(change) as (keyof ProjectSettings)[]).every((k) => change[k] === undefined || change[k] === doc.settings[k]);
  return same ? doc : { ...doc, settings: { ...doc.settings, ...change } };
}
