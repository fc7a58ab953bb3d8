// The contract between the section view and the interaction tools. Tools see image pixels and the
// document, never Konva or the store; they answer each event with their next state and commands.
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import type { CalibrationPointRef } from '../core/model/commands/calibrationPointRef';
import type { ImagePx, ProjectDoc } from '../core/model/projectDoc';

export type DocEdit = (doc: ProjectDoc) => ProjectDoc;

export type ToolEvent =
  | { type: 'pointerDown'; p: ImagePx; button: number; clicks: number; shift: boolean; alt: boolean }
  | { type: 'pointerMove'; p: ImagePx; shift: boolean; alt?: boolean }
  | { type: 'pointerUp'; p: ImagePx }
  | { type: 'key'; key: string }
  /** Esc, window blur or a tool switch. */
  | { type: 'cancel' }
  /** A stretch asked of the line tracer is ready (ask again to get it). */
  | { type: 'traced' };

export type ToolEventType = ToolEvent['type'];

/** Which kind of calibration point a click adds. */
export type CalibrationPick = 'points' | 'xPoints' | 'zPoints';

/**
 * Follows the drawn line on the scan (supplied by the section view while a scan is shown). Synchronous answers
 * only: what is not ready yet is computed off the main thread and announced by a 'traced' event.
 */
export interface LineTracer {
  /** Returns the line centre within `radiusPx` image px of `p` (sub-pixel), or null where no line is drawn. */
  snap(p: ImagePx, radiusPx: number): ImagePx | null;
  /**
   * Returns the traced stretch from `from` to `to` (first point `from`, last `to`, image px) when ready, else null and
   * starts it; `placed` for a stretch whose anchor is placed (computed first), not a preview to the pointer.
   */
  stretch(from: ImagePx, to: ImagePx, placed?: boolean): ImagePx[] | null;
  /** Returns whether `points` (an answer of `stretch`) is a rough stand-in that the full-resolution trace will replace. */
  rough?(points: readonly ImagePx[]): boolean;
}

export interface ToolContext {
  doc: ProjectDoc;
  /** The document's frame: its calibration, or x = u, z = −v before calibration (sectionFrame). */
  frame: FittedCalibration;
  /** Hit tolerance in image pixels (a few screen pixels at the current zoom). */
  tolerancePx: number;
  selectedHorizonId: string | null;
  calibrationPick: CalibrationPick;
  /** The scan's line tracer, when a scan is shown. */
  tracer?: LineTracer | null;
  /** Whether clicks follow the drawn line (the tool hint's toggle; Alt-click does the opposite for one click). */
  followLine?: boolean;
}

/** Drawn above the shapes while a tool works; never stored in the document. */
export interface ToolPreview {
  line?: ImagePx[];
  /** A line drawn in pieces: every piece (drawn instead of `line`, which is then the piece being drawn). */
  lines?: ImagePx[][];
  colour?: string;
  /** Image points to mark (vertex being dragged, first vertex of a projected run, a pin being placed). */
  marks?: ImagePx[];
  /** Section x of pin lines being placed. */
  pinXs?: number[];
  /** Part of `line` is a stand-in (straight, or a rough trace) while the traced stretch to the pointer computes. */
  tracing?: boolean;
}

export type ToolCommand =
  /** One undoable edit (its own undo entry unless inside a gesture). */
  | { type: 'edit'; edit: DocEdit }
  /** Starts a gesture; `regionals`: the horizons whose regionals it will move, when the press already knows them. */
  | { type: 'beginGesture'; regionals?: string[] }
  /** Applied to the document as it was when the gesture began (start snapshot plus the total delta). */
  | { type: 'gestureEdit'; edit: DocEdit }
  | { type: 'endGesture' }
  | { type: 'cancelGesture' }
  | { type: 'select'; horizonId: string | null }
  | { type: 'focusCalibrationPoint'; ref: CalibrationPointRef }
  | { type: 'preview'; preview: ToolPreview | null }
  | { type: 'message'; kind: 'error' | 'info'; text: string }
  /** Takes down the message shown (one the tool showed while waiting). */
  | { type: 'clearMessage' };

export interface ToolResult<S> { next?: S; commands?: ToolCommand[] }

type Handler<Cur, S> = {
  [E in ToolEventType]?: (state: Cur, event: Extract<ToolEvent, { type: E }>, ctx: ToolContext) => ToolResult<S>;
};

/** A tool: its id, its initial state and, per state name, the events that state handles. */
export interface Tool<S extends { name: string }> {
  id: string;
  initial: S;
  states: { [N in S['name']]: Handler<Extract<S, { name: N }>, S> };
}

/** Runs one event through the tool: returns the next state (unchanged when unhandled) and the commands. */
export function runTool<S extends { name: string }>(tool: Tool<S>, state: S, event: ToolEvent, ctx: ToolContext): { state: S; commands: ToolCommand[] } {
  const handlers = tool.states[state.name as S['name']] as Record<string, ((s: S, e: ToolEvent, c: ToolContext) => ToolResult<S>) | undefined>;
  const handler = handlers[event.type];
  if (!handler) return { state, commands: [] };
  const result = handler(state, event, ctx);
  return { state: result.next ?? state, commands: result.commands ?? [] };
}
