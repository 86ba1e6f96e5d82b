/** "Did you mean …?" help for misspelt names (config keys, flags, commands, columns). */

/** Levenshtein distance (insert, delete, substitute; each costs 1). @testOnly */
export function editDistance(a: string, b: string): number {
  if (a === b) return 0;
  if (a.length === 0) return b.length;
  if (b.length === 0) return a.length;
  let previous = new Array<number>(b.length + 1);
  let current = new Array<number>(b.length + 1);
  for (let j = 0; j <= b.length; j++) previous[j] = j;
  for (let i = 1; i <= a.length; i++) {
    current[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const substitution = previous[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1);
      current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, substitution);
    }
    [previous, current] = [current, previous];
  }
  return previous[b.length];
}

/**
 * The candidate closest to `name` (case-insensitive, `_` and `-` treated alike), or null
 * when none is close enough to be a plausible typo: at most a third of the longer name's
 * letters may differ, but always two (a rule of thumb, no source); ties keep the first candidate.
 */
export function nearest(name: string, candidates: readonly string[]): string | null {
  const norm = (s: string): string => s.toLowerCase().replace(/_/g, '-');
  const wanted = norm(name);
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const d = editDistance(wanted, norm(candidate));
    if (d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  if (best === null) return null;
  const limit = Math.max(2, Math.ceil(Math.max(wanted.length, best.length) / 3));
  return bestDistance <= limit ? best : null;
}

/** " (did you mean `x`?)" or "" when nothing is close. */
export function didYouMean(name: string, candidates: readonly string[]): string {
  const match = nearest(name, candidates);
  return match === null ? '' : ` (did you mean "${match}"?)`;
}
