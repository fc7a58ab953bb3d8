// The cursor's position in the view's corner: section x and z (with the unit) once the scan is
// calibrated, image pixels before. Updated straight on the element on every pointer move (and on every
// camera change under a still cursor), never through React state. The drag readout beside the pointer
// (DragReadout) is mounted here too, so the overlay layer stays as it is.
import { useEffect, useRef } from 'react';
import { useDocStore } from '../state/docStore';
import { useFittedCalibration } from '../state/useFittedCalibration';
import { useSessionStore } from '../state/sessionStore';
import { screenToImage } from '../state/camera';
import { imageToSection } from '../core/calibration/mapPoints';
import { CutoffReadout } from './CutoffReadout';
import { DragReadout } from './DragReadout';
import { cachedClientRect } from './viewBoxRect';
import { formatFixed } from '../format/formatQuantity';
import { stepDecimals } from '../format/niceTicks';
import './cursorReadout.css';

export function CursorReadout() {
  const ref = useRef<HTMLDivElement>(null);
  const hasScan = useDocStore((s) => s.doc.scan !== null);
  const unit = useDocStore((s) => s.doc.units);
  const fit = useFittedCalibration();

  useEffect(() => {
    const el = ref.current;
    const box = el?.parentElement;
    if (!el || !box) return;
    let last: { x: number; y: number } | null = null;
    const show = () => {
      if (!last) {
        el.textContent = fit ? `x, z (${unit})` : 'u, v (px)';
        return;
      }
      const { camera } = useSessionStore.getState();
      const p = screenToImage(camera, last.x, last.y);
      if (!fit) {
        el.textContent = `u ${formatFixed(p[0], camera.scale > 2 ? 1 : 0)}  v ${formatFixed(p[1], camera.scale > 2 ? 1 : 0)} px`;
        return;
      }
      const [x, z] = imageToSection(fit, p);
      // As many decimals as one screen pixel resolves.
      const dx = stepDecimals(fit.unitsPerPxX / camera.scale);
      const dz = stepDecimals(fit.unitsPerPxZ / camera.scale);
      el.textContent = `x ${formatFixed(x, dx)}  z ${formatFixed(z, dz)} ${unit}`;
    };
    const onMove = (e: PointerEvent) => {
      const r = cachedClientRect(box);
      last = { x: e.clientX - r.left, y: e.clientY - r.top };
      show();
    };
    const onLeave = () => {
      last = null;
      show();
    };
    show();
    box.addEventListener('pointermove', onMove);
    box.addEventListener('pointerleave', onLeave);
    const unsubscribe = useSessionStore.subscribe((s, prev) => {
      if (s.camera !== prev.camera) show();
    });
    return () => {
      box.removeEventListener('pointermove', onMove);
      box.removeEventListener('pointerleave', onLeave);
      unsubscribe();
    };
  }, [fit, unit]);

  return (
    <>
      <div ref={ref} className="cursor-readout" data-testid="cursor-readout" hidden={!hasScan} aria-live="off" />
      <DragReadout />
      <CutoffReadout />
    </>
  );
}
