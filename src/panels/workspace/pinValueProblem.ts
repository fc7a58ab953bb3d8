// Which typed pin positions are refused. A left pin typed right of the right pin used to swap the two
// silently (losing the user's pin); a value like 1e99 was taken as a pin. Both are refused with a reason.
import { formatNumber } from '../../format/formatQuantity';

/** Returns x as the pin fields show it: to 0.01 of the unit, without float noise. */
const shownX = (x: number) => formatNumber(Math.round(x * 100) / 100, 10);

/** How far beyond the scan a pin may go: the scan's x-extent widened to this many times its width about its middle. */
export const PIN_EXTENT_FACTOR = 10;

/** Returns the allowed [min, max] section x for pins given the scan's x-extent, or null without one. */
export function pinAllowedRange(extent: [number, number] | null): [number, number] | null {
  if (!extent || !Number.isFinite(extent[0]) || !Number.isFinite(extent[1])) return null;
  const lo = Math.min(extent[0], extent[1]);
  const hi = Math.max(extent[0], extent[1]);
  const half = (PIN_EXTENT_FACTOR * Math.max(hi - lo, 1e-9)) / 2;
  const mid = (lo + hi) / 2;
  return [mid - half, mid + half];
}

/** Returns why section x is refused for the left or right pin (other pin's x, scan x-extent), or null when it may be used. */
export function pinValueProblem(side: 'left' | 'right', x: number, other: number | null, extent: [number, number] | null, unit: string): string | null {
  if (!Number.isFinite(x)) return `the ${side} pin needs a finite x`;
  const range = pinAllowedRange(extent);
  if (range && (x < range[0] || x > range[1])) {
    return `x = ${formatNumber(x, 10)} ${unit} is far outside the scan (allowed ${formatNumber(range[0], 6)} to ${formatNumber(range[1], 6)} ${unit})`;
  }
  if (other !== null && side === 'left' && x >= other) return `the left pin must lie left of the right pin (x < ${shownX(other)} ${unit})`;
  if (other !== null && side === 'right' && x <= other) return `the right pin must lie right of the left pin (x > ${shownX(other)} ${unit})`;
  return null;
}
