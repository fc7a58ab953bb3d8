// Draw a horizon by clicking anchors (drawLineTool), in one piece or in pieces cut by faults: a click near
// a fault ends the piece on it and the next clicks draw the next piece of the same horizon. Finished, it
// is added with its joins and selected, one undo entry per stretch.
import { addHorizon, nextHorizonId } from '../../core/model/commands/addHorizon';
import { setHorizonPoints } from '../../core/model/commands/setHorizonPoints';
import { paletteColour } from '../../core/model/horizonPalette';
import type { ToolCommand } from '../toolTypes';
import { drawLineTool, type DrawLineState } from './drawLineTool';

export type DrawHorizonState = DrawLineState;

export const drawHorizonTool = drawLineTool({
  id: 'draw',
  noun: 'horizon',
  inPieces: true,
  colour: (doc) => paletteColour(doc.horizons.length),
  add: (steps, doc) => {
    const id = nextHorizonId(doc);
    // Named by addHorizon from the document it is added to: the next "Horizon N" that no horizon has.
    const horizon = { id, colour: paletteColour(doc.horizons.length), pointsPx: steps[0].pointsPx, joins: steps[0].joins };
    const edits: ToolCommand[] = [{ type: 'edit', edit: (d) => addHorizon(d, horizon) }];
    for (const step of steps.slice(1)) edits.push({ type: 'edit', edit: (d) => setHorizonPoints(d, id, step.pointsPx, step.joins) });
    return [...edits, { type: 'select', horizonId: id }];
  },
});
