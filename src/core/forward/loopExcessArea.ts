// Signed excess area of a horizon over its regional, both already clipped to the pins.
import type { XZ } from '../model/section';

/**
 * Returns the shoelace area (units²) of the loop "horizon left→right, regional right→left",
 * positive where the horizon lies above the regional (Epard & Groshong 1993); 0 for empty input.
 */
export function loopExcessArea(horizon: XZ[], regional: XZ[]): number {
  if (horizon.length < 2 || regional.length < 2) return 0;
  // Local origin: map-scale coordinates would otherwise cancel digits (docs/method.md §Numerics).
  const ox = horizon[0][0];
  const oz = horizon[0][1];
  const loop: XZ[] = [...horizon, ...[...regional].reverse()];
  let twice = 0;
  for (let i = 0; i < loop.length; i++) {
    const [xa, za] = loop[i];
    const [xb, zb] = loop[(i + 1) % loop.length];
    twice += (xa - ox) * (zb - oz) - (xb - ox) * (za - oz);
  }
  // The loop runs clockwise when the horizon is above, so the usual counter-clockwise sign is flipped.
  return -twice / 2;
}
