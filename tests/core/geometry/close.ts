import { expect } from 'vitest';

/** Expect |actual − expected| ≤ abs + rel·|expected|, with the numbers in the failure message. */
export function expectClose(actual: number, expected: number, rel = 1e-12, abs = 0): void {
  const tol = abs + rel * Math.abs(expected);
  const ok = Math.abs(actual - expected) <= tol;
  expect(ok, `expected ${actual} to be within ${tol} of ${expected}`).toBe(true);
}
