// End-to-end: every data mistake a user can make, run through the BUILT command line
// (dist/cli/index.js). Each case asserts exit code 2, a one-line message that starts
// with the file, line and column (or the config key's place), no stack trace, a clean
// stdout, and no report file written.
import { afterAll, describe, expect, test } from 'vitest';
import { expectOneUserError, removeCliTempDirs, runCli } from '../helpers/cli.js';

afterAll(removeCliTempDirs);

const CONFIG = ['data:', '  path: readings.csv', '  target: condition', 'target:', '  threshold: 0.9', ''].join('\n');

/** Adds lines under `data:` (after `target:`), keeping line 2 = path and line 3 = target. */
const withData = (...lines: string[]): string =>
  CONFIG.replace('  target: condition\n', `  target: condition\n${lines.join('\n')}\n`);

const REGRESSION = (...lines: string[]): string =>
  withData('  task: regression', ...lines).replace('  threshold: 0.9', '  metric: rmse\n  threshold: 0.5');

// A tiny invented table in the demo's vocabulary; each case breaks one thing in it.
const HEADER = 'reading_id,pump_model,rms_velocity,kurtosis,condition';
const ROWS = [
  '1,P-100,1.0,3.0,normal',
  '2,P-200,1.2,3.1,normal',
  '3,P-100,3.0,6.0,bearing_wear',
  '4,P-200,3.2,6.3,bearing_wear',
  '5,P-100,1.1,2.9,normal',
  '6,P-200,3.1,6.1,bearing_wear',
  '7,P-100,1.0,3.2,normal',
  '8,P-200,2.9,5.8,bearing_wear',
];
const table = (rows: string[] = ROWS, header = HEADER, eol = '\n'): string => [header, ...rows].join(eol) + eol;
/** The table with row `n` (1-based data row, so file line n + 1) replaced. */
const withRow = (n: number, row: string): string => table(ROWS.map((r, i) => (i === n - 1 ? row : r)));

interface Case {
  name: string;
  csv: string | Uint8Array | null;
  config?: string;
  /** What the message must start with after "error: ". */
  at: string;
  /** Further fragments it must contain. */
  says: string[];
  /** Extra files (e.g. a folder in place of the CSV). */
  files?: Record<string, string>;
}

