// End-to-end: every config mistake a user can make, run through the BUILT command line.
// Each case asserts exit code 2, a one-line message that names the file with line and
// column (or the key), no stack trace, a clean stdout, and no report file written.
import { mkdirSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { expectOneUserError, makeTempDir, removeCliTempDirs, runCli } from '../helpers/cli.js';

afterAll(removeCliTempDirs);

// A tiny invented table (two well-separated classes) so that the config is the only problem.
const CSV = [
  'reading_id,rms_velocity,kurtosis,condition',
  '1,1.0,3.0,normal',
  '2,1.2,3.1,normal',
  '3,3.0,6.0,bearing_wear',
  '4,3.2,6.3,bearing_wear',
  '5,1.1,2.9,normal',
  '6,3.1,6.1,bearing_wear',
  '7,1.0,3.2,normal',
  '8,2.9,5.8,bearing_wear',
  '',
].join('\n');

const GOOD = ['data:', '  path: readings.csv', '  target: condition', 'target:', '  threshold: 0.9', ''].join('\n');

interface Case {
  name: string;
  config: string | null;
  /** The file, line and column the message must start with (after "error: "), or null. */
  at: string | null;
  /** Further fragments the message must contain (the key, the value found, a suggestion). */
  says: string[];
  args?: string[];
  setup?: (dir: string) => void;
}

const withSearch = (lines: string): string => `${GOOD}search:\n${lines}\n`;

const cases: Case[] = [
  { name: 'config file missing', config: null, at: 'neuron-budget.yml:', says: ['not found'] },
  { name: 'empty config file', config: '', at: 'neuron-budget.yml:1:1:', says: ['empty'] },
  { name: 'comments only', config: '# nothing here\n', at: 'neuron-budget.yml:1:1:', says: ['empty'] },
  {
    name: 'YAML syntax error',
    config: 'data:\n  path: readings.csv\n  target: [condition\ntarget:\n  threshold: 0.9\n',
    at: 'neuron-budget.yml:',
    says: ['YAML syntax error'],
  },
  { name: 'top level is a list', config: '- data\n- target\n', at: 'neuron-budget.yml:1:1:', says: ['found a list'] },
  {
    name: 'unknown section suggests the nearest',
    config: `${GOOD}serch:\n  restarts: 4\n`,
    at: 'neuron-budget.yml:6:1:',
    says: ['serch', 'did you mean "search"'],
  },
  {
    name: 'unknown key suggests the nearest',
    config: withSearch('  restart: 4'),
    at: 'neuron-budget.yml:7:3:',
    says: ['search.restart', 'did you mean "restarts"'],
  },
  {
    name: 'snake_case key suggests the kebab-case one',
    config: withSearch('  max_epochs: 100'),
    at: 'neuron-budget.yml:7:3:',
    says: ['search.max_epochs', 'did you mean "max-epochs"'],
  },
  {
    name: 'text where an integer belongs',
    config: withSearch('  restarts: ten'),
    at: 'neuron-budget.yml:7:13:',
    says: ['search.restarts', 'expected an integer from 1 to 1000', 'found "ten"'],
  },
  {
    name: 'fraction where an integer belongs',
    config: withSearch('  max-width: 2.5'),
    at: 'neuron-budget.yml:7:14:',
    says: ['search.max-width', 'found 2.5'],
  },
  {
    name: 'validation fraction of 1',
    config: GOOD.replace('  target: condition\n', '  target: condition\n  validation: 1\n'),
    at: 'neuron-budget.yml:4:15:',
    says: ['data.validation', 'below 1', 'found 1'],
  },
  {
    name: 'max-width below min-width',
    config: withSearch('  min-width: 6\n  max-width: 4'),
    at: 'neuron-budget.yml:8:14:',
    says: ['search.max-width', 'at least search.min-width (6)', 'found 4'],
  },
  {
    name: 'required above restarts',
    config: withSearch('  restarts: 3\n  required: 5'),
    at: 'neuron-budget.yml:8:13:',
    says: ['search.required', 'at most search.restarts (3)', 'found 5'],
  },
  {
    name: 'data.target missing',
    config: 'data:\n  path: readings.csv\ntarget:\n  threshold: 0.9\n',
    at: 'neuron-budget.yml:1:1:',
    says: ['data.target', 'missing'],
  },
  {
    name: 'target section missing',
    config: 'data:\n  path: readings.csv\n  target: condition\n',
    at: 'neuron-budget.yml:1:1:',
    says: ['target', 'target.threshold'],
  },
  {
    // data.task is auto, so the threshold is known to be an accuracy only once the data are read.
    name: 'accuracy threshold written as a percentage',
    config: GOOD.replace('threshold: 0.9', 'threshold: 95'),
    at: 'neuron-budget.yml:5:3:',
    says: ['target.threshold', 'found 95', 'read as classification (it holds text)', '(95% as 0.95)'],
  },
  {
    name: 'metric that does not suit the task',
    config: GOOD.replace('  target: condition\n', '  target: condition\n  task: classification\n').replace(
      'target:\n  threshold',
      'target:\n  metric: rmse\n  threshold',
    ),
    at: 'neuron-budget.yml:6:11:',
    says: ['target.metric', 'classification', 'found "rmse"'],
  },
  {
    name: 'enum typo suggests the nearest value',
    config: withSearch('  activation: tahn'),
    at: 'neuron-budget.yml:7:15:',
    says: ['search.activation', 'found "tahn"', 'did you mean "tanh"'],
  },
  {
    name: 'yes/no is not a boolean',
    config: withSearch('  prune: yes'),
    at: 'neuron-budget.yml:7:10:',
    says: ['search.prune', 'true or false', 'found "yes"'],
  },
  {
    name: 'data.path climbs out of the workspace',
    config: GOOD.replace('path: readings.csv', 'path: ../readings.csv'),
    at: 'neuron-budget.yml:2:9:',
    says: ['data.path', 'outside the workspace'],
  },
  {
    name: 'data.path absolute outside the workspace',
    config: GOOD.replace('path: readings.csv', 'path: /etc/hostname'),
    at: 'neuron-budget.yml:2:9:',
    says: ['data.path', 'absolute path outside the workspace'],
  },
  {
    name: 'data.path through a symbolic link that leads outside',
    config: GOOD.replace('path: readings.csv', 'path: linked/readings.csv'),
    at: 'neuron-budget.yml:2:9:',
    says: ['data.path', 'symbolic link'],
    setup: (dir) => {
      const outside = makeTempDir('neuron-budget-outside-');
      writeFileSync(join(outside, 'readings.csv'), CSV);
      symlinkSync(outside, join(dir, 'linked'));
    },
  },
  {
    name: 'gate.baseline climbs out of the workspace',
    config: `${GOOD}gate:\n  baseline: ../../baseline.json\n`,
    at: 'neuron-budget.yml:7:13:',
    says: ['gate.baseline', 'outside the workspace'],
  },
  {
    name: 'duplicate key',
    config: 'data:\n  path: readings.csv\n  target: condition\n  path: other.csv\ntarget:\n  threshold: 0.9\n',
    at: 'neuron-budget.yml:4:3:',
    says: ['"path" appears twice'],
  },
  {
    name: 'target also listed as a feature',
    config: GOOD.replace('  target: condition\n', '  target: condition\n  features: [kurtosis, condition]\n'),
    at: 'neuron-budget.yml:4:13:',
    says: ['data.features', '"condition"'],
  },
  {
    name: 'two YAML documents',
    config: `${GOOD}---\ndata: {}\n`,
    at: 'neuron-budget.yml:6:1:',
    says: ['second one'],
  },
  {
    name: 'delimiter of two characters',
    config: GOOD.replace('  target: condition\n', '  target: condition\n  delimiter: ";;"\n'),
    at: 'neuron-budget.yml:4:14:',
    says: ['data.delimiter', 'single character', 'found ";;"'],
  },
  {
    name: 'config given with --config is a folder',
    config: GOOD,
    args: ['check', '--config', 'conf', '--report', 'out.json'],
    at: 'conf:',
    says: ['folder'],
    setup: (dir) => mkdirSync(join(dir, 'conf')),
  },
  {
    name: 'a custom YAML tag',
    config: GOOD.replace('  target: condition', '  target: !custom condition'),
    at: 'neuron-budget.yml:3:11:',
    says: ['unsupported YAML tag "!custom"', 'remove the tag'],
  },
  {
    name: 'a YAML tag outside the core schema',
    config: GOOD.replace('  threshold: 0.9', '  threshold: !!binary MC45'),
    at: 'neuron-budget.yml:5:14:',
    says: ['unsupported YAML tag "!!binary"'],
  },
  {
    name: 'metric that does not suit the task found in the data',
    config: GOOD.replace('target:\n  threshold: 0.9', 'target:\n  metric: mae\n  threshold: 0.5'),
    at: 'neuron-budget.yml:5:3:',
    says: ['target.metric', 'classification', 'mae'],
  },
  {
    name: 'a recall floor for a class the data do not have suggests the nearest',
    config: GOOD.replace('  threshold: 0.9\n', '  threshold: 0.9\n  min-recall: { bearing_waer: 0.9 }\n'),
    at: 'neuron-budget.yml:6:3:',
    says: ['target.min-recall', '"bearing_waer"', 'did you mean "bearing_wear"', '"normal"'],
  },
  {
    name: 'a recall floor above 1',
    config: GOOD.replace('  threshold: 0.9\n', '  threshold: 0.9\n  min-recall: { normal: 1.5 }\n'),
    at: 'neuron-budget.yml:6:25:',
    says: ['target.min-recall.normal', 'at most 1', 'found 1.5'],
  },
  {
    name: 'a recall floor on a regression target',
    config: GOOD.replace(
      '  target: condition\n',
      '  target: kurtosis\n  ignore: [condition]\n  task: regression\n',
    ).replace('  threshold: 0.9\n', '  metric: rmse\n  threshold: 0.9\n  min-recall: 0.8\n'),
    at: 'neuron-budget.yml:9:3:',
    says: ['target.min-recall', 'regression'],
  },
  {
    name: 'an unsupported YAML tag',
    config: GOOD.replace('  threshold: 0.9', '  threshold: !custom 0.9'),
    at: 'neuron-budget.yml:5:14:',
    says: ['unsupported YAML tag', '"!custom"'],
  },
];

describe('config mistakes through the built command line', () => {
  test.each(cases)('$name', async (c) => {
    const files: Record<string, string> = { 'readings.csv': CSV };
    if (c.config !== null) files['neuron-budget.yml'] = c.config;
    const run = await runCli(c.args ?? ['check', '--report', 'out.json'], {
      files,
      ...(c.setup ? { setup: c.setup } : {}),
    });
    expectOneUserError(run, c.at, c.says);
    expect(run.created, 'nothing may be written').toEqual([]);
  });

  test('`threshold: !!float 1` and `min-width: !!int 2` are numbers, as written: the run gets past the config', async () => {
    const config = `${GOOD.replace('  threshold: 0.9', '  threshold: !!float 1')}search:\n  min-width: !!int 2\n`;
    const run = await runCli(['check', '--report', 'out.json'], {
      files: { 'readings.csv': CSV, 'neuron-budget.yml': config },
    });
    expect(run.stderr).not.toContain('error:');
    expect([0, 1], run.stderr).toContain(run.code);
    const report = JSON.parse(run.read('out.json'));
    expect(report.metric.threshold).toBe(1);
    // Growth starts at min-width; pruning may still reach below it.
    const grown = report.search.widths.filter((w: { restarts: number }) => w.restarts > 0);
    expect(grown[0].width).toBe(2);
  });

  test('the cases cover at least twelve distinct mistakes', () => {
    expect(new Set(cases.map((c) => c.name)).size).toBeGreaterThanOrEqual(12);
  });
});
