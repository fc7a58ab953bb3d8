// The view and its size: fitted, it stays fitted when the window or pane changes size; zoomed or panned
// by the user, it keeps the image point at its centre where it was, at the same zoom. Checked on the
// geometry of the screen (where the image box lands), not on the fitting formula itself.
import { beforeEach, describe, expect, it } from 'vitest';
import { screenToImage } from '../../src/state/camera';
import { useSessionStore, type FitTarget } from '../../src/state/sessionStore';

const session = () => useSessionStore.getState();

/** Where the target's box lands on the screen with the current camera: left, top, right, bottom (screen px). */
function boxOnScreen(t: FitTarget): [number, number, number, number] {
  const { scale, x, y } = session().camera;
  return [x + t.u0 * scale, y + t.v0 * scale, x + (t.u0 + t.width) * scale, y + (t.v0 + t.height) * scale];
}

/** The box is fitted: inside the view with the margin, touching the margin on one axis, and centred on both. */
function expectFitted(t: FitTarget, w: number, h: number): void {
  const [l, top, r, b] = boxOnScreen(t);
  expect(l).toBeGreaterThanOrEqual(t.margin - 1e-9);
  expect(top).toBeGreaterThanOrEqual(t.margin - 1e-9);
  expect(r).toBeLessThanOrEqual(w - t.margin + 1e-9);
  expect(b).toBeLessThanOrEqual(h - t.margin + 1e-9);
  expect(Math.min(l - t.margin, top - t.margin)).toBeCloseTo(0, 9);
  expect((l + r) / 2).toBeCloseTo(w / 2, 9);
  expect((top + b) / 2).toBeCloseTo(h / 2, 9);
}

describe('the view when it changes size', () => {
  beforeEach(() => {
    useSessionStore.setState({ viewport: { width: 1000, height: 700 }, camera: { scale: 1, x: 0, y: 0 }, fitted: null });
  });

  it('setViewport(w, h) keeps a fitted scan fitted, through any number of size changes', () => {
    const scan: FitTarget = { u0: 0, v0: 0, width: 2400, height: 1200, margin: 24 };
    session().fitTo(scan);
    expectFitted(scan, 1000, 700);
    for (const [w, h] of [[700, 700], [1600, 500], [1200, 900]]) {
      session().setViewport(w, h);
      expectFitted(scan, w, h);
    }
  });

  it('setViewport(w, h) keeps lines fitted with their offset box (a project without a scan)', () => {
    const lines: FitTarget = { u0: -350, v0: 120, width: 5000, height: 800, margin: 48 };
    session().fitTo(lines);
    session().setViewport(640, 480);
    expectFitted(lines, 640, 480);
  });

  it('after a zoom or pan of the user\'s, setViewport(w, h) keeps the image point at the view\'s centre and the zoom', () => {
    session().fitTo({ u0: 0, v0: 0, width: 2400, height: 1200, margin: 24 });
    session().setCamera({ scale: 0.8, x: -130, y: 45 });
    const centre = screenToImage(session().camera, 500, 350);
    session().setViewport(700, 900);
    expect(session().camera.scale).toBe(0.8);
    const after = screenToImage(session().camera, 350, 450);
    expect(after[0]).toBeCloseTo(centre[0], 9);
    expect(after[1]).toBeCloseTo(centre[1], 9);
    // Still the user's view: a second change keeps the centre again rather than refitting.
    session().setViewport(1300, 600);
    const again = screenToImage(session().camera, 650, 300);
    expect(again[0]).toBeCloseTo(centre[0], 9);
    expect(again[1]).toBeCloseTo(centre[1], 9);
    // Fit (F) makes it follow the size again.
    const scan: FitTarget = { u0: 0, v0: 0, width: 2400, height: 1200, margin: 24 };
    session().fitTo(scan);
    session().setViewport(900, 900);
    expectFitted(scan, 900, 900);
  });

  it('setViewport with the same size changes nothing', () => {
    session().setCamera({ scale: 2, x: 10, y: 20 });
    const before = session();
    session().setViewport(1000, 700);
    expect(session()).toBe(before);
  });
});

describe('the results strip over the view', () => {
  it('setViewInsetBottom(px) records the strip height and does not move the view (the strip changes height while the user works)', () => {
    useSessionStore.setState({ viewport: { width: 1000, height: 700 }, camera: { scale: 1, x: 0, y: 0 }, fitted: null, viewInsetBottom: 0 });
    session().fitTo({ u0: 0, v0: 0, width: 2400, height: 1200, margin: 24 });
    const before = session().camera;
    session().setViewInsetBottom(90);
    expect(session().viewInsetBottom).toBe(90);
    expect(session().camera).toEqual(before);
  });
});
