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

/**
 * The marks drawn on the section and in its figures, one colour each wherever they are drawn: the estimated
 * detachment (line, interval band, graph marker and labels, screen and export) and the pins.
 */
export const MARK_COLOURS = {
  detachment: '#b3261e',
  pin: '#263238',
  /** A tool's preview line and marks when the tool gives no colour of its own. */
  preview: '#111111',
} as const;

/** Colours given to faults in order: black and dark greys, so a fault never looks like a horizon (HORIZON_PALETTE holds only strong hues). */
export const FAULT_COLOURS = ['#111111', '#555555', '#2b2b4a', '#3d3d3d'] as const;

/** Returns the colour the n-th fault of a document is given (cycling through FAULT_COLOURS). */
export function faultColour(n: number): string {
  return FAULT_COLOURS[((n % FAULT_COLOURS.length) + FAULT_COLOURS.length) % FAULT_COLOURS.length];
}

/**
 * Line colours for scenarios in the area–depth graph (pane and export: scenario i takes colour i), chosen for
 * contrast on white and for colour-blind readers (a common qualitative ordering: blue, orange, green-blue,
 * purple, red-brown, grey).
 */
export const SCENARIO_COLOURS = ['#1f6f8b', '#d07a1f', '#2a9d7a', '#7a4fa3', '#a3412b', '#5f6b73'] as const;

/** Returns the colour of the i-th scenario of a document (its line and points in the area–depth graph, pane and export), cycling after six. */
export function scenarioColour(i: number): string {
  return SCENARIO_COLOURS[((i % SCENARIO_COLOURS.length) + SCENARIO_COLOURS.length) % SCENARIO_COLOURS.length];
}
