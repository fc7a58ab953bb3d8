// Vertex handles are drawn only where they can be seen and told apart. A traced horizon can have tens of
// thousands of vertices; at a zoom where many fall into each screen pixel their handles merge into a solid
// band that hides the line and says nothing about where one vertex is. So handles are drawn for the vertices
// inside the view (and a handle's width around it), and none when more than `cap` of them are there: the
// user is told to zoom in instead. The tools still pick from every vertex.

import type { ImagePx } from '../core/model/projectDoc';

/** A view in screen px with its camera (screen = image · scale + offset). */
export interface ScreenView { scale: number; x: number; y: number; width: number; height: number }

export type HandlesInView = { points: ImagePx[]; count: number } | { points: null; count: number };

/** The vertices whose handles (half-width `halfScreenPx`) touch the view, or points: null with their count when there are more than `cap`. */
export function handlesInView(vertices: readonly ImagePx[], view: ScreenView, cap: number, halfScreenPx = 4): HandlesInView {
  const margin = halfScreenPx / view.scale;
  const u0 = -view.x / view.scale - margin;
  const u1 = (view.width - view.x) / view.scale + margin;
  const v0 = -view.y / view.scale - margin;
  const v1 = (view.height - view.y) / view.scale + margin;
  const points: ImagePx[] = [];
  let count = 0;
  for (const p of vertices) {
    if (p[0] < u0 || p[0] > u1 || p[1] < v0 || p[1] > v1) continue;
    count++;
    if (count <= cap) points.push(p);
  }
  return count > cap ? { points: null, count } : { points, count };
}
