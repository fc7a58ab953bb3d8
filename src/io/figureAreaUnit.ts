// The area unit of exported graphs and tables. The same rule as the app's pane
// (src/panels/interpretation/formatValue.ts areaUnit; a test keeps the two in step): km² (10⁶ ft²)
// once the largest area reaches 10⁵ unit², else the unit squared.

export interface FigureAreaUnit { factor: number; label: string }

/** Returns the display factor and label for areas whose largest magnitude is `largestAbs` (units²). */
export function figureAreaUnit(units: string, largestAbs: number): FigureAreaUnit {
  if (largestAbs >= 1e5) return { factor: 1e-6, label: units === 'm' ? 'km²' : `10⁶ ${units}²` };
  return { factor: 1, label: `${units}²` };
}
