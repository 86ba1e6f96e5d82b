/**
 * Wilson score interval for a binomial success rate (Wilson 1927). Used to show how
 * sure the k-of-n restart count at a width is.
 */

/** Two-sided 95% normal quantile. */
const Z95 = 1.959964;

export function wilsonInterval(successes: number, trials: number, z: number = Z95): [number, number] {
  if (trials <= 0) return [0, 1];
  const n = trials;
  const p = successes / n;
  const z2 = z * z;
  const denom = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / denom;
  const half = (z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n))) / denom;
  // Clamp the rounding dust at the ends so 0/n starts at exactly 0 and n/n ends at exactly 1.
  const lo = successes === 0 ? 0 : Math.max(0, centre - half);
  const hi = successes === n ? 1 : Math.min(1, centre + half);
  return [lo, hi];
}
