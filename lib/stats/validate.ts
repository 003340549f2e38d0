/** Counts must be whole, non-negative and consistent: a fractional or swapped count is a caller bug. */
export function assertCounts(x: number, n: number, label = "x"): void {
  if (!Number.isInteger(n) || n < 0) {
    throw new RangeError(`n must be a non-negative integer, got ${String(n)}`);
  }
  if (!Number.isInteger(x) || x < 0 || x > n) {
    throw new RangeError(`${label} must be an integer between 0 and n (${n}), got ${String(x)}`);
  }
}
