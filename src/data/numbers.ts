/** Strict reading of numbers from CSV text: plain decimal notation only. */

/** What a cell's text is, as far as numbers go. */
export const NumberKind = {
  /** A finite decimal number. */
  Finite: 0,
  /** Not a number at all (text). */
  Text: 1,
  /** `NaN`, `Infinity` and friends: number-like, but not a measurement. */
  NotFinite: 2,
  /** Decimal notation beyond ±MAX_MAGNITUDE (e.g. 1e39, or 1e400, which overflows a 64-bit float). */
  Overflow: 3,
} as const;
export type NumberKind = (typeof NumberKind)[keyof typeof NumberKind];

/**
 * The largest magnitude a cell may hold: float32's largest finite value. A device runs the
 * network in float32, which cannot hold anything larger; and it keeps every column statistic
 * finite (a sum of squared differences reaches at most rows × 4.6e77), whereas one cell of
 * 1.7e308 overflows the variance to Infinity. Such a cell is refused rather than rescaled.
 */
export const MAX_MAGNITUDE = 3.4028234663852886e38;

// Decimal notation: optional sign, digits with an optional fraction, optional exponent.
// Hex, binary, `1_000` and the like are text, even though Number() would accept some.
const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const NON_FINITE = /^[+-]?(?:nan|inf|infinity)$/i;

/** Reads `text` (already trimmed); the value is in `parsed.value` when Finite. */
export function classifyNumber(text: string, parsed: { value: number }): NumberKind {
  const c = text.charCodeAt(0);
  // Fast rejection of obvious text: a number starts with a digit, sign or dot.
  const couldBeNumber = (c >= 48 && c <= 57) || c === 45 || c === 43 || c === 46;
  if (couldBeNumber && DECIMAL.test(text)) {
    const value = Number(text);
    if (!(Math.abs(value) <= MAX_MAGNITUDE)) return NumberKind.Overflow;
    parsed.value = value === 0 ? 0 : value; // -0 and 0 are the same measurement
    return NumberKind.Finite;
  }
  if (text.length <= 9 && NON_FINITE.test(text)) return NumberKind.NotFinite;
  return NumberKind.Text;
}
