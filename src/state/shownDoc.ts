// The document as the panes render it. Outside a gesture it is the document itself. While a gesture is under
// way it stays as the panes last rendered it: a drag changes the document every frame, and rendering the panes
// and laying out the page again each time took longer than a frame on a big document. Meanwhile the numbers that
// follow the pointer are written into the page once a frame by the live text (panels/liveText.tsx), from the one
// live analysis and the one formatter, and the panes render once more when the gesture ends (or when a number
// needs a change the live text cannot make, see showDocNow).
import { useSyncExternalStore } from 'react';
import { create } from 'zustand';
import type { ProjectDoc } from '../core/model/projectDoc';
import { useDocStore } from './docStore';

export interface ShownDoc {
  doc: ProjectDoc;
  /** The gesture's start for the shown document (selectLiveAnalysis), or null. */
  gestureStart: ProjectDoc | null;
}

const shownDocStore = create<ShownDoc>()(() => ({ doc: useDocStore.getState().doc, gestureStart: useDocStore.getState().gestureStart }));

/**
 * The shown document in a component (and the store's getState/setState/subscribe). A static render
 * (renderToStaticMarkup) reads the document shown now, not the store's first state as a server render would.
 */
export const useShownDoc = Object.assign(
  (): ShownDoc => useSyncExternalStore(shownDocStore.subscribe, shownDocStore.getState, shownDocStore.getState),
  { getState: shownDocStore.getState, setState: shownDocStore.setState, subscribe: shownDocStore.subscribe },
);

/** Shows the store's document now: the panes render it (during a gesture, when the live text cannot follow). */
export function showDocNow(): void {
  const { doc, gestureStart } = useDocStore.getState();
  const shown = useShownDoc.getState();
  if (shown.doc !== doc || shown.gestureStart !== gestureStart) useShownDoc.setState({ doc, gestureStart });
}

useDocStore.subscribe((s) => {
  // A gesture's moves are held (its start leaves the document as it was); its end, released or cancelled, is shown.
  if (!s.gestureStart) showDocNow();
});
