/**
 * A pass-through stream that refuses bytes that are not UTF-8 text (invalid sequences,
 * NUL bytes) before the CSV parser sees them, and says where they are: the line as an
 * editor counts it and the field number, tracked with a small quote-aware scan. It also
 * recognises a file whose lines end with CR alone (old Mac style), which the CSV parser
 * would read as one endless header line.
 */
import { Transform, type TransformCallback } from 'node:stream';

export interface BadBytes {
  line: number;
  /** 1-based field number on that line. */
  column: number;
  /** The offending bytes, as hex (`0xff`, `0x00`; `0xe2 0x82` for a character cut short). */
  bytes: string;
  /** The byte after them that showed they are not a character (as hex), when there is one. */
  next: string | null;
  why: 'nul' | 'invalid' | 'truncated' | 'cr-only';
  /** Header names of the first record (quote-aware, but simply split), for naming the column. */
  header: string[];
}

export class NotTextError extends Error {
  constructor(readonly where: BadBytes) {
    super('bytes that are not UTF-8 text');
    this.name = 'NotTextError';
  }
}

const QUOTE = 0x22;
const NEWLINE = 0x0a;
const CR = 0x0d;
const HEADER_BYTES_KEPT = 65536;

export class TextCheck extends Transform {
  private line = 1;
  private field = 0;
  private inQuotes = false;
  /** Continuation bytes still expected, and the allowed range of the next one. */
  private need = 0;
  private low = 0x80;
  private high = 0xbf;
  /** The bytes of the character being read (its lead byte and the continuation bytes so far). */
  private readonly sequence = new Uint8Array(4);
  private sequenceLength = 0;
  /** A CR outside quotes on line 1, not yet known to start a CRLF. */
  private pendingCR = false;
  private headerBytes: number[] = [];
  private header: string[] | null = null;

  constructor(private readonly delimiter: string) {
    super();
  }

  override _transform(chunk: Buffer, _encoding: BufferEncoding, done: TransformCallback): void {
    let bad: BadBytes | null;
    try {
      bad = this.scan(chunk);
    } catch (error) {
      done(error as Error); // a bug here must fail the load, not stall the stream
      return;
    }
    if (bad !== null) {
      done(new NotTextError(bad));
      return;
    }
    done(null, chunk);
  }

  override _flush(done: TransformCallback): void {
    if (this.need > 0) {
      done(new NotTextError(this.where('truncated', this.sequenceHex())));
      return;
    }
    if (this.pendingCR) {
      done(new NotTextError(this.where('cr-only', hex(CR))));
      return;
    }
    done();
  }

  private scan(chunk: Buffer): BadBytes | null {
    // Only a one-byte delimiter is followed for field numbers; otherwise fields count as 1.
    const delim = this.delimiter.length === 1 ? this.delimiter.charCodeAt(0) : -1;
    for (let i = 0; i < chunk.length; i++) {
      const b = chunk[i];
      // CR CR LF (a doubled conversion) still ends the line in LF; CR then anything else does not.
      if (this.pendingCR && b !== CR) {
        if (b !== NEWLINE) return this.where('cr-only', hex(CR));
        this.pendingCR = false;
      }
      if (this.need > 0) {
        // The character started by the lead byte is what is broken, not the byte after it
        // (in a Latin-1 file, `é,` is e9 2c: the e9 is wrong, the comma is fine).
        if (b < this.low || b > this.high) return this.where('invalid', this.sequenceHex(), hex(b));
        if (this.header === null) this.keepHeaderByte(b);
        this.sequence[this.sequenceLength++] = b;
        this.need--;
        this.low = 0x80;
        this.high = 0xbf;
        continue;
      }
      if (b < 0x80) {
        if (b === 0) return this.where('nul', '0x00');
        if (this.header === null) this.keepHeaderByte(b);
        if (b === CR && this.header === null && !this.inQuotes) this.pendingCR = true;
        if (b === NEWLINE) {
          this.line++;
          if (!this.inQuotes) this.field = 0;
        } else if (b === QUOTE) {
          this.inQuotes = !this.inQuotes;
        } else if (b === delim && !this.inQuotes) {
          this.field++;
        }
        continue;
      }
      if (this.header === null) this.keepHeaderByte(b);
      this.sequence[0] = b;
      this.sequenceLength = 1;
      // Lead bytes and the ranges their first continuation byte may take (no overlongs,
      // no surrogates, nothing above U+10FFFF): the well-formed table of the Unicode standard.
      if (b >= 0xc2 && b <= 0xdf) this.expect(1, 0x80, 0xbf);
      else if (b === 0xe0) this.expect(2, 0xa0, 0xbf);
      else if ((b >= 0xe1 && b <= 0xec) || b === 0xee || b === 0xef) this.expect(2, 0x80, 0xbf);
      else if (b === 0xed) this.expect(2, 0x80, 0x9f);
      else if (b === 0xf0) this.expect(3, 0x90, 0xbf);
      else if (b >= 0xf1 && b <= 0xf3) this.expect(3, 0x80, 0xbf);
      else if (b === 0xf4) this.expect(3, 0x80, 0x8f);
      else return this.where('invalid', hex(b));
    }
    return null;
  }

  private expect(need: number, low: number, high: number): void {
    this.need = need;
    this.low = low;
    this.high = high;
  }

  private sequenceHex(): string {
    return Array.from(this.sequence.subarray(0, this.sequenceLength), hex).join(' ');
  }

  /** Keeps the first record's bytes; called before `inQuotes` follows this byte. */
  private keepHeaderByte(b: number): void {
    if (b === NEWLINE && !this.inQuotes) {
      this.header = splitHeader(Buffer.from(this.headerBytes).toString('utf8'), this.delimiter);
      this.headerBytes = [];
    } else if (this.headerBytes.length < HEADER_BYTES_KEPT) {
      this.headerBytes.push(b);
    }
  }

  private where(why: BadBytes['why'], bytes: string, next: string | null = null): BadBytes {
    return { line: this.line, column: this.field + 1, bytes, next, why, header: this.header ?? [] };
  }
}

function hex(b: number): string {
  return `0x${b.toString(16).padStart(2, '0')}`;
}

/** Good enough to name a column in a message (quoted names may hold delimiters and line breaks); the CSV parser does the real work. */
function splitHeader(text: string, delimiter: string): string[] {
  const names: string[] = [];
  let name = '';
  let quoted = false;
  const line = text.replace(/^\uFEFF/, '').replace(/\r$/, '');
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '"') {
      if (quoted && line[i + 1] === '"') {
        name += '"';
        i++;
      } else quoted = !quoted;
    } else if (!quoted && line.startsWith(delimiter, i)) {
      names.push(name.trim());
      name = '';
      i += delimiter.length - 1;
    } else name += ch;
  }
  names.push(name.trim());
  return names;
}
