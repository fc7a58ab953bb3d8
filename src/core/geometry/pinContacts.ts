// Count a line's contacts with the two vertical pins x = pL and x = pR and find where a valid
// clip starts and ends (docs/method.md §Pins, regional and excess area: "each line must cross each pin exactly once"). A contact is a
// crossing, a touch, or a run of vertices along the pin, counted when the line leaves the pin
// line, so a line that misses a pin, touches it, or folds back across it is reported, never
// guessed. Only x is read: this is the cheap first pass of clipAndMeasure, which then cuts and
// measures just the part between the pins.

/** Contacts with each pin and, for a left-to-right line, where the clip begins and ends. */
export interface PinContacts {
  leftCount: number;
  rightCount: number;
  /** The first right-pin contact comes before the first left-pin contact (a right-to-left line). */
  reversed: boolean;
  /** A clip began at the first left contact and ended at the first right contact. */
  found: boolean;
  /** The clip starts in input segment startSeg (vertex startSeg to startSeg + 1) at fraction startT (0: on vertex startSeg). */
  startSeg: number;
  startT: number;
  /** The clip ends in input segment endSeg at fraction endT (1: on vertex endSeg + 1). */
  endSeg: number;
  endT: number;
}

/** Pin contacts of X[0..n) (n ≥ 2) for pL < pR; startSeg/endSeg are meaningful when `found`. */
export function pinContacts(X: ArrayLike<number>, n: number, pL: number, pR: number): PinContacts {
  // Side of each pin: −1 left of it, 0 on it, +1 right of it. A contact's position (for the
  // direction test) is its crossing parameter, or the first vertex of its run on the pin.
  let prevL = X[0] < pL ? -1 : X[0] > pL ? 1 : 0;
  let prevR = X[0] < pR ? -1 : X[0] > pR ? 1 : 0;
  let posL = prevL === 0 ? 0 : -1;
  let posR = prevR === 0 ? 0 : -1;
  let nL = 0;
  let nR = 0;
  let open = false;
  const c: PinContacts = { leftCount: 0, rightCount: 0, reversed: false, found: false, startSeg: 0, startT: 0, endSeg: 0, endT: 0 };
  for (let i = 1; i < n; i++) {
    const x = X[i];
    // Step 1: the common case, a vertex strictly between the pins after one that was too: nothing changes.
    if (prevL === 1 && prevR === -1 && x > pL && x < pR) continue;
    const sL = x < pL ? -1 : x > pL ? 1 : 0;
    const sR = x < pR ? -1 : x > pR ? 1 : 0;
    if (sL !== prevL) {
      // Step 2: a left contact begins (a run on the pin, or a crossing) and completes when the line is off the pin.
      // (x ≠ X[i − 1] whenever the side changes, so t is finite.)
      const t = (pL - X[i - 1]) / (x - X[i - 1]);
      if (posL < 0) posL = sL === 0 ? i : i - 1 + t;
      if (sL === 0) {
        // On the pin: the contact completes when the line leaves it. Back on the left pin, no valid clip.
        open = false;
      } else if (nL++ === 0 && posR < 0 && sL === 1) {
        // The clip starts at the crossing inside segment i − 1, or at the last vertex of the run on the pin.
        // (A first left contact followed by x < pL, or by the right pin first, cannot give a valid clip.)
        c.startSeg = i - 1;
        c.startT = prevL === 0 ? 0 : t;
        open = true;
      } else open = false;
      prevL = sL;
    }
    if (sR !== prevR) {
      // Step 3: the first right contact begins (a run starts on the pin, or a crossing): the clip ends there.
      const t = (pR - X[i - 1]) / (x - X[i - 1]);
      if (posR < 0) posR = sR === 0 ? i : i - 1 + t;
      if (sR !== 0) nR++;
      if (open) {
        c.endSeg = i - 1;
        c.endT = sR === 0 ? 1 : t;
        c.found = true;
        open = false;
      }
      prevR = sR;
    }
  }
  // Runs on a pin that last to the end of the line are contacts too.
  if (prevL === 0) nL++;
  if (prevR === 0) nR++;
  c.leftCount = nL;
  c.rightCount = nR;
  c.reversed = posL > posR;
  return c;
}
