// The session slice: camera, active tool, selection and messages. Not saved, not undoable.
import { create } from 'zustand';
import { fitTargetCamera, resizedCamera } from './camera';

export interface Camera {
  /** Screen pixels per image pixel. */
  scale: number;
  /** Screen position of image pixel (0, 0). */
  x: number;
  y: number;
}

/** A box in image pixels the view was fitted to, with the margin (screen px) kept around it. */
export interface FitTarget { u0: number; v0: number; width: number; height: number; margin: number }

export type MessageKind = 'error' | 'info';
export interface Message { kind: MessageKind; text: string; id: number }

export interface SessionState {
  camera: Camera;
  /** What the view was last fitted to, while the user has not zoomed or panned since; null once they have. */
  fitted: FitTarget | null;
  viewport: { width: number; height: number };
  /** Screen px at the view's bottom covered by the live results strip (notes drawn on the view keep above it). */
  viewInsetBottom: number;
  activeTool: string;
  selectedHorizonId: string | null;
  message: Message | null;
  /** The message shown last, kept after it fades or is dismissed (the message area carries it, for the browser tests). */
  lastMessage: Message | null;
  busy: string | null;
  /** The share of the busy work done (0..1), when it is known. */
  busyDone: number | null;
  /** Stops the busy work, when it can be stopped (a Cancel button is shown). */
  busyCancel: (() => void) | null;
  /** False until start-up (restore or demo) has finished. */
  started: boolean;
  /** Vertical exaggeration of the exported figure (1 = true scale); null: as on the scan. */
  figureVerticalExaggeration: number | null;
  /** A zoom or pan of the user's: the view is no longer kept fitted. */
  setCamera: (camera: Camera) => void;
  /** Fits the view to the target, and keeps it fitted when the view changes size until the user zooms or pans. */
  fitTo: (target: FitTarget) => void;
  /** The view's new size: refitted when fitted, else the view's centre kept (resizedCamera). */
  setViewport: (width: number, height: number) => void;
  setViewInsetBottom: (px: number) => void;
  setTool: (tool: string) => void;
  selectHorizon: (id: string | null) => void;
  showMessage: (kind: MessageKind, text: string) => void;
  clearMessage: () => void;
  /** Shows what the page is busy with (null: nothing), with the share done and a way to stop it when known. */
  setBusy: (text: string | null, work?: { done?: number | null; cancel?: (() => void) | null }) => void;
  setStarted: () => void;
  setFigureVerticalExaggeration: (ve: number | null) => void;
}

let messageId = 0;

export const useSessionStore = create<SessionState>()((set) => ({
  camera: { scale: 1, x: 0, y: 0 },
  fitted: null,
  viewport: { width: 800, height: 600 },
  viewInsetBottom: 0,
  activeTool: 'select',
  selectedHorizonId: null,
  message: null,
  lastMessage: null,
  busy: null,
  busyDone: null,
  busyCancel: null,
  started: false,
  figureVerticalExaggeration: null,
  setCamera: (camera) => set({ camera, fitted: null }),
  fitTo: (target) => set((s) => ({ camera: fitTargetCamera(target, s.viewport.width, s.viewport.height), fitted: target })),
  setViewport: (width, height) => set((s) => {
    if (s.viewport.width === width && s.viewport.height === height) return s;
    const viewport = { width, height };
    return { viewport, camera: resizedCamera(s.camera, s.fitted, s.viewport, viewport) };
  }),
  setViewInsetBottom: (viewInsetBottom) => set((s) => (s.viewInsetBottom === viewInsetBottom ? s : { viewInsetBottom })),
  setTool: (activeTool) => set({ activeTool }),
  selectHorizon: (selectedHorizonId) => set({ selectedHorizonId }),
  showMessage: (kind, text) => {
    const message = { kind, text, id: ++messageId };
    set({ message, lastMessage: message });
  },
  clearMessage: () => set({ message: null }),
  setBusy: (busy, work) => set({ busy, busyDone: busy === null ? null : work?.done ?? null, busyCancel: busy === null ? null : work?.cancel ?? null }),
  setStarted: () => set({ started: true }),
  setFigureVerticalExaggeration: (figureVerticalExaggeration) => set({ figureVerticalExaggeration }),
}));
