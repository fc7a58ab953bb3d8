import { describe, expect, it } from 'vitest';
import { pinchCamera } from '../../src/canvas/usePinchZoom';

describe('pinchCamera', () => {
  it('pinchCamera zooms about the fingers\' midpoint: the image point under it stays put', () => {
    const cam = { scale: 0.5, x: 100, y: 50 };
    const next = pinchCamera(cam, [400, 300], [600, 300], [300, 300], [700, 300]);
    expect(next.scale).toBeCloseTo(1, 12);
    const uBefore = (500 - cam.x) / cam.scale;
    const uAfter = (500 - next.x) / next.scale;
    expect(uAfter).toBeCloseTo(uBefore, 9);
  });
  it('pinchCamera pans with the midpoint when the fingers keep their distance', () => {
    const next = pinchCamera({ scale: 1, x: 0, y: 0 }, [100, 100], [200, 100], [130, 140], [230, 140]);
    expect(next).toEqual({ scale: 1, x: 30, y: 40 });
  });
});
