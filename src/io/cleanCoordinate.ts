// Exported coordinates without float noise: the calibration's arithmetic leaves tails such as
// 17000.000000000004 or -9.79e-13 that no digitised or typed value ever meant.

/** Coordinates are written to this resolution, in the section unit (1 µm in metres): far below any digitising error. */
export const COORDINATE_RESOLUTION = 1e-6;

/** Returns the value rounded to COORDINATE_RESOLUTION (15 significant digits beyond 1e9 units, where that grid would exceed a double's digits); −0 becomes 0; non-finite values pass through. */
export function cleanCoordinate(v: number): number {
  if (!Number.isFinite(v)) return v;
  const r = Math.abs(v) >= 1e9 ? Number(v.toPrecision(15)) : Math.round(v / COORDINATE_RESOLUTION) / (1 / COORDINATE_RESOLUTION);
  // `|| 0` turns −0 (and 0) into +0, so no file ever says "-0".
  return r || 0;
}

/** Returns a point [x, z] with both coordinates cleaned. */
export function cleanPoint(p: readonly [number, number]): [number, number] {
  return [cleanCoordinate(p[0]), cleanCoordinate(p[1])];
}
