// The area–depth graph, the results table, scenarios, sensitivity and uncertainty (interpretation pane).
export function InterpretationPane() {
  return null;
}
