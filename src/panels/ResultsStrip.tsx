// The compact live results beside the section (section workspace).
export function ResultsStrip() {
  return null;
}
