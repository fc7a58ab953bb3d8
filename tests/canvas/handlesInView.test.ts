import { describe, expect, it } from 'vitest';
import type { ImagePx } from '../../src/core/model/projectDoc';
import { handlesInView } from '../../src/canvas/handlesInView';

// The view arithmetic is the camera's (screen = image · scale + offset, src/state/camera.ts); the expected
// sets are worked by hand from it.
describe('handlesInView(vertices, view, cap)', () => {
  const line: ImagePx[] = Array.from({ length: 1001 }, (_, k): ImagePx => [k, 100]);

  it('keeps the vertices inside the view and a handle width around it, in order', () => {
    // scale 2, offset (−200, 0), 400 × 300 px: image u from 100 to 300, v from 0 to 150; margin 4 / 2 = 2 px.
    const seen = handlesInView(line, { scale: 2, x: -200, y: 0, width: 400, height: 300 }, 1000);
    expect(seen.points?.map((p) => p[0])).toEqual(Array.from({ length: 205 }, (_, k) => 98 + k));
    expect(seen.count).toBe(205);
  });

  it('gives no points, only the count, when more than the cap are in view', () => {
    const seen = handlesInView(line, { scale: 0.5, x: 0, y: 0, width: 800, height: 600 }, 500);
    expect(seen).toEqual({ points: null, count: 1001 });
  });

  it('leaves out vertices above or below the view', () => {
    // v = 100 lies below a view showing v from 0 to 40 (scale 1, 40 px high, margin 4).
    expect(handlesInView(line, { scale: 1, x: 0, y: 0, width: 2000, height: 40 }, 10)).toEqual({ points: [], count: 0 });
  });
});
