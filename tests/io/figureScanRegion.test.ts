// The scan region a PNG draws: the panel's corners taken back through the figure's matrix (worked by hand
// below), at the coarsest pyramid level whose pixels are no larger than the PNG's.
import { describe, expect, it } from 'vitest';
import { figureScanRegion } from '../../src/io/figureScanRegion';

/** A pyramid of levels halving from full resolution, as state/scanTiles builds it. */
const levels = (w: number, h: number, n: number) => Array.from({ length: n }, (_, k) => ({ factor: 2 ** k, widthPx: Math.ceil(w / 2 ** k), heightPx: Math.ceil(h / 2 ** k) }));

describe('figureScanRegion', () => {
  const panel = { x: 100, y: 50, w: 800, h: 600 };

  it('takes the whole scan at the level of the output resolution', () => {
    // 8000 × 6000 px scan drawn at 0.1 figure units a pixel from the panel's corner: the scan fills the panel.
    // At 1 output px a figure unit a scan pixel is 0.1 output px: level 3 (8 px) is the coarsest no coarser than 10.
    const r = figureScanRegion({ widthPx: 8000, heightPx: 6000 }, [0.1, 0, 0, 0.1, 100, 50], panel, 1, 1, levels(8000, 6000, 6));
    expect(r).toEqual({ level: 3, factor: 8, x0: 0, y0: 0, x1: 1000, y1: 750 });
    // Four times the output: 0.4 output px a scan pixel, level 1 (2 px; level 2's 4 px are larger than 2.5).
    expect(figureScanRegion({ widthPx: 8000, heightPx: 6000 }, [0.1, 0, 0, 0.1, 100, 50], panel, 4, 4, levels(8000, 6000, 6))?.level).toBe(1);
  });

  it('takes only the part the panel shows, grown by two pixels, within the scan', () => {
    // Zoomed in: 1 figure unit a scan pixel, the scan's (1000, 2000) at the panel's corner: the panel shows
    // scan pixels 1000–1800 across and 2000–2600 down.
    const r = figureScanRegion({ widthPx: 8000, heightPx: 6000 }, [1, 0, 0, 1, 100 - 1000, 50 - 2000], panel, 1, 1, levels(8000, 6000, 6));
    expect(r).toEqual({ level: 0, factor: 1, x0: 998, y0: 1998, x1: 1802, y1: 2602 });
  });

  it('covers a turned scan by the bounding box of the panel taken back', () => {
    // Turned 90°: figure (x, y) = (−v + 700, u − 0) · 1, so the panel's corners come back as u 50–650, v −200–600.
    const r = figureScanRegion({ widthPx: 1000, heightPx: 1000 }, [0, 1, -1, 0, 700, 0], panel, 1, 1, levels(1000, 1000, 1));
    expect(r).toEqual({ level: 0, factor: 1, x0: 48, y0: 0, x1: 652, y1: 602 });
  });

  it('returns null when the panel shows none of the scan or the matrix is flat', () => {
    expect(figureScanRegion({ widthPx: 100, heightPx: 100 }, [1, 0, 0, 1, 5000, 5000], panel, 1, 1, levels(100, 100, 1))).toBeNull();
    expect(figureScanRegion({ widthPx: 100, heightPx: 100 }, [1, 2, 2, 4, 0, 0], panel, 1, 1, levels(100, 100, 1))).toBeNull();
  });
});
