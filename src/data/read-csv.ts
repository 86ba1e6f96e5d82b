/**
 * Streams a CSV file through csv-parse into column stores, one record at a time, so the
 * file's text is never held whole. Every failure becomes a UserError naming the line
 * (as an editor counts it, header = line 1) and the column.
 */
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { parse } from 'csv-parse';
import { ColumnStore, looksNumeric } from './column-store.js';
import { estimateLoad, memoryRoom, whyNotFit } from './memory.js';
import { NotTextError, TextCheck, type BadBytes } from './text-check.js';
import { columnLabel, dataError, shownValue, type DataFile } from './where.js';
import { quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';

export interface ColumnRequest {
  /** 0-based field index in the file. */
  field: number;
  /** Most distinct texts to remember for this column. */
  distinctLimit: number;
}

export interface ReadPlan {
  /** Columns to keep, in the order wanted; the rest of each row is read and dropped. */
  columns: ColumnRequest[];
  /** Index into `columns` of the target column. */
  target: number;
}

export interface ReadOptions {
  delimiter: string;
  missing: 'error' | 'drop';
  /** Chooses the columns once the header is known; throws UserError for bad choices. */
  plan: (header: string[]) => ReadPlan;
}

export interface RawTable {
  header: string[];
  columns: ColumnStore[];
  target: ColumnStore;
  /** Rows kept. */
  rows: number;
  /** Rows dropped for a missing feature value. */
  droppedRows: number;
  /** Line on which the last record ended. */
  lastLine: number;
}

export async function readCsvColumns(file: DataFile, options: ReadOptions): Promise<RawTable> {
  const fileBytes = (await stat(file.path)).size;
  let header: string[] | null = null;
  let stores: ColumnStore[] = [];
  let fields: Int32Array = new Int32Array(0);
  let targetIndex = -1;
  let rows = 0;
  let dropped = 0;
  // The line each record starts on, counted by us (csv-parse's own count is off by one
  // for every CRLF inside a quoted value): a record spans one line plus the line breaks
  // inside its values.
  let nextLine = 1;

  const onRecord = (record: string[]): void => {
    const line = nextLine;
    nextLine = line + 1 + lineBreaks(record);
    if (record.length === 1 && record[0] === '') return; // a blank line
    if (header === null) {
      header = checkHeader(file, record, line);
      const plan = options.plan(header);
      const known = header;
      stores = plan.columns.map((c) => new ColumnStore(known[c.field], c.field + 1, c.distinctLimit));
      fields = Int32Array.from(plan.columns, (c) => c.field);
      targetIndex = plan.target;
      return;
    }
    const names: string[] = header;
    if (record.length !== names.length) throw fieldCountError(file, line, record, names);
    let missingHere = false;
    for (let k = 0; k < stores.length; k++) {
      if (record[fields[k]] === '') {
        const store = stores[k];
        if (k === targetIndex) {
          throw dataError(
            file,
            line,
            store.column,
            `${columnLabel(store.column, store.name)} (the target) is empty; every row needs a target value`,
          );
        }
        if (options.missing === 'error') {
          throw dataError(
            file,
            line,
            store.column,
            `${columnLabel(store.column, store.name)} is empty; expected a value ` +
              '(set data.missing: drop to leave such rows out)',
          );
        }
        store.missing++;
        missingHere = true;
      }
    }
    if (missingHere) {
      dropped++;
      return;
    }
    // The stores are full and about to double: first make sure the whole file will fit.
    if (rows === stores[0].numbers.length) checkMemory(file, stores, targetIndex, rows, parser.info, fileBytes);
    for (let k = 0; k < stores.length; k++) stores[k].push(record[fields[k]], line);
    rows++;
  };

  const parser = parse({
    delimiter: options.delimiter,
    bom: true,
    trim: true,
    skip_empty_lines: false, // blank lines come through as [''] and are skipped above, so lines stay counted
    // Files edited on several systems can mix line endings; accept both everywhere.
    record_delimiter: ['\r\n', '\n'],
    relax_column_count: true,
  });
  // Records go to a sink rather than through csv-parse's on_record hook, which builds an
  // info object per record; a throw in the sink fails the pipeline cleanly.
  const sink = new Writable({
    objectMode: true,
    highWaterMark: 1024,
    write(record: string[], _encoding, done) {
      try {
        onRecord(record);
      } catch (error) {
        done(error as Error);
        return;
      }
      done();
    },
  });
  try {
    await pipeline(
      createReadStream(file.path, { highWaterMark: 1 << 20 }),
      new TextCheck(options.delimiter),
      parser,
      sink,
    );
  } catch (error) {
    throw explain(file, error, nextLine, header);
  }

  if (header === null) {
    throw dataError(file, 1, 1, 'the file is empty; expected a header row naming the columns');
  }
  const names: string[] = header;
  if (rows === 0) {
    if (dropped > 0) {
      throw dataError(
        file,
        nextLine - 1,
        undefined,
        `all ${dropped} data rows have an empty feature value and were dropped; no rows are left`,
      );
    }
    throw dataError(
      file,
      nextLine,
      1,
      `the file has a header (${names.length} columns) but no data rows; expected at least one row after line ${nextLine - 1}`,
    );
  }
  return {
    header: names,
    columns: stores,
    target: stores[targetIndex],
    rows,
    droppedRows: dropped,
    lastLine: nextLine - 1,
  };
}

/** Stops with a UserError when loading the whole file would not fit in this process's memory. */
function checkMemory(
  file: DataFile,
  stores: ColumnStore[],
  target: number,
  rows: number,
  parsed: { bytes: number; records: number },
  fileBytes: number,
): void {
  const estimate = estimateLoad({
    rows,
    capacity: stores[0].numbers.length,
    recordsParsed: parsed.records,
    bytesParsed: parsed.bytes,
    fileBytes,
    columns: stores.map((s, k) => ({
      codes: s.codes !== null,
      inputs: k === target ? 0 : s.distinct !== null && !looksNumeric(s) ? s.distinct.size : 1,
    })),
  });
  const why = whyNotFit(estimate, memoryRoom());
  if (why !== null) throw new UserError(`${file.shown}: ${why}`, { file: file.path });
}

function lineBreaks(record: string[]): number {
  let n = 0;
  for (let i = 0; i < record.length; i++) {
    const value = record[i];
    for (let at = value.indexOf('\n'); at !== -1; at = value.indexOf('\n', at + 1)) n++;
  }
  return n;
}

function checkHeader(file: DataFile, record: string[], line: number): string[] {
  const seen = new Map<string, number>();
  record.forEach((name, i) => {
    if (name === '') {
      throw dataError(file, line, i + 1, `column ${i + 1} has no name in the header row`);
    }
    const first = seen.get(name);
    if (first !== undefined) {
      throw dataError(
        file,
        line,
        i + 1,
        `column ${i + 1} is named ${quote(name, 60)} like column ${first + 1}; column names must be unique`,
      );
    }
    seen.set(name, i);
  });
  return record;
}

function fieldCountError(file: DataFile, line: number, record: string[], header: string[]): UserError {
  const expected = `expected ${header.length} fields as in the header`;
  if (record.length > header.length) {
    return dataError(
      file,
      line,
      header.length + 1,
      `${expected}, found ${record.length}: an extra field ${shownValue(record[header.length])} ` +
        `after the last column ${quote(header[header.length - 1], 60)} (an unquoted delimiter inside a value?)`,
    );
  }
  const next = record.length;
  return dataError(
    file,
    line,
    next + 1,
    `${expected}, found ${record.length}: the row ends before ${columnLabel(next + 1, header[next])}`,
  );
}

/** What the bad bytes are, for the message. */
function notText(w: BadBytes): string {
  if (w.why === 'nul') {
    return 'a NUL byte (0x00), so this is not a text file; a file saved as UTF-16 or a spreadsheet looks like this';
  }
  if (w.why === 'truncated') return `a UTF-8 character cut off by the end of the file (the bytes ${w.bytes})`;
  const one = !w.bytes.includes(' ');
  const bytes = one ? `the byte ${w.bytes}` : `the bytes ${w.bytes}`;
  if (w.next === null) return `${bytes}, which is not valid UTF-8 text`;
  // One high byte followed by plain ASCII is how é, ü or ° look in Latin-1 / Windows-1252.
  const legacy = one && Number(w.next) < 0x80 ? '; a file saved as Latin-1 or Windows-1252 looks like this' : '';
  return `${bytes}, which is not valid UTF-8 text (it starts a character that ${w.next} does not continue)${legacy}`;
}

interface CsvParseError extends Error {
  code?: string;
  column?: number | string | null;
}

/** Turns stream and parser failures into messages about the file. */
function explain(
  file: DataFile,
  error: unknown,
  /** Line on which the record being parsed starts. */
  recordLine: number,
  header: string[] | null,
): unknown {
  if (error instanceof UserError) return error;
  if (error instanceof NotTextError) {
    const w = error.where;
    if (w.why === 'cr-only') {
      return dataError(
        file,
        w.line,
        undefined,
        'this file ends its lines with CR only (old Mac style); save it with LF or CRLF line endings',
      );
    }
    // The parser's header when it has read it; the byte check runs ahead of the parser.
    const where = columnLabel(w.column, (header ?? w.header)[w.column - 1]);
    return dataError(
      file,
      w.line,
      w.column,
      `${where}: expected UTF-8 text, found ${notText(w)}; save the file as CSV (UTF-8)`,
    );
  }
  const e = error as CsvParseError;
  const field = typeof e.column === 'number' ? e.column + 1 : 1;
  const name = header?.[field - 1];
  switch (e.code) {
    case 'CSV_QUOTE_NOT_CLOSED':
      return dataError(
        file,
        recordLine,
        field,
        `${columnLabel(field, name)}: a quoted value opens in the row starting on this line and is never ` +
          'closed; the file ends still inside the quotes',
      );
    case 'CSV_INVALID_CLOSING_QUOTE':
      return dataError(
        file,
        recordLine,
        field,
        `${columnLabel(field, name)}: in the row starting on this line, a closing quote is followed by more ` +
          'text; expected a delimiter or the end of the line (write a quote inside a quoted value as "")',
      );
    case 'INVALID_OPENING_QUOTE':
      return dataError(
        file,
        recordLine,
        field,
        `${columnLabel(field, name)}: in the row starting on this line, a quote appears in the middle of an ` +
          'unquoted value; quote the whole value and write the inner quote as ""',
      );
    case 'ENOENT':
      return new UserError(`${file.shown}: the data file does not exist`, { file: file.path, key: 'data.path' });
    case 'EISDIR':
      return new UserError(`${file.shown}: is a folder; data.path must name a CSV file`, {
        file: file.path,
        key: 'data.path',
      });
    case 'EACCES':
    case 'EPERM':
      return new UserError(`${file.shown}: the data file cannot be read (permission denied)`, {
        file: file.path,
        key: 'data.path',
      });
  }
  if (typeof e.code === 'string' && e.code.startsWith('CSV_')) {
    return dataError(file, recordLine, field, `the row starting on this line cannot be read as CSV: ${e.message}`);
  }
  return error;
}
