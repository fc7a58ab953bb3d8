import { describe, expect, it } from 'vitest';
import { calibrateTool } from '../../src/tools/calibrate/calibrateTool';
import { ToolHarness } from './toolHarness';
import { toolDoc } from './toolFixture';

// A stand-in tracer whose drawn cross is centred at (1003.25, 497.5): a click within 10 px of it snaps there.
const cross = {
  snap: (p: readonly number[]) => (Math.hypot(p[0] - 1003.25, p[1] - 497.5) <= 10 ? ([1003.25, 497.5] as [number, number]) : null),
  stretch: () => null,
};

describe('calibrateTool with a line tracer', () => {
  it('places a click near a drawn cross at its centre, and an Alt-click exactly where clicked', () => {
    const t = new ToolHarness(calibrateTool, toolDoc());
    t.tracer = cross;
    t.click([1000, 500]);
    const points = () => (t.doc.calibration?.kind === 'affine' ? t.doc.calibration.points : []);
    expect(points()[3]).toMatchObject({ u: 1003.25, v: 497.5 });
    // Beyond the pick tolerance of the point just placed, within the cross's reach: Alt keeps the click as it is.
    t.click([1010, 501], { alt: true });
    expect(points()[4]).toMatchObject({ u: 1010, v: 501 });
    // Far from the cross: no snap.
    t.click([1200, 300]);
    expect(points()[5]).toMatchObject({ u: 1200, v: 300 });
  });
});
