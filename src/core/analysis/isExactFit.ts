// Exact area–depth fits: the app, the figure and the report name them instead of giving a zero-width interval.
/**
 * Whether the area–depth line passes through its points exactly (residual standard error 0, or r² = 1
 * to 12 digits) with points to spare (n ≥ 3): its intervals then have zero width, which reads like
 * certainty; every view and export says "exact fit: no interval" instead of a zero-width interval.
 */
export function isExactFit(ad: { n: number; s: number; r2: number } | null | undefined): boolean {
  return !!ad && ad.n >= 3 && (ad.s === 0 || Math.abs(1 - ad.r2) < 1e-12);
}

/** What the pane writes in place of the interval of an exact fit. */
export const EXACT_FIT_TEXT = 'exact fit: no interval';
