// The box around a line's vertices, remembered per line: framing a big document (a million vertices) read every
// vertex again in the task that draws it, a tenth of a second. Opening a file measures each line in a task of
// its own first (state/projectActions), so the framing only combines the boxes. A line array is never changed in
// place (every edit makes new arrays), so the array decides the box.

/** [smallest x, smallest y, largest x, largest y] of a line's points; an empty line gives [∞, ∞, −∞, −∞]. */
export type PointsBox = readonly [number, number, number, number];

const boxes = new WeakMap<readonly (readonly [number, number])[], PointsBox>();

/** Returns the box of the points (a plain loop, no spread: lines run to hundreds of thousands of vertices); the same for the same array. */
export function pointsBox(points: readonly (readonly [number, number])[]): PointsBox {
  const hit = boxes.get(points);
  if (hit) return hit;
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  // Indexed, not destructured: a million vertices through the array iterator took a tenth of a second.
  for (let i = 0; i < points.length; i++) {
    const x = points[i][0];
    const y = points[i][1];
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
  }
  const box: PointsBox = [x0, y0, x1, y1];
  boxes.set(points, box);
  return box;
}
