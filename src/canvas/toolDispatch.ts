// Routes pointer and key events from the section view to the active tool and carries out the
// commands it returns (edits, gestures, selection, previews, messages). Only this file turns DOM
// pointer positions into image pixels for the tools.
import { useEffect, type RefObject } from 'react';
import { sectionFrame } from '../core/model/commands/sectionFrame';
import { ScanLineTracer } from '../io/lineTracer';
import { useDocStore } from '../state/docStore';
import { getScan } from '../state/scanCache';
import { useSessionStore } from '../state/sessionStore';
import { screenToImage } from '../state/camera';
import { useToolSession } from '../state/toolSessionStore';
import { toolEntry } from '../tools/toolRegistry';
import { runTool, type LineTracer, type ToolCommand, type ToolContext, type ToolEvent, type ToolPreview } from '../tools/toolTypes';
import { cachedClientRect } from './viewBoxRect';

/** Pointer tolerance for picking, in screen pixels. */
const PICK_TOLERANCE_SCREEN_PX = 7;

// The tool preview is ephemeral: kept outside React; the overlay subscribes and redraws its node.
let preview: ToolPreview | null = null;
const previewListeners = new Set<() => void>();

/** Returns the current tool preview (image pixels), or null. */
export function getToolPreview(): ToolPreview | null {
  return preview;
}

/** Subscribes to preview changes; returns the unsubscribe function. */
export function subscribeToolPreview(listener: () => void): () => void {
  previewListeners.add(listener);
  return () => previewListeners.delete(listener);
}

function setPreview(next: ToolPreview | null): void {
  preview = next;
  previewListeners.forEach((l) => l());
}

let toolId = useSessionStore.getState().activeTool;
let toolState: { name: string } = toolEntry(toolId).tool.initial;
let dragging = false;

// One line tracer for the scan shown, made when a tool that follows lines is chosen (or a tool first asks) and
// replaced when the scan changes.
let tracer: { bitmap: ImageBitmap; tracer: ScanLineTracer } | null = null;
let tracedPending = false;

/** Tells the active tool, once per burst of answers, that traced stretches have arrived. */
function announceTraced(): void {
  if (tracedPending) return;
  tracedPending = true;
  queueMicrotask(() => {
    tracedPending = false;
    dispatchToolEvent({ type: 'traced' });
  });
}

function scanTracer(doc: ToolContext['doc']): ScanLineTracer | null {
  const bitmap = getScan(doc.scan?.id)?.bitmap ?? null;
  if (tracer && tracer.bitmap !== bitmap) {
    tracer.tracer.close();
    tracer = null;
  }
  if (!bitmap || typeof Worker === 'undefined' || typeof OffscreenCanvas === 'undefined') return null;
  if (!tracer) tracer = { bitmap, tracer: new ScanLineTracer(bitmap, announceTraced) };
  return tracer.tracer;
}

/** Returns the bytes the scan's line tracer holds in its worker (for the benchmark), or 0. */
export function tracerBytesHeld(): number {
  return tracer?.tracer.bytesHeld ?? 0;
}

/**
 * The context the tools see: the document, selection and calibration pick from the stores, with the pick
 * tolerance (image px) and line tracer the view supplies. The tool tests build theirs with this too.
 */
export function toolContext(tolerancePx: number, tracer: LineTracer | null): ToolContext {
  const doc = useDocStore.getState().doc;
  const session = useSessionStore.getState();
  const toolSession = useToolSession.getState();
  return {
    doc,
    frame: sectionFrame(doc),
    tolerancePx,
    selectedHorizonId: session.selectedHorizonId,
    calibrationPick: toolSession.calibrationPick,
    tracer,
    followLine: toolSession.followLine,
  };
}

function context(): ToolContext {
  const doc = useDocStore.getState().doc;
  return toolContext(PICK_TOLERANCE_SCREEN_PX / useSessionStore.getState().camera.scale, scanTracer(doc));
}

/**
 * Carries out a tool's commands on the stores: edits and gestures on the document store (one undo entry per
 * edit or per gesture; a gesture edit applies to the document as the gesture began), selection and messages on
 * the session, the preview here. The one place these rules are applied (the tool tests run through it too).
 */
export function executeToolCommands(commands: readonly ToolCommand[]): void {
  const store = useDocStore.getState();
  for (const c of commands) {
    switch (c.type) {
      case 'edit':
        useDocStore.getState().apply(c.edit);
        break;
      case 'beginGesture':
        store.beginGesture(c.regionals);
        break;
      case 'gestureEdit': {
        const start = useDocStore.getState().gestureStart;
        if (start) useDocStore.getState().apply(() => c.edit(start));
        break;
      }
      case 'endGesture':
        useDocStore.getState().endGesture();
        break;
      case 'cancelGesture':
        useDocStore.getState().cancelGesture();
        break;
      case 'select':
        useSessionStore.getState().selectHorizon(c.horizonId);
        break;
      case 'focusCalibrationPoint':
        useToolSession.setState((s) => ({ focusRef: { ref: c.ref, n: (s.focusRef?.n ?? 0) + 1 } }));
        break;
      case 'preview':
        setPreview(c.preview);
        break;
      case 'message':
        useSessionStore.getState().showMessage(c.kind, c.text);
        break;
      case 'clearMessage':
        useSessionStore.getState().clearMessage();
        break;
    }
  }
}

