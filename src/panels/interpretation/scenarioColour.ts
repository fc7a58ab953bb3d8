// Distinct line colours for scenarios, chosen for contrast on white and for colour-blind readers
// (a common qualitative ordering: blue, orange, green-blue, purple, red-brown, grey).
const COLOURS = ['#1f6f8b', '#d07a1f', '#2a9d7a', '#7a4fa3', '#a3412b', '#5f6b73'];

/** The colour for the i-th scenario, cycling after six. */
export function scenarioColour(i: number): string {
  return COLOURS[((i % COLOURS.length) + COLOURS.length) % COLOURS.length];
}
