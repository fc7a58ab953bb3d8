import type { ProjectDoc } from '../projectDoc';

/** Returns the document without the horizon, its regionals and its exclusions in every scenario; unchanged if unknown. */
export function deleteHorizon(doc: ProjectDoc, horizonId: string): ProjectDoc {
  if (!doc.horizons.some((h) => h.id === horizonId)) return doc;
  return {
    ...doc,
    horizons: doc.horizons.filter((h) => h.id !== horizonId),
    scenarios: doc.scenarios.map((s) => {
      const regionals = { ...s.regionals };
      delete regionals[horizonId];
      return { ...s, regionals, excluded: s.excluded.filter((id) => id !== horizonId) };
    }),
  };
}
