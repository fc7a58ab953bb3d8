// A section file with faults and horizons in pieces opens in the workspace through the real opener
// (openProjectFile): faults, one flat list of vertices per horizon with its joins, and the analysis of
// the opened document gives the forward model's D and zd (vertical simple shear over a ramp-flat fault;
// Gibbs 1983, J. Struct. Geol. 5, for the construction; exact areas our derivation, docs/method.md §Forward models).
import { describe, expect, it, vi } from 'vitest';
import { analyseDoc } from '../../src/core/analysis/analyseDocGesture';
import { faultedSection } from '../../src/core/forward/faultedSection';
import type { XZ } from '../../src/core/model/section';
import { expectClose } from '../expectClose';

vi.mock('../../src/io/decodeScan', () => ({ decodeScan: vi.fn(async () => ({ ok: false, message: 'no decoding in tests' })) }));
const { openProjectFile } = await import('../../src/state/projectActions');
const { useDocStore } = await import('../../src/state/docStore');
const { useSessionStore } = await import('../../src/state/sessionStore');

const fault: XZ[] = [[-6000, -2500], [5000, -2500], [7000, -1000], [8500, 600], [30000, 600]];

describe('opening a faulted section file in the workspace', () => {
  for (const [label, D] of [['thrust', 1200], ['normal fault', -900]] as const) {
    it(`opens a ${label} with its fault and joins and gives D and zd`, async () => {
      const { section, truth } = faultedSection({
        units: 'm', pins: [0, 16000], displacement: D, fault, faultName: 'Lower ramp',
        horizons: [{ name: 'Upper bed', regionalElevation: 200 }, { name: 'Lower bed', regionalElevation: -1400 }],
      });
      vi.stubGlobal('window', { confirm: () => true });
      useDocStore.getState().markSaved();
      expect(await openProjectFile(new File([JSON.stringify(section)], 'ramp.json'))).toBe(true);
      vi.unstubAllGlobals();
      const doc = useDocStore.getState().doc;
      expect(useSessionStore.getState().message?.text).toContain('Opened ramp.json');
      expect(doc.faults.map((f) => f.name)).toEqual(['Lower ramp']);
      doc.horizons.forEach((h, i) => {
        expect(h.joins).toEqual([{ at: section.horizons[i].pieces![0].length, faultId: doc.faults[0].id }]);
      });
      const a = analyseDoc(doc);
      if (!a.outcome?.ok) throw new Error('no analysis');
      expectClose(a.outcome.analysis.areaDepth!.displacement, D, 1e-9);
      expectClose(a.outcome.analysis.areaDepth!.detachmentElevation!, truth.detachmentElevation, 1e-9);
      expect(a.outcome.analysis.horizons.map((h) => h.pieces)).toEqual([2, 2]);
    });
  }
});
