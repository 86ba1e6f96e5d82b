// End-to-end: hostile strings (test/helpers/hostile.ts) in class labels, column names,
// categories, the data file's name and the config file's name, through the BUILT command line
// (dist/cli/index.js). Whatever it prints (stderr; stdout stays empty) holds them escaped: no
// raw control or invisible character on any line, and no line the Actions runner would read as
// a workflow command, since a CLI run in CI writes into the same log as the action.
import { afterAll, describe, expect, test } from 'vitest';
import { escapeText, quote } from '../../src/common/escape.js';
import { hasStackTrace, removeCliTempDirs, runCli, type CliRun } from '../helpers/cli.js';
import {
  cell,
  commandLines,
  CORPUS,
  HOSTILE,
  HOSTILE_FILE_NAMES,
  HOSTILE_MESSAGES,
  hostileConfig,
  hostileTable,
  rawControlLines,
  squash,
  yamlString,
} from '../helpers/hostile.js';

afterAll(removeCliTempDirs);

/**
 * Nothing printed holds a raw control character, a command line, or a corpus string unescaped.
 * stdout carries only what was asked for: nothing, or `baseline`'s one line (`stdout`).
 */
function expectInert(run: CliRun, stdout: RegExp = /^$/): void {
  expect(run.stdout, 'stdout carries only what was asked for').toMatch(stdout);
  expect(hasStackTrace(run.stderr), run.stderr.slice(0, 4000)).toBe(false);
  for (const [name, text] of [
    ['stderr', run.stderr],
    ['stdout', run.stdout],
  ] as const) {
    expect(rawControlLines(text, name)).toEqual([]);
    expect(commandLines(text)).toEqual([]);
    for (const s of CORPUS) {
      if (escapeText(s, Number.MAX_SAFE_INTEGER) !== s) expect(text.includes(s), JSON.stringify(s)).toBe(false);
    }
  }
}

const DATA_BEFORE = `data/${HOSTILE_FILE_NAMES[0]}.csv`;
const DATA_AFTER = `data/${HOSTILE_FILE_NAMES[4]}.csv`;
const CONFIG_AFTER = `${HOSTILE_FILE_NAMES[15]}.yml`;

