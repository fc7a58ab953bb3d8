// Calibration points: click the scan to add a point of the chosen kind (its known value is typed in
// the Calibrate panel, which the tool asks to focus); drag an existing point to move it.
import { addCalibrationPoint } from '../../core/model/commands/addCalibrationPoint';
import { calibrationPoints, type CalibrationPointRef } from '../../core/model/commands/calibrationPointRef';
import { documentFit } from '../../core/model/commands/sectionFrame';
import { moveCalibrationPoint } from '../../core/model/commands/moveCalibrationPoint';
import { imageToSection } from '../../core/calibration/mapPoints';
import type { ImagePx, ProjectDoc } from '../../core/model/projectDoc';
import { nearestVertex } from '../hitTest';
import type { CalibrationPick, Tool } from '../toolTypes';

export type CalibrateState = { name: 'idle' } | { name: 'dragging'; ref: CalibrationPointRef; start: ImagePx; origin: ImagePx };

const idle: CalibrateState = { name: 'idle' };

/** Round a suggested value to 3 significant figures (the user types the true one). */
function round3(v: number): number {
  return Number.isFinite(v) ? Number(v.toPrecision(3)) : 0;
}

/** Returns the reference the new point will get once added to the document. */
function newRef(doc: ProjectDoc, pick: CalibrationPick): CalibrationPointRef {
  const cal = doc.calibration;
  if (pick === 'points') return { list: 'points', index: cal?.kind === 'affine' ? cal.points.length : 0 };
  return { list: pick, index: cal?.kind === 'axes' ? cal[pick].length : 0 };
}

export const calibrateTool: Tool<CalibrateState> = {
  id: 'calibrate',
  initial: idle,
  states: {
    idle: {
      pointerDown: (_s, e, ctx) => {
        if (e.button !== 0) return {};
        const points = calibrationPoints(ctx.doc.calibration);
        const i = nearestVertex(points.map((q) => [q.u, q.v] as ImagePx), e.p, ctx.tolerancePx);
        if (i >= 0) {
          const q = points[i];
          return { next: { name: 'dragging', ref: q.ref, start: e.p, origin: [q.u, q.v] }, commands: [{ type: 'beginGesture' }, { type: 'focusCalibrationPoint', ref: q.ref }] };
        }
        // A click near a drawn cross or tick lands on its centre (Alt-click: exactly where clicked).
        const p: ImagePx = e.alt ? e.p : (ctx.tracer?.snap(e.p, ctx.tolerancePx) ?? e.p);
        // Suggest the value the current fit predicts, so a point added to a good fit starts close.
        const fit = documentFit(ctx.doc);
        const [x, z] = fit ? imageToSection(fit, p) : [0, 0];
        const pick = ctx.calibrationPick;
        const known = { x: round3(x), z: round3(z), value: round3(pick === 'zPoints' ? z : x) };
        const ref = newRef(ctx.doc, pick);
        return { commands: [{ type: 'edit', edit: (d) => addCalibrationPoint(d, pick, p[0], p[1], known) }, { type: 'focusCalibrationPoint', ref }] };
      },
      cancel: () => ({}),
    },
    dragging: {
      pointerMove: (s, e) => ({ commands: [{ type: 'gestureEdit', edit: (d) => moveCalibrationPoint(d, s.ref, [s.origin[0] + e.p[0] - s.start[0], s.origin[1] + e.p[1] - s.start[1]]) }] }),
      pointerUp: () => ({ next: idle, commands: [{ type: 'endGesture' }] }),
      cancel: () => ({ next: idle, commands: [{ type: 'cancelGesture' }] }),
    },
  },
};
