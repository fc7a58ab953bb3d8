// A small label beside the pointer while a regional handle or a pin is dragged, with the dragged point's
// section z (regional) or x (pin). Updated straight on the element from the store and the pointer, never
// through React state, so a drag does not re-render anything. Its size, to keep it inside the view, comes from a
// ResizeObserver (told after the frame's own layout) rather than read after its text changes: a read then laid out
// the whole page again in the middle of the frame, every frame of a drag.
import { useEffect, useRef } from 'react';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { dragReadoutText } from '../tools/dragReadoutText';
import { cachedClientRect } from './viewBoxRect';
import './dragReadout.css';

/** Offset of the label from the pointer, in screen pixels (right and above, clear of the handle). */
const OFFSET_X = 14;
const OFFSET_Y = -26;

export function DragReadout() {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const el = ref.current;
    const box = el?.parentElement;
    if (!el || !box) return;
    let pointer = { x: 0, y: 0 };
    let frame = 0;
    // The label's border box as last laid out (a frame late at most: its text's width changes by a digit or so).
    let size = { width: 0, height: 0 };
    const sized = new ResizeObserver((entries) => {
      const b = entries[entries.length - 1].borderBoxSize[0];
      if (b) size = { width: b.inlineSize, height: b.blockSize };
    });
    sized.observe(el, { box: 'border-box' });
    // A text of the usual width from the start, so the first showing changes a text node in place and its size is known.
    if (!el.firstChild) el.textContent = 'Δz +0.0 m';
    const show = () => {
      frame = 0;
      const { doc, gestureStart } = useDocStore.getState();
      const { activeTool, camera } = useSessionStore.getState();
      const text = gestureStart ? dragReadoutText(doc, gestureStart, activeTool, camera.scale) : null;
      if (!text) {
        el.hidden = true;
        return;
      }
      // Its one text node changed in place: a new node each frame would be styled and laid out afresh.
      const t = el.firstChild;
      if (t instanceof Text && !t.nextSibling) t.data = text;
      else el.textContent = text;
      el.hidden = false;
      const r = cachedClientRect(box);
      const x = Math.min(Math.max(pointer.x - r.left + OFFSET_X, 4), Math.max(4, r.width - size.width - 4));
      const y = Math.min(Math.max(pointer.y - r.top + OFFSET_Y, 4), Math.max(4, r.height - size.height - 4));
      el.style.transform = `translate(${Math.round(x)}px, ${Math.round(y)}px)`;
    };
    const onMove = (e: PointerEvent) => {
      pointer = { x: e.clientX, y: e.clientY };
    };
    // Capture phase: the pointer is known before the tool's own move handler edits the document.
    window.addEventListener('pointermove', onMove, true);
    window.addEventListener('pointerdown', onMove, true);
    // Once a frame, not once a move.
    const unsubscribe = useDocStore.subscribe((s, prev) => {
      if ((s.doc !== prev.doc || s.gestureStart !== prev.gestureStart) && !frame) frame = requestAnimationFrame(show);
    });
    return () => {
      window.removeEventListener('pointermove', onMove, true);
      window.removeEventListener('pointerdown', onMove, true);
      cancelAnimationFrame(frame);
      sized.disconnect();
      unsubscribe();
    };
  }, []);
  return <div ref={ref} className="drag-readout" data-testid="drag-readout" hidden aria-live="off" />;
}
