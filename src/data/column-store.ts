/**
 * One column of the file, kept compactly while reading: numbers in a growable
 * Float64Array, and (while the column has few distinct values) each cell's text as an
 * index into a small table of distinct strings. Which of the two the column really is
 * gets decided once the whole file has been read.
 */
import { classifyNumber, NumberKind } from './numbers.js';
import { characterCount, MAX_NAME_LENGTH } from './where.js';

export interface FirstSeen {
  value: string;
  line: number;
}

const INITIAL_CAPACITY = 1024;

/** The column reads as numbers: at least half of its cells are (see columns.ts). */
export function looksNumeric(store: ColumnStore): boolean {
  return store.numberCount > 0 && store.numberCount >= store.textCount;
}

export class ColumnStore {
  length = 0;
  /** Cell values where they are finite numbers, NaN elsewhere. */
  numbers: Float64Array = new Float64Array(INITIAL_CAPACITY);
  /** Index into `distinct` per cell; null once the column has too many distinct values. */
  codes: Int32Array | null = new Int32Array(INITIAL_CAPACITY);
  /** Distinct cell texts in order of first appearance; null after overflow. */
  distinct: Map<string, number> | null = new Map();
  /** Where the distinct texts first outgrew `distinctLimit` (the value and its line). */
  overflow: FirstSeen | null = null;
  /** After overflow, all distinct texts while the column still looks like text (for the count). */
  private overflowTexts: Set<string> | null = null;

  numberCount = 0;
  textCount = 0;
  firstText: FirstSeen | null = null;
  /** First NaN/Infinity/overflowing number, and which it was. */
  firstNotFinite: (FirstSeen & { overflow: boolean }) | null = null;
  /** First distinct text longer than MAX_NAME_LENGTH (refused if the column is categorical). */
  firstTooLong: FirstSeen | null = null;
  /** Empty cells met, including those of dropped rows. */
  missing = 0;

  private readonly parsed = { value: 0 };

  constructor(
    readonly name: string,
    /** 1-based field number in the file. */
    readonly column: number,
    /** Most distinct texts worth remembering (the categorical cap, or the class cap). */
    private readonly distinctLimit: number,
  ) {}

  push(text: string, line: number): void {
    const i = this.length;
    if (i === this.numbers.length) this.grow();
    const kind = classifyNumber(text, this.parsed);
    if (kind === NumberKind.Finite) {
      this.numbers[i] = this.parsed.value;
      this.numberCount++;
    } else {
      this.numbers[i] = NaN;
      if (kind === NumberKind.Text) {
        this.textCount++;
        if (this.firstText === null) this.firstText = { value: text, line };
      } else {
        this.numberCount++;
        if (this.firstNotFinite === null) {
          this.firstNotFinite = { value: text, line, overflow: kind === NumberKind.Overflow };
        }
      }
    }
    if (this.distinct !== null && this.codes !== null) {
      let code = this.distinct.get(text);
      if (code === undefined) {
        if (text.length > MAX_NAME_LENGTH && this.firstTooLong === null && characterCount(text) > MAX_NAME_LENGTH) {
          this.firstTooLong = { value: text, line };
        }
        code = this.distinct.size;
        if (code >= this.distinctLimit) {
          this.startOverflow(text, line);
        } else {
          this.distinct.set(text, code);
        }
      }
      if (this.codes !== null) this.codes[i] = code;
    } else if (this.overflowTexts !== null) {
      if (this.textCount >= this.numberCount) this.overflowTexts.add(text);
      else this.overflowTexts = null; // a numeric-looking column: the count no longer matters
    }
    this.length = i + 1;
  }

  /** Distinct values counted so far past the cap (a lower bound when counting stopped). */
  distinctCount(): number {
    if (this.distinct !== null) return this.distinct.size;
    return this.overflowTexts?.size ?? this.distinctLimit + 1;
  }

  /** Whether `distinctCount()` is exact. */
  distinctCountExact(): boolean {
    return this.distinct !== null || this.overflowTexts !== null;
  }

  private startOverflow(text: string, line: number): void {
    this.overflow = { value: text, line };
    if (this.textCount >= this.numberCount && this.distinct !== null) {
      this.overflowTexts = new Set(this.distinct.keys());
      this.overflowTexts.add(text);
    }
    this.distinct = null;
    this.codes = null;
  }

  private grow(): void {
    const capacity = this.numbers.length * 2;
    const numbers = new Float64Array(capacity);
    numbers.set(this.numbers);
    this.numbers = numbers;
    if (this.codes !== null) {
      const codes = new Int32Array(capacity);
      codes.set(this.codes);
      this.codes = codes;
    }
  }
}
