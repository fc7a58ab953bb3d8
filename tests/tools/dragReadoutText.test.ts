// The readout beside the pointer while dragging: the dragged regional handle's z, a
// whole regional's Δz, a pin's x; in section units from the calibration (10 m per pixel, z = 1000 m at v = 0).
import { describe, expect, it } from 'vitest';
import { offsetRegionals } from '../../src/core/model/commands/offsetRegionals';
import { setPins } from '../../src/core/model/commands/setPins';
import { setRegional } from '../../src/core/model/commands/setRegional';
import { emptyProjectDoc } from '../../src/core/model/projectDoc';
import { dragReadoutText } from '../../src/tools/dragReadoutText';
import { toolDoc } from './toolFixture';

function started() {
  let doc = toolDoc();
  doc = { ...doc, horizons: [...doc.horizons, { ...doc.horizons[0], id: 'h2', name: 'Lower' }] };
  doc = setRegional(doc, 'h1', [[0, 100], [1000, 100]]);
  doc = setRegional(doc, 'h2', [[0, 200], [1000, 200]]);
  return setPins(doc, [[100, 300], [900, 300]]);
}

describe('dragReadoutText(doc, start, tool, screenScale)', () => {
  it('gives the dragged regional handle z in section units, with the minus sign', () => {
    const start = started();
    const doc = setRegional(start, 'h1', [[0, 100], [1000, 150.2]]);
    // v = 150.2 px -> z = 1000 − 10·150.2 = −502 m; at 1 screen px per image px one pixel is 10 m: whole metres.
    expect(dragReadoutText(doc, start, 'regional', 1)).toBe('z \u2212502 m');
    // At 100 screen px per image px one screen pixel is 0.1 m: decimetres.
    expect(dragReadoutText(doc, start, 'regional', 100)).toBe('z \u2212502.0 m');
  });

  it('gives Δz for a whole regional and for all of them (Shift-drag)', () => {
    const start = started();
    expect(dragReadoutText(offsetRegionals(start, ['h2'], 120), start, 'regional', 1)).toBe('Δz +120 m');
    expect(dragReadoutText(offsetRegionals(start, null, -30), start, 'regional', 1)).toBe('all regionals Δz \u221230 m');
  });

  it('gives the dragged pin x', () => {
    const start = started();
    expect(dragReadoutText(setPins(start, [[100, 300], [880.04, 300]]), start, 'pins', 1)).toBe('pin x 8800 m');
    expect(dragReadoutText(setPins(start, [[-0.01, 300], [900, 300]]), start, 'pins', 1)).toBe('pin x 0 m');
  });

  it('is null when nothing of the tool moved, and uses px before calibration', () => {
    const start = started();
    expect(dragReadoutText(start, start, 'regional', 1)).toBeNull();
    expect(dragReadoutText(setPins(start, [[100, 300], [800, 300]]), start, 'regional', 1)).toBeNull();
    const raw = setPins(emptyProjectDoc(), [[10, 0], [50, 0]]);
    expect(dragReadoutText(setPins(raw, [[12.5, 0], [50, 0]]), raw, 'pins', 1)).toBe('pin x 13 px');
  });
});
