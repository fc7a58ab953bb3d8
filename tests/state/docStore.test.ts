// The document store's gesture bookkeeping that the view reads: the revision the status line speaks of (the one a
// gesture began at, until it ends) and the regionals a gesture's press said it would move.
import { beforeEach, describe, expect, it } from 'vitest';
import { offsetRegionals } from '../../src/core/model/commands/offsetRegionals';
import { setRegional } from '../../src/core/model/commands/setRegional';
import { shownRevision, useDocStore } from '../../src/state/docStore';
import { toolDoc } from '../tools/toolFixture';

const store = () => useDocStore.getState();

describe('docStore gestures', () => {
  beforeEach(() => {
    useDocStore.setState({ readOnly: false });
    store().replace(setRegional(toolDoc(), 'h1', [[0, 100], [1000, 100]]));
  });

  it('shownRevision holds the revision a gesture began at through its moves and follows the document after it ends', () => {
    const saved = store().savedRevision;
    expect(shownRevision(store())).toBe(saved);
    store().beginGesture(['h1']);
    for (let k = 1; k <= 3; k++) store().apply((d) => offsetRegionals(d, ['h1'], -k));
    expect(store().revision).toBe(saved + 3);
    expect(shownRevision(store())).toBe(saved);
    store().endGesture();
    expect(shownRevision(store())).toBe(saved + 3);
    expect(shownRevision(store())).not.toBe(store().savedRevision);
  });

  it('a cancelled gesture shows the revision the cancel made', () => {
    store().beginGesture();
    store().apply((d) => offsetRegionals(d, ['h1'], 5));
    store().cancelGesture();
    expect(shownRevision(store())).toBe(store().revision);
  });

  it('the regionals a press names are kept for its gesture only: end, cancel and replace clear them', () => {
    store().beginGesture(['h1']);
    expect(store().gestureRegionals).toEqual(['h1']);
    // A second begin while one is under way changes nothing.
    store().beginGesture([]);
    expect(store().gestureRegionals).toEqual(['h1']);
    store().endGesture();
    expect(store().gestureRegionals).toEqual([]);
    store().beginGesture(['h1']);
    store().cancelGesture();
    expect(store().gestureRegionals).toEqual([]);
    store().beginGesture(['h1']);
    store().replace(toolDoc());
    expect(store().gestureRegionals).toEqual([]);
    expect(store().gestureStart).toBeNull();
  });
});
