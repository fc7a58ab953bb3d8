// Draw a fault by clicking anchors, with the same gestures as a horizon (drawLineTool): the stretches
// follow the drawn line on the scan, Alt-click places a straight stretch, double-click or Enter
// finishes, Backspace removes the last stretch, Esc cancels. A fault is one piece; it is added in a
// fault colour, none of the horizon palette's (one undo entry per stretch, as a horizon). Its vertices are edited with Edit.
import { addFault, nextFaultId } from '../../core/model/commands/addFault';
import { setFaultPoints } from '../../core/model/commands/setFaultPoints';
import type { ToolCommand } from '../toolTypes';
import { drawLineTool, type DrawLineState } from '../drawHorizon/drawLineTool';
import { faultColour } from '../../core/model/horizonPalette';

export type DrawFaultState = DrawLineState;

export const drawFaultTool = drawLineTool({
  id: 'fault',
  noun: 'fault',
  inPieces: false,
  colour: (doc) => faultColour(doc.faults.length),
  add: (steps, doc) => {
    const id = nextFaultId(doc);
    const edits: ToolCommand[] = [{ type: 'edit', edit: (d) => addFault(d, { id, pointsPx: steps[0].pointsPx }) }];
    for (const step of steps.slice(1)) edits.push({ type: 'edit', edit: (d) => setFaultPoints(d, id, step.pointsPx) });
    return edits;
  },
});
