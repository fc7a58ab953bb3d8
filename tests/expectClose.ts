import { expect } from 'vitest';

/**
 * Asserts |actual − expected| ≤ abs + rel·|expected| (rel counts as absolute when expected is 0), with the
 * numbers and the label in the failure message. The one tolerance helper of the tests.
 */
export function expectClose(actual: number, expected: number, rel = 1e-12, more: { abs?: number; label?: string } = {}): void {
  const scale = expected === 0 ? 1 : Math.abs(expected);
  const tolerance = (more.abs ?? 0) + rel * scale;
  const error = Math.abs(actual - expected);
  const label = more.label ? `${more.label}: ` : '';
  expect(error, `${label}actual ${actual} expected ${expected}, off by ${error} > ${tolerance}`).toBeLessThanOrEqual(tolerance);
}
