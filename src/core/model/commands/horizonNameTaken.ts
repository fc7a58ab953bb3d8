import type { ProjectDoc } from '../projectDoc';

// Horizon names key the results (the section file, the CLI and the validator refuse a name used
// twice), so a rename must never give two horizons one name.

/** Returns true when a horizon other than `horizonId` already has the trimmed `name`; false for a blank name. */
export function horizonNameTaken(doc: ProjectDoc, horizonId: string, name: string): boolean {
  const trimmed = name.trim();
  if (trimmed === '') return false;
  return doc.horizons.some((h) => h.id !== horizonId && (h.name === trimmed || h.name.trim() === trimmed));
}
