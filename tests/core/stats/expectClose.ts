import { expect } from 'vitest';

/** Asserts |actual − expected| ≤ rel·|expected| (or ≤ rel when expected is 0), with both values in the message. */
export function expectClose(actual: number, expected: number, rel: number, label = ''): void {
  const scale = expected === 0 ? 1 : Math.abs(expected);
  const error = Math.abs(actual - expected) / scale;
  expect(error, `${label} actual ${actual} expected ${expected} relative error ${error}`).toBeLessThanOrEqual(rel);
}
