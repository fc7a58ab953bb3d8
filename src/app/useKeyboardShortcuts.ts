// Keyboard shortcuts of the whole page; ignored while typing in a field.
import { useEffect } from 'react';
import { redoInTool, undoInTool } from '../canvas/toolDispatch';
import { zoomByStep, zoomToFit } from '../panels/ScanControls';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';

const PAN_STEP_PX = 80;

function isTyping(target: EventTarget | null): boolean {
  return target instanceof HTMLInputElement || target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement || (target instanceof HTMLElement && target.isContentEditable);
}

export function useKeyboardShortcuts(): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (isTyping(e.target)) return;
      const mod = e.ctrlKey || e.metaKey;
      const doc = useDocStore.getState();
      if (mod && e.key.toLowerCase() === 'z') {
        e.preventDefault();
        // While a line is being drawn by anchors, undo takes back its last stretch and redo puts it back.
        if (e.shiftKey) {
          if (!redoInTool()) doc.redo();
        } else if (!undoInTool()) doc.undo();
        return;
      }
      if (mod && e.key.toLowerCase() === 'y') {
        e.preventDefault();
        if (!redoInTool()) doc.redo();
        return;
      }
      if (mod) return;
      const { camera, setCamera } = useSessionStore.getState();
      switch (e.key) {
        case '+':
        case '=':
          zoomByStep(1.25);
          break;
        case '-':
          zoomByStep(1 / 1.25);
          break;
        case 'f':
        case 'F':
          zoomToFit();
          break;
        case 'ArrowLeft':
          setCamera({ ...camera, x: camera.x + PAN_STEP_PX });
          break;
        case 'ArrowRight':
          setCamera({ ...camera, x: camera.x - PAN_STEP_PX });
          break;
        case 'ArrowUp':
          setCamera({ ...camera, y: camera.y + PAN_STEP_PX });
          break;
        case 'ArrowDown':
          setCamera({ ...camera, y: camera.y - PAN_STEP_PX });
          break;
        default:
          return;
      }
      e.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
