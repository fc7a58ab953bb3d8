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

/** The excess-area fills, on the canvas and in the figure: orange above the regional (added), blue below (subtracted). */
export const EXCESS_FILL = {
  above: { colour: 'rgb(232, 121, 30)', opacity: 0.3 },
  below: { colour: 'rgb(38, 104, 199)', opacity: 0.3 },
} as const;

/** Returns a fill as one CSS colour with its opacity ("rgba(232, 121, 30, 0.3)"). */
export function fillRgba(fill: { colour: string; opacity: number }): string {
  return fill.colour.replace(/^rgb\((.*)\)$/, `rgba($1, ${fill.opacity})`);
}
