// Additions beyond the counted limits (src/core/model/limits.ts) are refused where they are made, through the document
// store's one apply; deletions and changes never are. Counts follow from the documents built here.
import { describe, expect, it } from 'vitest';
import { addedOverLimit } from '../../../src/core/model/addedOverLimit';
import { scenarioCreate } from '../../../src/core/model/commands/scenarioCreate';
import { scenarioDuplicate } from '../../../src/core/model/commands/scenarioDuplicate';
import { scenarioDelete } from '../../../src/core/model/commands/scenarioDelete';
import { addHorizon } from '../../../src/core/model/commands/addHorizon';
import { LIMITS } from '../../../src/core/model/limits';
import { emptyProjectDoc, type ProjectDoc } from '../../../src/core/model/projectDoc';
import { useDocStore } from '../../../src/state/docStore';
import { useSessionStore } from '../../../src/state/sessionStore';

function withScenarios(n: number): ProjectDoc {
  let doc = emptyProjectDoc();
  while (doc.scenarios.length < n) doc = scenarioCreate(doc, `S ${doc.scenarios.length}`);
  return doc;
}

function withHorizons(n: number): ProjectDoc {
  const doc = emptyProjectDoc();
  const base = { colour: '#336699', pointsPx: [[0, 0], [10, 0]] as [number, number][] };
  return { ...doc, horizons: Array.from({ length: n }, (_, i) => addHorizon(doc, { ...base, id: `h${i}` }).horizons[0]) };
}

describe('addedOverLimit', () => {
  it('refuses the scenario beyond the limit, by New and by Duplicate, and never a deletion', () => {
    const full = withScenarios(LIMITS.scenarios);
    expect(full.scenarios.length).toBe(200);
    const msg = 'No scenario was added: there would be too many scenarios for the app (201; the limit is 200). Delete a scenario first.';
    expect(addedOverLimit(full, scenarioCreate(full, 'One more'))).toBe(msg);
    expect(addedOverLimit(full, scenarioDuplicate(full, full.activeScenarioId))).toBe(msg);
    expect(addedOverLimit(full, scenarioDelete(full, full.activeScenarioId))).toBeNull();
    const almost = withScenarios(LIMITS.scenarios - 1);
    expect(addedOverLimit(almost, scenarioCreate(almost, 'The last'))).toBeNull();
  });

  it('refuses the horizon beyond the limit through the store, with the message, and leaves the document', () => {
    const full = withHorizons(LIMITS.horizons);
    useDocStore.getState().replace(full);
    const applied = useDocStore.getState().apply((d) => addHorizon(d, { id: 'extra', colour: '#000000', pointsPx: [[0, 5], [10, 5]] }));
    expect(applied).toBe(false);
    expect(useDocStore.getState().doc).toBe(full);
    expect(useDocStore.getState().past).toEqual([]);
    expect(useSessionStore.getState().message?.text).toBe('No horizon was added: there would be too many horizons for the app (2001; the limit is 2000). Delete a horizon first.');
    // One fewer, and the same addition is made.
    useDocStore.getState().replace({ ...full, horizons: full.horizons.slice(1) });
    expect(useDocStore.getState().apply((d) => addHorizon(d, { id: 'extra', colour: '#000000', pointsPx: [[0, 5], [10, 5]] }))).toBe(true);
    expect(useDocStore.getState().doc.horizons.length).toBe(2000);
  });
});
