// Which part of the scan a figure of a given pixel size shows, and at which level of the scan's tile pyramid
// (level k holds the scan at 1/2^k of its resolution) it is sharp enough: the coarsest level whose pixels are
// no larger than a pixel of the figure, so that a PNG never resamples more of the scan than it can show.

export interface PyramidLevelSize { factor: number; widthPx: number; heightPx: number }

/** The scan region to draw: a pyramid level and a rectangle of that level's pixels [x0, x1) × [y0, y1). */
export interface ScanRegionChoice { level: number; factor: number; x0: number; y0: number; x1: number; y1: number }

/**
 * Returns the level and the rectangle (level pixels, grown by two pixels for the smoothing filter and clipped to
 * the level) of the scan that the panel shows, for an output of `outPerFigureX` × `outPerFigureY` pixels per figure
 * unit; null when the panel shows none of the scan or the matrix cannot be inverted. `matrix` maps scan pixels to
 * figure units (SVG order a b c d e f); `levels` run from full resolution (factor 1) down.
 */
export function figureScanRegion(
  scan: { widthPx: number; heightPx: number },
  matrix: readonly [number, number, number, number, number, number],
  panel: { x: number; y: number; w: number; h: number },
  outPerFigureX: number,
  outPerFigureY: number,
  levels: readonly PyramidLevelSize[],
): ScanRegionChoice | null {
  const [a, b, c, d, e, f] = matrix;
  const det = a * d - b * c;
  if (!(Math.abs(det) > 0) || !Number.isFinite(det) || levels.length === 0) return null;
  // Output pixels per scan pixel along the scan's two axes; the finer of the two decides the level.
  const along = Math.max(Math.hypot(a * outPerFigureX, b * outPerFigureY), Math.hypot(c * outPerFigureX, d * outPerFigureY));
  let level = 0;
  while (level + 1 < levels.length && levels[level + 1].factor * along <= 1 + 1e-9) level++;
  // The panel's corners in scan pixels (the inverse of the matrix).
  let [u0, v0, u1, v1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const [x, y] of [[panel.x, panel.y], [panel.x + panel.w, panel.y], [panel.x, panel.y + panel.h], [panel.x + panel.w, panel.y + panel.h]]) {
    const [dx, dy] = [x - e, y - f];
    const u = (d * dx - c * dy) / det;
    const v = (a * dy - b * dx) / det;
    u0 = Math.min(u0, u); u1 = Math.max(u1, u);
    v0 = Math.min(v0, v); v1 = Math.max(v1, v);
  }
  const lv = levels[level];
  const x0 = Math.max(0, Math.floor(u0 / lv.factor) - 2);
  const y0 = Math.max(0, Math.floor(v0 / lv.factor) - 2);
  const x1 = Math.min(lv.widthPx, Math.ceil(u1 / lv.factor) + 2);
  const y1 = Math.min(lv.heightPx, Math.ceil(v1 / lv.factor) + 2);
  if (!(x1 > x0 && y1 > y0) || x0 >= lv.widthPx || y0 >= lv.heightPx) return null;
  return { level, factor: lv.factor, x0, y0, x1, y1 };
}
