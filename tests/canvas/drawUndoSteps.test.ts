// Undo and redo of a line drawn by anchors, through the real document store and the real tool dispatch:
// while drawing, undo takes back the last stretch and redo puts it back (the document is untouched); once the
// line is finished, undo steps back stretch by stretch to the document before the line, and redo forward again.
import { beforeEach, describe, expect, it } from 'vitest';
import { dispatchToolEvent, redoInTool, undoInTool } from '../../src/canvas/toolDispatch';
import type { ImagePx } from '../../src/core/model/projectDoc';
import { useDocStore } from '../../src/state/docStore';
import { useSessionStore } from '../../src/state/sessionStore';
import { useToolSession } from '../../src/state/toolSessionStore';
import { toolDoc } from '../tools/toolFixture';

const click = (p: ImagePx) => dispatchToolEvent({ type: 'pointerDown', p, button: 0, clicks: 1, shift: false, alt: false });
const drawn = () => useDocStore.getState().doc.horizons.slice(1).map((h) => h.pointsPx);

describe('undo of a line drawn by anchors, through the store', () => {
  beforeEach(() => {
    useSessionStore.getState().setTool('select');
    useDocStore.getState().replace(toolDoc());
    useSessionStore.getState().setTool('draw');
  });

  it('while drawing, undo and redo take back and put back stretches without touching the document', () => {
    const before = useDocStore.getState().doc;
    for (const p of [[10, 300], [200, 280], [400, 250], [600, 300]] as ImagePx[]) click(p);
    expect(undoInTool()).toBe(true);
    expect(undoInTool()).toBe(true);
    expect(redoInTool()).toBe(true);
    // Nothing reached the document or its history while drawing.
    expect(useDocStore.getState().doc).toBe(before);
    expect(useDocStore.getState().past).toHaveLength(0);
    dispatchToolEvent({ type: 'key', key: 'Enter' });
    expect(useToolSession.getState().stateName).toBe('idle');
    // Four anchors, two stretches taken back, one put back: the line ends at the third anchor.
    expect(drawn()).toEqual([[[10, 300], [200, 280], [400, 250]]]);
    // Outside a line the tool takes neither, so the document's own history answers.
    expect(undoInTool()).toBe(false);
    expect(redoInTool()).toBe(false);
  });

  it('a new anchor after an undo drops what redo could have put back', () => {
    for (const p of [[10, 300], [200, 280], [400, 250]] as ImagePx[]) click(p);
    undoInTool();
    click([500, 200]);
    redoInTool();
    dispatchToolEvent({ type: 'key', key: 'Enter' });
    expect(drawn()).toEqual([[[10, 300], [200, 280], [500, 200]]]);
  });

  it('after finishing, undo steps back one stretch at a time to the document before the line; redo forward', () => {
    const start = useDocStore.getState().doc;
    const anchors: ImagePx[] = [[10, 300], [200, 280], [400, 250], [600, 300], [800, 320]];
    for (const p of anchors) click(p);
    dispatchToolEvent({ type: 'key', key: 'Enter' });
    expect(drawn()).toEqual([anchors]);
    const store = useDocStore.getState;
    for (let k = anchors.length - 1; k >= 2; k--) {
      store().undo();
      expect(drawn()).toEqual([anchors.slice(0, k)]);
    }
    store().undo();
    expect(store().doc).toBe(start);
    for (let k = 2; k <= anchors.length; k++) {
      store().redo();
      expect(drawn()).toEqual([anchors.slice(0, k)]);
    }
  });
});
