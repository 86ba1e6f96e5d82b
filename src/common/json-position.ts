/**
 * Finds where a JSON text first goes wrong. JSON.parse's messages differ between Node
 * versions and some carry no position at all, so a small scanner (RFC 8259 grammar)
 * gives every user the same line and column.
 */

import { quote } from '../common/escape.js';

export interface JsonSyntaxProblem {
  line: number;
  column: number;
  /** What was expected and what was found, for the message. */
  detail: string;
}

/** Returns null when `text` is valid JSON. */
export function findJsonSyntaxProblem(text: string): JsonSyntaxProblem | null {
  let i = 0;
  const n = text.length;

  const fail = (expected: string): never => {
    throw new ScanError(i, expected);
  };
  const ws = (): void => {
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c === 0x20 || c === 0x09 || c === 0x0a || c === 0x0d) i++;
      else break;
    }
  };
  const literal = (word: string): void => {
    if (text.startsWith(word, i)) i += word.length;
    else fail(`"${word}"`);
  };
  const digits = (): void => {
    const start = i;
    while (i < n && text.charCodeAt(i) >= 0x30 && text.charCodeAt(i) <= 0x39) i++;
    if (i === start) fail('a digit');
  };
  const number = (): void => {
    if (text[i] === '-') i++;
    if (text[i] === '0') i++;
    else digits();
    if (text[i] === '.') {
      i++;
      digits();
    }
    if (text[i] === 'e' || text[i] === 'E') {
      i++;
      if (text[i] === '+' || text[i] === '-') i++;
      digits();
    }
  };
  const string = (): void => {
    i++; // opening quote
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c === 0x22) {
        i++;
        return;
      }
      if (c < 0x20) fail('a closing quote (a string cannot contain a line break or control character)');
      if (c === 0x5c) {
        i++;
        const e = text[i];
        if (e === 'u') {
          for (let k = 1; k <= 4; k++) {
            if (!/[0-9a-fA-F]/.test(text[i + k] ?? '')) {
              i += k;
              fail('four hex digits after \\u');
            }
          }
          i += 5;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) i++;
        else fail('a valid escape (\\" \\\\ \\/ \\b \\f \\n \\r \\t \\uXXXX)');
      } else i++;
    }
    fail('a closing quote');
  };
  const value = (): void => {
    ws();
    const c = text[i];
    if (c === '{') {
      i++;
      ws();
      if (text[i] === '}') {
        i++;
        return;
      }
      for (;;) {
        ws();
        if (text[i] !== '"') fail('a key in double quotes');
        string();
        ws();
        if (text[i] !== ':') fail('":"');
        i++;
        value();
        ws();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === '}') {
          i++;
          return;
        }
        fail('"," or "}"');
      }
    } else if (c === '[') {
      i++;
      ws();
      if (text[i] === ']') {
        i++;
        return;
      }
      for (;;) {
        value();
        ws();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === ']') {
          i++;
          return;
        }
        fail('"," or "]"');
      }
    } else if (c === '"') string();
    else if (c === '-' || (c !== undefined && c >= '0' && c <= '9')) number();
    else if (c === 't') literal('true');
    else if (c === 'f') literal('false');
    else if (c === 'n') literal('null');
    else fail('a value');
  };

  try {
    if (text.charCodeAt(0) === 0xfeff) i = 1;
    value();
    ws();
    if (i < n) fail('the end of the file');
    return null;
  } catch (e) {
    if (!(e instanceof ScanError)) throw e;
    const { line, column } = lineAndColumn(text, e.offset);
    const found = e.offset >= n ? 'the end of the file' : describeChar(text, e.offset);
    return { line, column, detail: `expected ${e.expected}, found ${found}` };
  }
}

class ScanError extends Error {
  constructor(
    readonly offset: number,
    readonly expected: string,
  ) {
    super(`expected ${expected} at offset ${offset}`);
  }
}

/**
 * 1-based line and column as a text editor counts them: LF, CRLF and a lone CR each end a
 * line, and the column counts characters (a character outside the BMP is one, not two).
 */
function lineAndColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let column = 1;
  for (let k = 0; k < offset && k < text.length; k++) {
    const c = text.charCodeAt(k);
    if (c === 0x0a || (c === 0x0d && text.charCodeAt(k + 1) !== 0x0a)) {
      line++;
      column = 1;
    } else if (c !== 0x0d && (c < 0xdc00 || c > 0xdfff)) {
      column++;
    }
  }
  return { line, column };
}

function describeChar(text: string, offset: number): string {
  const c = text.codePointAt(offset) ?? 0;
  if (c === 0x0a || c === 0x0d) return 'a line break';
  if (c < 0x20 || (c >= 0x7f && c < 0xa0))
    return `control character U+${c.toString(16).toUpperCase().padStart(4, '0')}`;
  return quote(String.fromCodePoint(c));
}
