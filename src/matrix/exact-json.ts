/**
 * JSON that carries every float64 a search produces exactly: JSON writes NaN and ±Infinity as
 * null and −0 as 0, and a merged search must see the very numbers its shards computed (a
 * diverged training's NaN metric decides how its restart counts). Those four values travel as
 * the strings below; every other number already round-trips through JSON unchanged.
 */
const SPECIAL: Record<string, number> = {
  NaN: Number.NaN,
  Infinity: Number.POSITIVE_INFINITY,
  '-Infinity': Number.NEGATIVE_INFINITY,
  '-0': -0,
};

export function toExactJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) => {
    if (typeof v !== 'number') return v;
    if (Number.isNaN(v)) return 'NaN';
    if (v === Number.POSITIVE_INFINITY) return 'Infinity';
    if (v === Number.NEGATIVE_INFINITY) return '-Infinity';
    return Object.is(v, -0) ? '-0' : v;
  });
}

/** Parses text written by toExactJson (the caller has checked the syntax). */
export function fromExactJson(text: string): unknown {
  return JSON.parse(text, (_key, v: unknown) => (typeof v === 'string' && Object.hasOwn(SPECIAL, v) ? SPECIAL[v] : v));
}
