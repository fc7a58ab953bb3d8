// Runs a tool on synthetic events without a browser, through the app's own stores: each event goes through
// runTool with the context the section view builds (toolContext) and its commands are carried out by the
// section view's executor (executeToolCommands) on the real document store, with its gesture rules and undo
// history. The harness only reads the stores back and records the tool's state path and messages.
import { executeToolCommands, getToolPreview, toolContext } from '../../src/canvas/toolDispatch';
import type { ImagePx, ProjectDoc } from '../../src/core/model/projectDoc';
import { useDocStore } from '../../src/state/docStore';
import { useSessionStore } from '../../src/state/sessionStore';
import { useToolSession } from '../../src/state/toolSessionStore';
import { runTool, type CalibrationPick, type LineTracer, type Tool, type ToolEvent, type ToolPreview } from '../../src/tools/toolTypes';

// Every message the session is asked to show, in order, for the harness in use ('' for a message taken down).
let recordMessage: ((text: string) => void) | null = null;
useSessionStore.subscribe((s, prev) => {
  if (s.message !== prev.message) recordMessage?.(s.message?.text ?? '');
});

export class ToolHarness<S extends { name: string }> {
  state: S;
  readonly messages: string[] = [];
  readonly path: string[] = [];
  /** Pick tolerance in image px (the view supplies 7 screen px at its zoom). */
  tolerancePx = 5;
  tracer: LineTracer | null = null;
  /** The document store's open count once this harness put its document in: a later harness replaces it. */
  private readonly opened: number;

  /** Puts `doc` in the document store (clearing its history), with no selection, message or preview. */
  constructor(readonly tool: Tool<S>, doc: ProjectDoc) {
    useDocStore.setState({ readOnly: false });
    useDocStore.getState().replace(doc);
    this.opened = useDocStore.getState().opened;
    useSessionStore.getState().selectHorizon(null);
    useSessionStore.getState().clearMessage();
    useToolSession.setState({ calibrationPick: 'points', followLine: true, focusRef: null });
    executeToolCommands([{ type: 'preview', preview: null }]);
    recordMessage = (text) => this.messages.push(text);
    this.state = tool.initial;
    this.path.push(this.state.name);
  }

  private live(): void {
    if (useDocStore.getState().opened !== this.opened) throw new Error('another ToolHarness has replaced this one\'s document in the store');
  }

  /** The document store's document. */
  get doc(): ProjectDoc {
    this.live();
    return useDocStore.getState().doc;
  }

  /** The document store's undo history (oldest first). */
  get history(): readonly ProjectDoc[] {
    this.live();
    return useDocStore.getState().past;
  }

  get gestureStart(): ProjectDoc | null {
    return useDocStore.getState().gestureStart;
  }

  get selected(): string | null {
    return useSessionStore.getState().selectedHorizonId;
  }

  set selected(id: string | null) {
    useSessionStore.getState().selectHorizon(id);
  }

  get preview(): ToolPreview | null {
    return getToolPreview();
  }

  /** The calibration point whose value field the panel was asked to focus. */
  get focused(): unknown {
    return useToolSession.getState().focusRef?.ref ?? null;
  }

  get calibrationPick(): CalibrationPick {
    return useToolSession.getState().calibrationPick;
  }

  set calibrationPick(pick: CalibrationPick) {
    useToolSession.getState().setCalibrationPick(pick);
  }

  get followLine(): boolean {
    return useToolSession.getState().followLine;
  }

  set followLine(follow: boolean) {
    useToolSession.getState().setFollowLine(follow);
  }

  send(event: ToolEvent): this {
    this.live();
    const { state, commands } = runTool(this.tool, this.state, event, toolContext(this.tolerancePx, this.tracer));
    if (state.name !== this.state.name) this.path.push(state.name);
    this.state = state;
    executeToolCommands(commands);
    return this;
  }

  down(p: ImagePx, opts: { clicks?: number; shift?: boolean; alt?: boolean; button?: number } = {}): this {
    return this.send({ type: 'pointerDown', p, button: opts.button ?? 0, clicks: opts.clicks ?? 1, shift: opts.shift ?? false, alt: opts.alt ?? false });
  }

  move(p: ImagePx, opts: { alt?: boolean } = {}): this {
    return this.send({ type: 'pointerMove', p, shift: false, alt: opts.alt ?? false });
  }

  up(p: ImagePx): this {
    return this.send({ type: 'pointerUp', p });
  }

  click(p: ImagePx, opts: { clicks?: number; shift?: boolean; alt?: boolean } = {}): this {
    return this.down(p, opts).up(p);
  }

  drag(from: ImagePx, to: ImagePx, opts: { shift?: boolean } = {}, steps = 4): this {
    this.down(from, opts);
    for (let k = 1; k <= steps; k++) this.move([from[0] + ((to[0] - from[0]) * k) / steps, from[1] + ((to[1] - from[1]) * k) / steps]);
    return this.up(to);
  }

  key(key: string): this {
    return this.send({ type: 'key', key });
  }

  cancel(): this {
    return this.send({ type: 'cancel' });
  }
}
