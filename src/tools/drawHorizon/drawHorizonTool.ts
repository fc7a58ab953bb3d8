// Draw a horizon by clicking anchors (drawLineTool), in one piece or in pieces cut by faults: a click near
// a fault ends the piece on it and the next clicks draw the next piece of the same horizon. Finished, it
// is added with its joins and selected (one undo entry).
import { addHorizon, nextHorizonId } from '../../core/model/commands/addHorizon';
import { paletteColour } from '../../core/model/horizonPalette';
import { drawLineTool, type DrawLineState } from './drawLineTool';

export type DrawHorizonState = DrawLineState;

export const drawHorizonTool = drawLineTool({
  id: 'draw',
  noun: 'horizon',
  inPieces: true,
  colour: (doc) => paletteColour(doc.horizons.length),
  add: (pointsPx, joins, doc) => {
    const id = nextHorizonId(doc);
    // Named by addHorizon from the document it is added to: the next "Horizon N" that no horizon has.
    const horizon = { id, colour: paletteColour(doc.horizons.length), pointsPx, joins };
    return [{ type: 'edit', edit: (d) => addHorizon(d, horizon) }, { type: 'select', horizonId: id }];
  },
});