describe('hostile strings through the built command line', () => {
  test('labels, column names, categories and file names are shown escaped in the summary, report and changes', async () => {
    const before = hostileTable(0);
    const after = hostileTable(1);
    const first = await runCli(['baseline'], {
      files: { 'neuron-budget.yml': hostileConfig(DATA_BEFORE, before), [DATA_BEFORE]: before.csv },
    });
    expect(first.code, first.stderr.slice(-3000)).toBe(0);
    expectInert(first, /^baseline written: neuron-budget\.baseline\.json, width \d+, 1 history entry\n$/);
    expect(first.created).toEqual(['neuron-budget.baseline.json']);
    const summary = squash(first.stderr);
    expect(summary).toContain(`${before.labels.length} classes`);
    expect(summary).toContain(squash(escapeText(DATA_BEFORE)));

    const second = await runCli(['check', '--config', CONFIG_AFTER, '--report', 'report.json'], {
      files: {
        [CONFIG_AFTER]: hostileConfig(DATA_AFTER, after, { listFeatures: true }),
        [DATA_AFTER]: after.csv,
        'neuron-budget.baseline.json': first.read('neuron-budget.baseline.json'),
      },
    });
    expect([0, 1], second.stderr.slice(-3000)).toContain(second.code);
    expectInert(second);
    const text = squash(second.stderr);
    expect(text).toContain(squash(escapeText(CONFIG_AFTER)));
    expect(text).toContain(squash(`Data file ${escapeText(DATA_BEFORE)} → ${escapeText(DATA_AFTER)}.`));
    for (const label of after.labels.filter((l) => !before.labels.includes(l)))
      expect(text).toContain(squash(`New class ${escapeText(label)}.`));
    for (const label of before.labels.filter((l) => !after.labels.includes(l)))
      expect(text).toContain(squash(`Class ${escapeText(label)} no longer appears.`));
    expect(text).toContain(squash(`Column added: ${escapeText(after.numeric[after.numeric.length - 1])}`));
    expect(text).toContain(squash(`Column removed: ${escapeText(before.numeric[0])}`));
    expect(text).toContain('The settings that shape the result differ');

    // The report keeps the data's own strings exactly: escaping is for screens, not for data.
    const report = JSON.parse(second.read('report.json'));
    expect(report.data.classes.map((c: { label: string }) => c.label)).toEqual([...after.labels].sort());
    expect(report.data.file).toBe(DATA_AFTER);
    expect(report.changes.classesAppeared).toEqual(after.labels.filter((l) => !before.labels.includes(l)).sort());
  });

  test.each(HOSTILE_MESSAGES.map((s) => [JSON.stringify(s.slice(0, 24)), s]))(
    'a message that quotes %s holds it escaped and clipped, on one line',
    async (_name, s) => {
      const table = hostileTable(0);
      const config = hostileConfig('readings.csv', table).replace(
        `  target: ${yamlString(table.target)}`,
        `  target: ${yamlString(s)}`,
      );
      const run = await runCli(['check'], { files: { 'neuron-budget.yml': config, 'readings.csv': table.csv } });
      expect(run.code, run.stderr.slice(0, 3000)).toBe(2);
      expectInert(run);
      const lines = run.stderr.trimEnd().split('\n');
      expect(lines).toHaveLength(1);
      expect(lines[0]).toMatch(/^error: neuron-budget\.yml:3:\d+: data\.target: expected a column of readings\.csv/);
      expect(lines[0]).toContain(escapeText(s, 20).slice(0, 10));
      // One message stays short whatever it quotes: the value and the header list are clipped.
      expect(lines[0].length).toBeLessThan(3000);
    },
  );

  test.each([
    [
      'a syntax error at a bidi override',
      '{\n  "schema": \u202e"x"\n}\n',
      'neuron-budget.baseline.json:2:13:',
      'found "\\u202e"',
    ],
    [
      'a syntax error at a C1 control',
      '{\n  "schema":\u0085 1\n}\n',
      'neuron-budget.baseline.json:2:12:',
      'control character U+0085',
    ],
    [
      'a hostile schema string',
      `{"schema": ${JSON.stringify(HOSTILE[0])}}`,
      'neuron-budget.baseline.json: schema:',
      'found "pos\\n:\\x3aerror',
    ],
    // Lines that end in CR alone are lines too, as an editor counts them.
    [
      'a syntax error on line 3 of a CR-only file',
      '{\r  "schema": "x",\r  oops\r}\r',
      'neuron-budget.baseline.json:3:3:',
      'a key in double quotes',
    ],
  ])('the baseline reader quotes %s escaped, at the right line', async (_name, text, at, says) => {
    const table = hostileTable(0);
    const run = await runCli(['check'], {
      files: {
        'neuron-budget.yml': hostileConfig('readings.csv', table),
        'readings.csv': table.csv,
        'neuron-budget.baseline.json': text,
      },
    });
    expect(run.code, run.stderr).toBe(2);
    expectInert(run);
    expect(run.stderr.startsWith(`error: ${at}`), run.stderr).toBe(true);
    expect(run.stderr).toContain(says);
  });

  test('a NUL byte under a hostile column name is refused with a message that names the column escaped', async () => {
    const table = hostileTable(0);
    // One more row, on one line, whose label (the target column, named HOSTILE[5]) holds a NUL byte.
    const row = [...table.numeric.map(() => '1'), table.categories[7], `${table.labels[7]}\u0000`].map(cell).join(',');
    const line = table.csv.split('\n').length; // the row's line as an editor counts it
    const run = await runCli(['check'], {
      files: { 'neuron-budget.yml': hostileConfig('readings.csv', table), 'readings.csv': `${table.csv}${row}\n` },
    });
    expect(run.code, run.stderr).toBe(2);
    expectInert(run);
    const column = table.header.length;
    expect(run.stderr).toContain(`readings.csv:${line}:${column}: column ${column} ${quote(HOSTILE[5], 60)}: `);
    expect(run.stderr).toContain('NUL byte');
  });
});
