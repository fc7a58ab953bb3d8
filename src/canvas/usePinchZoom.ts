// Two-finger pinch on a touch screen: zooms about the midpoint of the fingers and pans with it.
// (A trackpad pinch arrives as a wheel event with ctrlKey set, handled with the wheel.)
import { useEffect, type RefObject } from 'react';
import { useSessionStore } from '../state/sessionStore';
import { zoomAbout } from '../state/camera';

/** Returns the new camera after two touch points moved from (a0, b0) to (a1, b1), screen pixels. */
export function pinchCamera(
  camera: { scale: number; x: number; y: number },
  a0: [number, number], b0: [number, number], a1: [number, number], b1: [number, number],
) {
  const d0 = Math.hypot(b0[0] - a0[0], b0[1] - a0[1]);
  const d1 = Math.hypot(b1[0] - a1[0], b1[1] - a1[1]);
  const m0 = [(a0[0] + b0[0]) / 2, (a0[1] + b0[1]) / 2];
  const m1 = [(a1[0] + b1[0]) / 2, (a1[1] + b1[1]) / 2];
  const moved = { ...camera, x: camera.x + m1[0] - m0[0], y: camera.y + m1[1] - m0[1] };
  return d0 > 0 && d1 > 0 ? zoomAbout(moved, m1[0], m1[1], d1 / d0) : moved;
}

/** Listens for two-finger touch pinches on the element and moves the camera. */
export function usePinchZoom(ref: RefObject<HTMLElement | null>): void {
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    el.style.touchAction = 'none';
    const touches = new Map<number, [number, number]>();
    const at = (e: PointerEvent): [number, number] => {
      const r = el.getBoundingClientRect();
      return [e.clientX - r.left, e.clientY - r.top];
    };
    const down = (e: PointerEvent) => {
      if (e.pointerType === 'touch') touches.set(e.pointerId, at(e));
    };
    const move = (e: PointerEvent) => {
      if (e.pointerType !== 'touch' || !touches.has(e.pointerId)) return;
      if (touches.size !== 2) {
        touches.set(e.pointerId, at(e));
        return;
      }
      const [idA, idB] = [...touches.keys()];
      const before = [touches.get(idA)!, touches.get(idB)!];
      touches.set(e.pointerId, at(e));
      const after = [touches.get(idA)!, touches.get(idB)!];
      const { camera, setCamera } = useSessionStore.getState();
      setCamera(pinchCamera(camera, before[0], before[1], after[0], after[1]));
      e.stopPropagation();
    };
    const up = (e: PointerEvent) => touches.delete(e.pointerId);
    el.addEventListener('pointerdown', down, true);
    el.addEventListener('pointermove', move, true);
    el.addEventListener('pointerup', up, true);
    el.addEventListener('pointercancel', up, true);
    return () => {
      el.removeEventListener('pointerdown', down, true);
      el.removeEventListener('pointermove', move, true);
      el.removeEventListener('pointerup', up, true);
      el.removeEventListener('pointercancel', up, true);
    };
  }, [ref]);
}