/** Sends one event to the active tool and carries out its commands. */
export function dispatchToolEvent(event: ToolEvent): void {
  const entry = toolEntry(toolId);
  const { state, commands } = runTool(entry.tool, toolState, event, context());
  toolState = state;
  executeToolCommands(commands);
  if (useToolSession.getState().stateName !== state.name) useToolSession.setState({ stateName: state.name });
}

/** Cancels whatever the active tool is doing (Esc, blur, tool switch). */
export function cancelTool(): void {
  dragging = false;
  dispatchToolEvent({ type: 'cancel' });
}

/** Undo while a line is being drawn by anchors removes its last stretch; returns true when the active tool took it. */
export function undoInTool(): boolean {
  const entry = toolEntry(toolId);
  if (!entry.tracesLines || dragging || toolState.name === entry.tool.initial.name) return false;
  dispatchToolEvent({ type: 'key', key: 'Undo' });
  return true;
}

/** Redo while a line is being drawn by anchors puts back the stretch undo took; returns true when the active tool took it (even with nothing to put back, so the document does not change under the line). */
export function redoInTool(): boolean {
  const entry = toolEntry(toolId);
  if (!entry.tracesLines || dragging || toolState.name === entry.tool.initial.name) return false;
  dispatchToolEvent({ type: 'key', key: 'Redo' });
  return true;
}

/** Returns true while the active tool is mid-gesture (a pointer held, or a line, pin pair or regional begun). */
export function toolMidGesture(): boolean {
  return dragging || toolState.name !== toolEntry(toolId).tool.initial.name;
}

useSessionStore.subscribe((s) => {
  if (s.activeTool === toolId) return;
  cancelTool();
  toolId = s.activeTool;
  toolState = toolEntry(toolId).tool.initial;
  useToolSession.setState({ stateName: toolState.name });
  // A tool that follows drawn lines starts the tracer (its workers load and warm up) as soon as it is chosen, so
  // the first click's preview does not wait for them.
  if (toolEntry(toolId).tracesLines) scanTracer(useDocStore.getState().doc);
});

function imagePoint(box: HTMLElement, clientX: number, clientY: number): [number, number] {
  const r = cachedClientRect(box);
  return screenToImage(useSessionStore.getState().camera, clientX - r.left, clientY - r.top);
}

let boxElement: HTMLElement | null = null;

/**
 * A second press within this time and distance counts as a double-click (pointer events carry no click count).
 * The distance is measured between the two presses' scan positions (in screen pixels at the current zoom), so a
 * press after the view panned or zoomed is a new click wherever it lands on the screen.
 */
const DOUBLE_CLICK_MS = 450;
const DOUBLE_CLICK_SCREEN_PX = 6;
let lastPress = { t: -Infinity, p: [0, 0] as [number, number], clicks: 0 };

function clickCount(evt: PointerEvent, p: [number, number]): number {
  const t = evt.timeStamp;
  const scale = useSessionStore.getState().camera.scale;
  const near = Math.hypot(p[0] - lastPress.p[0], p[1] - lastPress.p[1]) * scale <= DOUBLE_CLICK_SCREEN_PX;
  const clicks = near && t - lastPress.t <= DOUBLE_CLICK_MS ? lastPress.clicks + 1 : 1;
  lastPress = { t, p, clicks };
  return clicks;
}

/** Forwards a pointer-down on the stage (not a pan) to the active tool. */
export function toolPointerDown(evt: PointerEvent): void {
  if (!boxElement) return;
  // The press belongs to the tool: no text selection or dragged element starts from it (the view takes the focus
  // itself). Left to the browser, the first move with the button held hit-tested the press point for something to
  // drag, and that forced a layout of everything the press and the move had changed, before the move's frame.
  evt.preventDefault();
  dragging = true;
  const p = imagePoint(boxElement, evt.clientX, evt.clientY);
  dispatchToolEvent({ type: 'pointerDown', p, button: evt.button, clicks: clickCount(evt, p), shift: evt.shiftKey, alt: evt.altKey });
}

/** The section view's element while it is shown (for keyForTools), else null. */
export function toolViewElement(): HTMLElement | null {
  return boxElement;
}

/** Installs the window listeners that feed the tools (moves and releases anywhere, blur); keys come from app/useKeys. */
export function useToolDispatch(boxRef: RefObject<HTMLElement | null>): void {
  useEffect(() => {
    boxElement = boxRef.current;
    const move = (e: PointerEvent) => {
      if (!boxElement) return;
      const inside = e.target instanceof Node && boxElement.contains(e.target);
      if (!dragging && !inside) return;
      dispatchToolEvent({ type: 'pointerMove', p: imagePoint(boxElement, e.clientX, e.clientY), shift: e.shiftKey, alt: e.altKey });
    };
    const up = (e: PointerEvent) => {
      if (!dragging || !boxElement) return;
      dragging = false;
      dispatchToolEvent({ type: 'pointerUp', p: imagePoint(boxElement, e.clientX, e.clientY) });
    };
    const blur = () => cancelTool();
    window.addEventListener('pointermove', move);
    window.addEventListener('pointerup', up);
    window.addEventListener('blur', blur);
    return () => {
      window.removeEventListener('pointermove', move);
      window.removeEventListener('pointerup', up);
      window.removeEventListener('blur', blur);
      boxElement = null;
    };
  }, [boxRef]);
}
