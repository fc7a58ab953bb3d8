// The colour of a scenario's line in the area–depth graph: the one list, SCENARIO_COLOURS (core/model/horizonPalette.ts).
import { SCENARIO_COLOURS } from '../../core/model/horizonPalette';

/** The colour for the i-th scenario, cycling after six. */
export function scenarioColour(i: number): string {
  return SCENARIO_COLOURS[((i % SCENARIO_COLOURS.length) + SCENARIO_COLOURS.length) % SCENARIO_COLOURS.length];
}
