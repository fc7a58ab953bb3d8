// The horizons a layer draws, brought in a few at a time when many vertices arrive at once (a big document
// opened or restored): each horizon's shapes clip, measure and decimate its whole line when they first
// mount, about a tenth of a second a horizon of 100,000 vertices on a loaded machine, and all twelve in one
// React commit held the page for seconds. A line already drawn stays; a new one joins at once while the
// step's budget lasts (a horizon drawn by hand, an edit, an undo), the rest in the following tasks. Lines are
// told apart by the array itself, not the horizon's id: a newly opened document reuses ids.
import { useEffect, useRef, useState } from 'react';

/**
 * Vertices first drawn in one task at most (except a single line longer than that, drawn alone): about 1 ms a
 * thousand vertices for the fill, the line and their first drawing on a quiet machine (12 × 20,000 opened in
 * steps of 150,000 made a 168 ms task; one horizon of 100,000, 85 ms).
 */
const VERTICES_PER_STEP = 60_000;

/** Returns the ids to draw now, in their order: those whose line was drawn before, and new ones up to a step's vertices; the rest follow, a step a task. */
export function useShapesInSteps(ids: readonly string[], lines: readonly (readonly unknown[])[]): string[] {
  const drawn = useRef(new WeakSet<object>());
  const [, setStep] = useState(0);
  let budget = VERTICES_PER_STEP;
  let full = false;
  const now: string[] = [];
  const nowLines: (readonly unknown[])[] = [];
  for (let i = 0; i < ids.length; i++) {
    const line = lines[i] ?? [];
    if (!drawn.current.has(line)) {
      // A new line joins while it fits in what is left of the step (the step's first one whatever its length);
      // the first that does not closes the step, so lines still join in their order.
      if (full || (budget < VERTICES_PER_STEP && line.length > budget)) {
        full = true;
        continue;
      }
      budget -= line.length;
    }
    now.push(ids[i]);
    nowLines.push(line);
  }
  const complete = now.length === ids.length;
  useEffect(() => {
    for (const line of nowLines) drawn.current.add(line);
    if (complete) return;
    // The next step once the page has painted this one.
    const timer = setTimeout(() => setStep((k) => k + 1), 0);
    return () => clearTimeout(timer);
  });
  return now;
}
