/** C source text: identifiers, comment escaping and float32 literals (IEEE 754 single-precision bit layouts). */
import { describe, expect, it } from 'vitest';
import { checkCName, commentText, floatLiteral } from '../../src/device/index.js';

describe('comment text from untrusted names', () => {
  it('cannot end the comment, open another, break the line, splice lines or form a trigraph', () => {
    expect(commentText('a */ int x; /* b')).toBe('a * / int x; / * b');
    expect(commentText('*/*/')).not.toMatch(/\*\/|\/\*/);
    expect(commentText('one\ntwo\r\tthree')).toBe('one<U+000A>two<U+000D><U+0009>three');
    expect(commentText('trailing \\')).toBe('trailing <U+005C>');
    expect(commentText('what??/')).toBe('what?<U+003F>/');
    expect(commentText('\u2028 caf\u00e9 \u{1F600}')).toBe('<U+2028> caf<U+00E9> <U+1F600>');
  });

  it('keeps ordinary names as they are and clips long ones', () => {
    expect(commentText('rms_velocity (mm/s)')).toBe('rms_velocity (mm/s)');
    expect(commentText('x'.repeat(100))).toBe(`${'x'.repeat(64)}...`);
    expect(commentText('abcdef', 3)).toBe('abc...');
  });
});

describe('C identifiers for NAME', () => {
  it('accepts a letter then letters, digits and underscores, up to 31 characters', () => {
    for (const ok of ['pump', 'Pump_v2', 'nb_model', `a${'b'.repeat(30)}`]) expect(checkCName(ok)).toBe(ok);
  });
  it('refuses anything else, showing the value JSON-escaped (no control characters)', () => {
    expect(() => checkCName('pump-model')).toThrow('--name: expected a C identifier');
    expect(() => checkCName(`a${'b'.repeat(31)}`)).toThrow(/C identifier/);
    expect(() => checkCName('_reserved')).toThrow(/C identifier/);
    expect(() => checkCName('a\nb')).toThrow('found "a\\nb"');
  });
});

describe('float32 literals', () => {
  it('are hexadecimal floats written from the bit layout', () => {
    // 0.1f = 0x3dcccccd: mantissa 1.99999a (hex), exponent −4
    expect(floatLiteral(Math.fround(0.1))).toBe('0x1.99999ap-4f');
    expect(floatLiteral(1)).toBe('0x1p+0f');
    expect(floatLiteral(-2.5)).toBe('-0x1.4p+1f');
    expect(floatLiteral(0)).toBe('0x0p+0f');
    expect(floatLiteral(-0)).toBe('-0x0p+0f');
    // the largest float32, (2 − 2^−23) · 2^127 = 0x7f7fffff
    expect(floatLiteral(3.4028234663852886e38)).toBe('0x1.fffffep+127f');
    // subnormals: 2^−149 = 0x00000001, and the largest subnormal 0x007fffff
    expect(floatLiteral(2 ** -149)).toBe('0x0.000002p-126f');
    expect(floatLiteral(2 ** -126 - 2 ** -149)).toBe('0x0.fffffep-126f');
  });
  it('refuse values that are not finite float32 numbers', () => {
    expect(() => floatLiteral(0.1)).toThrow(/float32/);
    expect(() => floatLiteral(Number.NaN)).toThrow(/float32/);
    expect(() => floatLiteral(Infinity)).toThrow(/float32/);
  });
});
