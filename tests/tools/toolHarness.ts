// Runs a tool on synthetic events without a browser or store: applies its commands to a document with
// the store's gesture rules (one history entry per edit or per gesture) and records the state path.
import { sectionFrame } from '../../src/core/model/commands/sectionFrame';
import type { ImagePx, ProjectDoc } from '../../src/core/model/projectDoc';
import { runTool, type CalibrationPick, type LineTracer, type Tool, type ToolEvent, type ToolPreview } from '../../src/tools/toolTypes';

export class ToolHarness<S extends { name: string }> {
  state: S;
  doc: ProjectDoc;
  history: ProjectDoc[] = [];
  gestureStart: ProjectDoc | null = null;
  selected: string | null = null;
  preview: ToolPreview | null = null;
  messages: string[] = [];
  path: string[] = [];
  focused: unknown = null;
  tolerancePx = 5;
  calibrationPick: CalibrationPick = 'points';
  tracer: LineTracer | null = null;
  followLine = true;

  constructor(readonly tool: Tool<S>, doc: ProjectDoc) {
    this.state = tool.initial;
    this.doc = doc;
    this.path.push(this.state.name);
  }

  send(event: ToolEvent): this {
    const ctx = { doc: this.doc, frame: sectionFrame(this.doc), tolerancePx: this.tolerancePx, selectedHorizonId: this.selected, calibrationPick: this.calibrationPick, tracer: this.tracer, followLine: this.followLine };
    const { state, commands } = runTool(this.tool, this.state, event, ctx);
    if (state.name !== this.state.name) this.path.push(state.name);
    this.state = state;
    for (const c of commands) {
      if (c.type === 'edit') {
        const next = c.edit(this.doc);
        if (next !== this.doc && !this.gestureStart) this.history.push(this.doc);
        this.doc = next;
      } else if (c.type === 'beginGesture') this.gestureStart = this.doc;
      else if (c.type === 'gestureEdit' && this.gestureStart) this.doc = c.edit(this.gestureStart);
      else if (c.type === 'endGesture') {
        if (this.gestureStart && this.gestureStart !== this.doc) this.history.push(this.gestureStart);
        this.gestureStart = null;
      } else if (c.type === 'cancelGesture') {
        if (this.gestureStart) this.doc = this.gestureStart;
        this.gestureStart = null;
      } else if (c.type === 'select') this.selected = c.horizonId;
      else if (c.type === 'preview') this.preview = c.preview;
      else if (c.type === 'message') this.messages.push(c.text);
      else if (c.type === 'clearMessage') this.messages.push('');
      else if (c.type === 'focusCalibrationPoint') this.focused = c.ref;
    }
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