const cases: Case[] = [
  { name: 'empty file', csv: '', at: 'readings.csv:1:1:', says: ['empty', 'header'] },
  { name: 'blank lines only', csv: '\n\n  \n', at: 'readings.csv:1:1:', says: ['empty'] },
  { name: 'header only', csv: `${HEADER}\n`, at: 'readings.csv:2:1:', says: ['no data rows'] },
  {
    name: 'row with too many fields',
    csv: withRow(3, '3,P-100,3.0,6.0,bearing_wear,extra'),
    at: 'readings.csv:4:6:',
    says: ['expected 5 fields', 'found 6', '"extra"'],
  },
  {
    name: 'row with too few fields',
    csv: withRow(5, '5,P-100,1.1,2.9'),
    at: 'readings.csv:6:5:',
    says: ['expected 5 fields', 'found 4', 'column 5 "condition"'],
  },
  {
    name: 'unclosed quote',
    csv: withRow(4, '4,"P-200,3.2,6.3,bearing_wear'),
    at: 'readings.csv:5:2:',
    says: ['column 2 "pump_model"', 'never closed'],
  },
  {
    name: 'text after a closing quote',
    csv: withRow(2, '2,"P-200"x,1.2,3.1,normal'),
    at: 'readings.csv:3:2:',
    says: ['column 2 "pump_model"', 'closing quote'],
  },
  {
    name: 'quote inside an unquoted value',
    csv: withRow(2, '2,P-2"00,1.2,3.1,normal'),
    at: 'readings.csv:3:2:',
    says: ['column 2 "pump_model"', 'quote'],
  },
  {
    name: 'text in a numeric column',
    csv: withRow(6, '6,P-200,n/a,6.1,bearing_wear'),
    at: 'readings.csv:7:3:',
    says: ['column 3 "rms_velocity"', 'found "n/a"', 'expected a number'],
  },
  {
    name: 'decimal comma in a numeric column',
    csv: withRow(2, '2,P-200,"1,2",3.1,normal'),
    at: 'readings.csv:3:3:',
    says: ['column 3 "rms_velocity"', '"1,2"'],
  },
  {
    name: 'NaN in a numeric column',
    csv: withRow(7, '7,P-100,1.0,NaN,normal'),
    at: 'readings.csv:8:4:',
    says: ['column 4 "kurtosis"', 'found "NaN"', 'finite number'],
  },
  {
    name: 'Infinity in a numeric column',
    csv: withRow(1, '1,P-100,-Infinity,3.0,normal'),
    at: 'readings.csv:2:3:',
    says: ['found "-Infinity"', 'finite number'],
  },
  {
    name: 'number that overflows',
    csv: withRow(8, '8,P-200,2.9,1e400,bearing_wear'),
    at: 'readings.csv:9:4:',
    says: ['found "1e400"', 'too large'],
  },
  {
    name: 'missing target value',
    csv: withRow(4, '4,P-200,3.2,6.3,'),
    at: 'readings.csv:5:5:',
    says: ['column 5 "condition"', 'target', 'empty'],
  },
  {
    name: 'missing feature value',
    csv: withRow(2, '2,P-200,,3.1,normal'),
    at: 'readings.csv:3:3:',
    says: ['column 3 "rms_velocity"', 'empty', 'data.missing: drop'],
  },
  {
    name: 'every row dropped for missing values',
    csv: table(ROWS.map((r) => r.replace(/,P-\d00,/, ',,'))),
    config: withData('  missing: drop'),
    at: 'readings.csv:9:',
    says: ['all 8 data rows', 'dropped'],
  },
  {
    name: 'target with a single class',
    csv: table(ROWS.map((r) => r.replace('bearing_wear', 'normal'))),
    at: 'readings.csv:1:5:',
    says: ['column 5 "condition"', 'single class "normal"', 'at least two'],
  },
  {
    name: 'duplicate column names',
    csv: table(ROWS, 'reading_id,pump_model,rms_velocity,rms_velocity,condition'),
    at: 'readings.csv:1:4:',
    says: ['"rms_velocity"', 'column 3', 'unique'],
  },
  {
    name: 'column without a name',
    csv: table(ROWS, 'reading_id,pump_model,,kurtosis,condition'),
    at: 'readings.csv:1:3:',
    says: ['column 3 has no name'],
  },
  {
    name: 'target column that does not exist',
    csv: table(),
    config: CONFIG.replace('target: condition', 'target: conditon'),
    at: 'neuron-budget.yml:3:3:',
    says: ['data.target', 'found "conditon"', 'did you mean "condition"'],
  },
  {
    name: 'feature column that does not exist',
    csv: table(),
    config: withData('  features: [rms_velocity, kurtosys]'),
    at: 'neuron-budget.yml:4:3:',
    says: ['data.features', 'found "kurtosys"', 'did you mean "kurtosis"'],
  },
  {
    name: 'ignored column that does not exist',
    csv: table(),
    config: withData('  ignore: [readingid]'),
    at: 'neuron-budget.yml:4:3:',
    says: ['data.ignore', 'found "readingid"', 'did you mean "reading_id"'],
  },
  {
    name: 'NUL byte',
    csv: withRow(3, '3,P-100\u0000,3.0,6.0,bearing_wear'),
    at: 'readings.csv:4:2:',
    says: ['column 2 "pump_model"', 'NUL byte', 'UTF-8'],
  },
  {
    name: 'bytes that are not UTF-8',
    csv: Buffer.concat([
      Buffer.from(table().slice(0, -1)),
      Buffer.from('\n9,P-'),
      Buffer.from([0xc3, 0x28]),
      Buffer.from(',1,3,normal\n'),
    ]),
    at: 'readings.csv:10:2:',
    // c3 starts a two-byte character that 28 ("(") does not continue: c3 is the bad byte.
    says: ['column 2 "pump_model"', 'the byte 0xc3', 'not valid UTF-8', '0x28 does not continue'],
  },
  {
    name: 'a Latin-1 file: the offending byte is named, not the comma after it',
    csv: Buffer.concat([
      Buffer.from(table().slice(0, -1)),
      Buffer.from('\n9,P-100 caf'),
      Buffer.from([0xe9]),
      Buffer.from(',1,3,normal\n'),
    ]),
    at: 'readings.csv:10:2:',
    says: ['column 2 "pump_model"', 'found the byte 0xe9, which is not valid UTF-8', 'Latin-1'],
  },
  {
    name: 'CR-only line endings (old Mac style)',
    csv: table(ROWS, HEADER, '\r'),
    at: 'readings.csv:1:',
    says: ['this file ends its lines with CR only (old Mac style); save it with LF or CRLF line endings'],
  },
  {
    name: 'file saved as UTF-16',
    csv: Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(table(), 'utf16le')]),
    at: 'readings.csv:1:1:',
    says: ['UTF-8'],
  },
  {
    name: 'data file that does not exist',
    csv: null,
    at: 'neuron-budget.yml:2:3:',
    says: ['data.path', 'readings.csv'],
  },
  {
    name: 'data path that is a folder',
    csv: null,
    files: { 'readings.csv/keep.txt': 'not a csv' },
    at: 'neuron-budget.yml:2:3:',
    says: ['data.path', 'folder'],
  },
  {
    name: 'categorical column over the cap',
    csv: table(ROWS.map((r, i) => r.replace(/P-\d00/, `P-${i}`))),
    config: withData('  ignore: [reading_id]', '  max-categories: 5'),
    at: 'readings.csv:7:2:',
    says: ['column 2 "pump_model"', '8 distinct values', 'at most 5', 'data.max-categories'],
  },
  {
    name: 'constant regression target',
    csv: table(ROWS.map((r) => r.replace(/,[a-z_]+$/, ',4.5'))),
    config: REGRESSION(),
    at: 'readings.csv:1:5:',
    says: ['column 5 "condition"', 'must vary'],
  },
  {
    name: 'text target for regression',
    csv: table(),
    config: REGRESSION(),
    at: 'readings.csv:2:5:',
    says: ['must be numeric for regression', 'found "normal"'],
  },
  {
    name: 'class too small for the split',
    csv: table([...ROWS, '9,P-100,9.0,9.0,cavitation']),
    at: 'readings.csv:1:5:',
    says: ['class "cavitation" has 1 row', 'validation 0.25'],
  },
  {
    name: 'line numbers count quoted line breaks',
    csv: table(
      ['1,"P-100\r\nrev B",1.0,3.0,normal', ...ROWS.slice(1, 4), '', '5,P-100,1.1,oops,normal', ...ROWS.slice(5)],
      HEADER,
      '\r\n',
    ),
    at: 'readings.csv:8:4:',
    says: ['column 4 "kurtosis"', 'found "oops"'],
  },
];

describe('data mistakes through the built command line', () => {
  test.each(cases)('$name', async (c) => {
    const files: Record<string, string | Uint8Array> = { 'neuron-budget.yml': c.config ?? CONFIG, ...c.files };
    if (c.csv !== null) files['readings.csv'] = c.csv;
    const run = await runCli(['check', '--report', 'out.json'], { files });
    expectOneUserError(run, c.at, c.says);
    expect(run.created, 'nothing may be written').toEqual([]);
  });

  test('the cases cover at least fifteen distinct mistakes', () => {
    expect(new Set(cases.map((c) => c.name)).size).toBeGreaterThanOrEqual(15);
  });

  test('the unbroken table passes the data stage and writes the report (the cases above can fail)', async () => {
    const run = await runCli(['check', '--report', 'out.json'], {
      files: { 'neuron-budget.yml': CONFIG, 'readings.csv': table() },
    });
    expect(run.stderr).not.toContain('error:');
    expect(run.created).toContain('out.json');
    const report = JSON.parse(run.read('out.json')) as { data: { rows: number } };
    expect(report.data.rows).toBe(8);
  });
});
