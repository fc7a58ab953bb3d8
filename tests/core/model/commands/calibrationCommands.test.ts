// Calibration points as edits: add (switching kind), move, retype, delete.
import { describe, expect, it } from 'vitest';
import { addCalibrationPoint } from '../../../../src/core/model/commands/addCalibrationPoint';
import { calibrationPoints } from '../../../../src/core/model/commands/calibrationPointRef';
import { deleteCalibrationPoint } from '../../../../src/core/model/commands/deleteCalibrationPoint';
import { moveCalibrationPoint } from '../../../../src/core/model/commands/moveCalibrationPoint';
import { setUnits } from '../../../../src/core/model/commands/setUnits';
import { updateCalibrationPoint } from '../../../../src/core/model/commands/updateCalibrationPoint';
import { fixtureDoc } from './docFixture';

describe('calibration commands', () => {
  it('addCalibrationPoint adds control points to an affine calibration', () => {
    const doc = addCalibrationPoint(fixtureDoc(), 'points', 1000, 500, { x: 10_000, z: -4000 });
    expect(doc.calibration).toEqual({ kind: 'affine', points: [...(fixtureDoc().calibration as { points: unknown[] }).points, { u: 1000, v: 500, x: 10_000, z: -4000 }] });
  });

  it('addCalibrationPoint of an x or z point starts a per-axis calibration in place of an affine one', () => {
    let doc = addCalibrationPoint(fixtureDoc(), 'xPoints', 10, 20, { value: 100 });
    doc = addCalibrationPoint(doc, 'zPoints', 30, 40, { value: -5 });
    expect(doc.calibration).toEqual({ kind: 'axes', xPoints: [{ u: 10, v: 20, value: 100 }], zPoints: [{ u: 30, v: 40, value: -5 }] });
    expect(calibrationPoints(doc.calibration).map((p) => p.ref)).toEqual([{ list: 'xPoints', index: 0 }, { list: 'zPoints', index: 0 }]);
  });

  it('moveCalibrationPoint and updateCalibrationPoint change one point; an identical value is no change', () => {
    const doc = fixtureDoc();
    const moved = moveCalibrationPoint(doc, { list: 'points', index: 1 }, [990, 5]);
    expect(moved.calibration).toMatchObject({ points: [{}, { u: 990, v: 5, x: 10_000, z: 1000 }, {}] });
    const typed = updateCalibrationPoint(doc, { list: 'points', index: 2 }, { z: -3900 });
    expect(typed.calibration).toMatchObject({ points: [{}, {}, { u: 0, v: 500, x: 0, z: -3900 }] });
    expect(updateCalibrationPoint(doc, { list: 'points', index: 2 }, { z: -4000 })).toBe(doc);
    expect(updateCalibrationPoint(doc, { list: 'xPoints', index: 0 }, { value: 1 })).toBe(doc);
  });

  it('deleteCalibrationPoint removes one point; setUnits sets the unit', () => {
    const doc = deleteCalibrationPoint(fixtureDoc(), { list: 'points', index: 0 });
    expect(calibrationPoints(doc.calibration)).toHaveLength(2);
    expect(setUnits(doc, 'ft').units).toBe('ft');
    expect(setUnits(doc, 'm')).toBe(doc);
  });
});
