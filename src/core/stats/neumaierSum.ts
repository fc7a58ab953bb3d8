// Compensated summation (Neumaier 1974, ZAMM 54:39–51, the improved Kahan–Babuška sum):
// the running error term also catches the low digits of the sum when an addend is larger.

/** Sum of the values with compensation for rounding; 0 for no values; the plain sum when it is not finite. */
export function neumaierSum(values: ArrayLike<number>): number {
  let sum = 0;
  let compensation = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    const t = sum + v;
    if (Math.abs(sum) >= Math.abs(v)) compensation += sum - t + v;
    else compensation += v - t + sum;
    sum = t;
  }
  // With an infinite or NaN term the compensation is NaN; the plain sum is the meaningful answer.
  return Number.isFinite(sum) ? sum + compensation : sum;
}
