// A small label beside the pointer while it rests on a cutoff (the end of a horizon's piece on a fault):
// the fault's slip, heave and throw between that cutoff and its partner, as the analysis measured them.
// Updated straight on the element on pointer moves, never through React state.
import { useEffect, useRef } from 'react';
import { sectionToImage } from '../core/calibration/mapPoints';
import type { ImagePx } from '../core/model/projectDoc';
import { useDocStore } from '../state/docStore';
import { selectLiveAnalysis } from '../state/selectors';
import { useSessionStore } from '../state/sessionStore';
import { screenToImage } from '../state/camera';
import { cutoffText } from '../tools/cutoffText';
import { nearestCutoff } from '../tools/faultHits';
import { cachedClientRect } from './viewBoxRect';
import './dragReadout.css';

/** How near the pointer must be to a cutoff, in screen pixels; and the label's offset from the pointer. */
const HOVER_SCREEN_PX = 7;
const OFFSET_X = 14;
const OFFSET_Y = 12;

/** Returns the text for the cutoff under the image point p, or null. */
function cutoffUnder(p: ImagePx, scale: number): string | null {
  const { doc, gestureStart } = useDocStore.getState();
  const { docSection, outcome } = selectLiveAnalysis(doc, gestureStart);
  if (!outcome?.ok || !docSection.ok) return null;
  const fit = docSection.fit;
  const cutoffs = outcome.analysis.horizons.flatMap((h) => h.cutoffs);
  if (cutoffs.length === 0) return null;
  const pairs = cutoffs.map((c) => [sectionToImage(fit, c.from), sectionToImage(fit, c.to)] as const);
  const k = nearestCutoff(pairs, p, HOVER_SCREEN_PX / scale);
  return k < 0 ? null : cutoffText(cutoffs[k], cutoffs[k].fault, outcome.analysis.units);
}

export function CutoffReadout() {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const el = ref.current;
    const box = el?.parentElement;
    if (!el || !box) return;
    const onMove = (e: PointerEvent) => {
      // Nothing to show while a button is held (a drag): no reading of the page's layout then.
      if (e.buttons !== 0) {
        if (!el.hidden) el.hidden = true;
        return;
      }
      const r = cachedClientRect(box);
      const x = e.clientX - r.left;
      const y = e.clientY - r.top;
      const camera = useSessionStore.getState().camera;
      const text = cutoffUnder(screenToImage(camera, x, y), camera.scale);
      if (!text) {
        if (!el.hidden) el.hidden = true;
        return;
      }
      el.textContent = text;
      el.hidden = false;
      const left = Math.min(Math.max(x + OFFSET_X, 4), Math.max(4, r.width - el.offsetWidth - 4));
      const top = Math.min(Math.max(y + OFFSET_Y, 4), Math.max(4, r.height - el.offsetHeight - 4));
      el.style.transform = `translate(${Math.round(left)}px, ${Math.round(top)}px)`;
    };
    const onLeave = () => {
      el.hidden = true;
    };
    box.addEventListener('pointermove', onMove);
    box.addEventListener('pointerleave', onLeave);
    return () => {
      box.removeEventListener('pointermove', onMove);
      box.removeEventListener('pointerleave', onLeave);
    };
  }, []);
  return <div ref={ref} className="drag-readout cutoff-readout" data-testid="cutoff-readout" hidden aria-live="polite" />;
}
