// The one palette for horizons — drawn, imported, opened from a section file, and the demo's: twelve strong, distinct hues that read on grey or white scans,
// ordered so neighbouring horizons differ in hue and lightness.
export const HORIZON_PALETTE = [
  '#d1495b', '#2e86ab', '#edae49', '#3b8b5a', '#8e5ea2', '#e07a1f',
  '#1b998b', '#c2185b', '#5c6bc0', '#8d6e2f', '#00838f', '#6d4c41',
] as const;

/** Returns the palette colour for the n-th horizon (cycling). */
export function paletteColour(n: number): string {
  return HORIZON_PALETTE[((n % HORIZON_PALETTE.length) + HORIZON_PALETTE.length) % HORIZON_PALETTE.length];
}
