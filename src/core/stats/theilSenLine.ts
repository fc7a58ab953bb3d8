// The Theil–Sen line (Theil 1950, Proc. K. Ned. Akad. Wet. 53; Sen 1968, J. Am. Stat. Assoc. 63:1379–1389):
// slope = median of the slopes of all point pairs at different x, intercept = median of z − slope·x. It is
// unbiased under noise symmetric about the line and ignores up to about 29 % of wild points, so a few
// clicks off the bed, or the first rise of a fold inside the window, do not pull it.

/** Largest number of points used; more are thinned evenly (the pairwise slopes grow as n²). */
const MAX_POINTS = 400;

function median(values: number[]): number {
  values.sort((a, b) => a - b);
  const n = values.length;
  return n % 2 ? values[(n - 1) / 2] : (values[n / 2 - 1] + values[n / 2]) / 2;
}

/**
 * Returns the Theil–Sen line z = intercept + slope·x through the points; with one point, or all points at one x,
 * the slope is 0 and the intercept their median z; null for no points or non-finite input.
 */
export function theilSenLine(xs: ArrayLike<number>, zs: ArrayLike<number>): { slope: number; intercept: number } | null {
  const all = xs.length;
  if (all === 0 || zs.length !== all) return null;
  const step = all > MAX_POINTS ? all / MAX_POINTS : 1;
  const px: number[] = [], pz: number[] = [];
  for (let k = 0; k * step < all; k++) {
    const i = Math.floor(k * step);
    if (!Number.isFinite(xs[i]) || !Number.isFinite(zs[i])) return null;
    px.push(xs[i]);
    pz.push(zs[i]);
  }
  const slopes: number[] = [];
  for (let i = 0; i < px.length; i++) {
    for (let j = i + 1; j < px.length; j++) if (px[j] !== px[i]) slopes.push((pz[j] - pz[i]) / (px[j] - px[i]));
  }
  const slope = slopes.length ? median(slopes) : 0;
  const rest: number[] = [];
  for (let i = 0; i < px.length; i++) rest.push(pz[i] - slope * px[i]);
  return { slope, intercept: median(rest) };
}
