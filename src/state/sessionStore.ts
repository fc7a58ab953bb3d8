// The session slice: camera, active tool, selection and messages. Not saved, not undoable.
import { create } from 'zustand';

export interface Camera {
  /** Screen pixels per image pixel. */
  scale: number;
  /** Screen position of image pixel (0, 0). */
  x: number;
  y: number;
}

export type MessageKind = 'error' | 'info';
export interface Message { kind: MessageKind; text: string; id: number }

export interface SessionState {
  camera: Camera;
  viewport: { width: number; height: number };
  activeTool: string;
  selectedHorizonId: string | null;
  message: Message | null;
  busy: string | null;
  /** False until start-up (restore or demo) has finished. */
  started: boolean;
  setCamera: (camera: Camera) => void;
  setViewport: (width: number, height: number) => void;
  setTool: (tool: string) => void;
  selectHorizon: (id: string | null) => void;
  showMessage: (kind: MessageKind, text: string) => void;
  clearMessage: () => void;
  setBusy: (text: string | null) => void;
  setStarted: () => void;
}

let messageId = 0;

export const useSessionStore = create<SessionState>()((set) => ({
  camera: { scale: 1, x: 0, y: 0 },
  viewport: { width: 800, height: 600 },
  activeTool: 'select',
  selectedHorizonId: null,
  message: null,
  busy: null,
  started: false,
  setCamera: (camera) => set({ camera }),
  setViewport: (width, height) => set({ viewport: { width, height } }),
  setTool: (activeTool) => set({ activeTool }),
  selectHorizon: (selectedHorizonId) => set({ selectedHorizonId }),
  showMessage: (kind, text) => set({ message: { kind, text, id: ++messageId } }),
  clearMessage: () => set({ message: null }),
  setBusy: (busy) => set({ busy }),
  setStarted: () => set({ started: true }),
}));
