// Draw a fault by clicking anchors, with the same gestures as a horizon (drawLineTool): the stretches
// follow the drawn line on the scan, Alt-click places a straight stretch, double-click or Enter
// finishes, Backspace removes the last stretch, Esc cancels. A fault is one piece; it is added in a
// fault colour, none of the horizon palette's (one undo entry). Its vertices are edited with Edit.
import { addFault } from '../../core/model/commands/addFault';
import { drawLineTool, type DrawLineState } from '../drawHorizon/drawLineTool';
import { faultColour } from '../faultStyle';

export type DrawFaultState = DrawLineState;

export const drawFaultTool = drawLineTool({
  id: 'fault',
  noun: 'fault',
  inPieces: false,
  colour: (doc) => faultColour(doc.faults.length),
  add: (pointsPx) => [{ type: 'edit', edit: (d) => addFault(d, { pointsPx }) }],
});
