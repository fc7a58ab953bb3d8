// Every tool by id, with the words shown on its button and its shortcut key.
import { calibrateTool } from './calibrate/calibrateTool';
import { drawHorizonTool } from './drawHorizon/drawHorizonTool';
import { editHorizonTool } from './editHorizon/editHorizonTool';
import { drawFaultTool } from './fault/drawFaultTool';
import { markProjectedTool } from './markProjected/markProjectedTool';
import { pinsTool } from './pins/pinsTool';
import { regionalTool } from './regional/regionalTool';
import { selectTool } from './select/selectTool';
import type { Tool } from './toolTypes';

// The registry holds tools of different state types; the dispatcher only passes each its own states back.
type AnyTool = Tool<{ name: string }>;
const any = (t: unknown) => t as AnyTool;

export interface ToolEntry {
  tool: AnyTool;
  label: string;
  key: string;
  hint: string;
  /** Draws by anchor clicks that can follow the drawn line: the tool bar shows the follow toggle, and undo mid-line removes the last stretch. */
  tracesLines?: boolean;
}

export const TOOLS: ToolEntry[] = [
  { tool: any(selectTool), label: 'Select', key: 'v', hint: 'Click a line to select its horizon.' },
  { tool: any(calibrateTool), label: 'Calibrate', key: 'c', hint: 'Click a point of known position (a click near a drawn cross or tick snaps to its centre; Alt-click does not), then type its value; drag points to adjust.' },
  { tool: any(drawHorizonTool), label: 'Draw horizon', key: 'd', tracesLines: true, hint: 'Click points along the line: between them the line follows the drawing on the scan (Alt-click: straight); a click on a fault ends the piece there and the next click starts the next piece on that fault; double-click or Enter finishes, Backspace removes the last stretch, Esc cancels.' },
  { tool: any(drawFaultTool), label: 'Fault', key: 'k', tracesLines: true, hint: 'Click points along the fault: between them the line follows the drawing on the scan (Alt-click: straight); double-click or Enter finishes, Backspace removes the last stretch, Esc cancels. Edit moves its vertices.' },
  { tool: any(editHorizonTool), label: 'Edit', key: 'e', hint: 'Drag a vertex of a horizon or fault (a piece end slides along its fault); press a line to add a vertex; Shift-drag moves the line; Alt-click or Delete removes a vertex.' },
  { tool: any(markProjectedTool), label: 'Projected', key: 'j', hint: 'Click the first and last vertex of an eroded run to mark it projected (click again to unmark).' },
  { tool: any(pinsTool), label: 'Pins', key: 'p', hint: 'Click twice to place the two pins; drag a pin to move it.' },
  { tool: any(regionalTool), label: 'Regional', key: 'r', hint: 'Click points for the selected horizon (double-click ends); drag handles or the line; Shift-drag moves all.' },
];

/** Returns the tool entry for an id, or the select tool. */
export function toolEntry(id: string): ToolEntry {
  return TOOLS.find((t) => t.tool.id === id) ?? TOOLS[0];
}
