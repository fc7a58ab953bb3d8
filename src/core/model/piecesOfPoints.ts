// A horizon's pieces from its one flat list of vertices and its joins (DocHorizon.joins): each join starts a
// new piece at vertex index `at`. The one split rule for the canvas, the figure and the exports; the
// analysis (docToSection) applies the same split and refuses a piece of fewer than two vertices.

/** Returns the vertices split into pieces at each join's `at` (joins out of range or out of order are left out). */
export function piecesOfPoints<T, J extends { at: number }>(points: readonly T[], joins: readonly J[]): T[][] {
  const pieces: T[][] = [];
  let from = 0;
  for (const j of joins) {
    if (j.at <= from || j.at >= points.length) continue;
    pieces.push(points.slice(from, j.at));
    from = j.at;
  }
  pieces.push(points.slice(from));
  return pieces;
}
