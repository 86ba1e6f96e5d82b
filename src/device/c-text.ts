/**
 * Pieces of C source text: checked identifiers, safe comment text and exact float32 literals.
 * Names from a repository (features, categories, classes, config paths) are untrusted: they
 * only ever reach the C inside comments, through `commentText`.
 */
import { UserError } from '../common/errors.js';

/** Letters, digits and underscores, a letter first (a leading underscore is reserved in C), at most 31 (C99's portable length). */
const C_NAME = /^[A-Za-z][A-Za-z0-9_]{0,30}$/;

/**
 * The NAME of NAME.h, NAME.c and NAME_predict; a clear error for anything that is not a plain C
 * identifier (the value shown JSON-escaped, so no control character reaches a log line).
 */
export function checkCName(name: string, key = '--name'): string {
  if (!C_NAME.test(name)) {
    const shown = JSON.stringify(name.length > 40 ? `${name.slice(0, 40)}…` : name).replace(
      /[\u007f-\u009f\u2028\u2029]/g,
      '?',
    );
    throw new UserError(
      `${key}: expected a C identifier (a letter, then up to 30 letters, digits or underscores), found ${shown}`,
      { key },
    );
  }
  return name;
}

/** Longest untrusted text kept in a comment, in characters, before the escapes. */
const COMMENT_CLIP = 64;

/**
 * Untrusted text made safe inside a C block comment: clipped to `max` characters (with "..."),
 * every character outside printable ASCII, and the backslash, written as <U+XXXX> (no line
 * break, control character or line splice survives), "??" broken so no trigraph forms, and
 * every "*\/" and "/*" broken with a space.
 */
export function commentText(text: string, max = COMMENT_CLIP): string {
  const chars = Array.from(text);
  const clipped = chars.length > max ? [...chars.slice(0, max), '.', '.', '.'] : chars;
  let out = '';
  for (const ch of clipped) {
    const code = ch.codePointAt(0) ?? 0;
    const printable = code >= 0x20 && code <= 0x7e && ch !== '\\';
    out += printable ? ch : `<U+${code.toString(16).toUpperCase().padStart(4, '0')}>`;
  }
  out = out.replace(/\?\?/g, '?<U+003F>');
  let before;
  do {
    before = out;
    out = out.replace(/\*\//g, '* /').replace(/\/\*/g, '/ *');
  } while (out !== before);
  return out;
}

const f32 = new Float32Array(1);
const u32 = new Uint32Array(f32.buffer);

/** A float32 value as a C99 hexadecimal float literal with an f suffix: exact by construction. */
export function floatLiteral(x: number): string {
  if (!Number.isFinite(x) || Math.fround(x) !== x) {
    throw new RangeError(`not a finite float32 value: ${x}`);
  }
  f32[0] = x;
  const bits = u32[0];
  const sign = bits >>> 31 ? '-' : '';
  const exp = (bits >>> 23) & 0xff;
  const mant = bits & 0x7fffff;
  if (exp === 0 && mant === 0) return `${sign}0x0p+0f`;
  // 23 fraction bits shifted to 24 fill six hex digits.
  const digits = (mant << 1).toString(16).padStart(6, '0').replace(/0+$/, '');
  const frac = digits === '' ? '' : `.${digits}`;
  const e = exp === 0 ? -126 : exp - 127;
  return `${sign}0x${exp === 0 ? 0 : 1}${frac}p${e < 0 ? '-' : '+'}${Math.abs(e)}f`;
}

/** An int8 or int32 constant as a C literal (INT32_MIN would need a cast; the scheme never stores it). */
export function intLiteral(v: number): string {
  if (!Number.isInteger(v) || v <= -2147483648 || v > 2147483647) throw new RangeError(`not an int32 literal: ${v}`);
  return String(v);
}
