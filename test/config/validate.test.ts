// The config validator: defaults, every rule, the locations it reports, suggestions, paths.
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { loadConfig, parseConfig } from '../../src/config/index.js';
import { UserError } from '../../src/common/errors.js';

const root = mkdtempSync(join(tmpdir(), 'neuron-budget-config-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));
const FILE = join(root, 'neuron-budget.yml');

const MINIMAL = 'data:\n  path: readings.csv\n  target: condition\ntarget:\n  threshold: 0.95\n';

function parse(text: string, file = FILE) {
  return parseConfig(text, { file, root });
}

/** The UserError `text` raises, with its position checked against the text itself. */
function failure(text: string): UserError {
  try {
    parse(text);
  } catch (error) {
    expect(error).toBeInstanceOf(UserError);
    const e = error as UserError;
    expect(e.message.startsWith(`neuron-budget.yml:${e.line}:${e.column}: `), e.message).toBe(true);
    expect(e.file).toBe('neuron-budget.yml');
    return e;
  }
  throw new Error(`expected an error for:\n${text}`);
}

/** The text at (line, column), counted as a text editor does (both from 1). */
function textAt(text: string, line: number, column: number): string {
  return text.split('\n')[line - 1].slice(column - 1);
}

describe('defaults', () => {
  test('a minimal config gets every default', () => {
    const c = parse(MINIMAL);
    expect(c.file).toBe(FILE);
    expect(c.root).toBe(root);
    expect(c.data).toEqual({
      path: join(root, 'readings.csv'),
      pathAsWritten: 'readings.csv',
      target: 'condition',
      features: null,
      ignore: [],
      task: 'auto',
      validation: 0.25,
      judging: 0.2,
      delimiter: ',',
      maxCategories: 20,
      missing: 'error',
    });
    expect(c.target).toEqual({ metric: 'accuracy', threshold: 0.95, precision: 'float32', minRecall: null });
    expect(c.search).toEqual({
      minWidth: 1,
      maxWidth: 16,
      restarts: 10,
      required: 3,
      maxEpochs: 3000,
      seed: 1,
      growth: 'fresh',
      start: 'baseline',
      activation: 'tanh',
      optimizer: 'lbfgs',
      weightDecay: 0.0001,
      init: null,
      checkEvery: 10,
      patience: 200,
      pruneEpochs: 200,
      prune: true,
      timeBudget: null,
      maxTrainings: null,
      workers: null,
    });
    expect(c.gate).toEqual({
      baseline: join(root, 'neuron-budget.baseline.json'),
      baselineAsWritten: 'neuron-budget.baseline.json',
      maxWidth: null,
      maxFlashBytes: null,
      maxRamBytes: null,
      maxMacs: null,
      allowedGrowth: 0,
      metricTolerance: 0.02,
    });
  });

  test('regression defaults to the rmse metric', () => {
    const c = parse(MINIMAL.replace('  target: condition\n', '  target: flow\n  task: regression\n'));
    expect(c.target.metric).toBe('rmse');
  });

  test('every key written explicitly is read into the typed config', () => {
    const c = parse(
      [
        'data:',
        '  path: data/readings.csv',
        '  target: condition',
        '  features: [rms_velocity, kurtosis]',
        '  ignore: [reading_id]',
        '  task: classification',
        '  validation: 0',
        '  judging: 0.3',
        '  delimiter: "\\t"',
        '  max-categories: 5',
        '  missing: drop',
        'target:',
        '  metric: accuracy',
        '  threshold: 1',
        '  precision: int8',
        '  min-recall: { worn: 0.9, healthy: 1 }',
        'search:',
        '  min-width: 2',
        '  max-width: 8',
        '  restarts: 6',
        '  required: 6',
        '  max-epochs: 500',
        '  seed: 4294967295',
        '  growth: in-place',
        '  start: min-width',
        '  activation: relu',
        '  optimizer: adam',
        '  weight-decay: 0.5',
        '  init: he',
        '  check-every: 500',
        '  patience: 77',
        '  prune: false',
        '  prune-epochs: 0',
        '  time-budget: 90.5',
        '  max-trainings: 40',
        '  workers: 3',
        'gate:',
        '  baseline: ci/base.json',
        '  max-width: 2',
        '  max-flash-bytes: 4096',
        '  max-ram-bytes: 512',
        '  max-macs: 100000',
        '  allowed-growth: 1',
        '  metric-tolerance: 0',
        '',
      ].join('\n'),
    );
    expect(c.data).toMatchObject({
      path: join(root, 'data', 'readings.csv'),
      features: ['rms_velocity', 'kurtosis'],
      ignore: ['reading_id'],
      task: 'classification',
      validation: 0,
      judging: 0.3,
      delimiter: '\t',
      maxCategories: 5,
      missing: 'drop',
    });
    expect(c.target).toEqual({
      metric: 'accuracy',
      threshold: 1,
      precision: 'int8',
      minRecall: {
        classes: [
          { label: 'worn', min: 0.9 },
          { label: 'healthy', min: 1 },
        ],
      },
    });
    expect(c.search).toEqual({
      minWidth: 2,
      maxWidth: 8,
      restarts: 6,
      required: 6,
      maxEpochs: 500,
      seed: 4294967295,
      growth: 'in-place',
      start: 'min-width',
      activation: 'relu',
      optimizer: 'adam',
      weightDecay: 0.5,
      init: 'he',
      checkEvery: 500,
      patience: 77,
      pruneEpochs: 0,
      prune: false,
      timeBudget: 90.5,
      maxTrainings: 40,
      workers: 3,
    });
    expect(c.gate).toEqual({
      baseline: join(root, 'ci', 'base.json'),
      baselineAsWritten: 'ci/base.json',
      maxWidth: 2,
      maxFlashBytes: 4096,
      maxRamBytes: 512,
      maxMacs: 100000,
      allowedGrowth: 1,
      metricTolerance: 0,
    });
  });

  test('null (written as null, ~ or nothing) is accepted where it means "none"', () => {
    const c = parse(`${MINIMAL}search:\n  init: null\n  time-budget: ~\n  workers:\ngate:\n  max-width: null\n`);
    expect([c.search.init, c.search.timeBudget, c.search.workers, c.gate.maxWidth]).toEqual([null, null, null, null]);
  });

  test('YAML anchors and aliases resolve', () => {
    const c = parse(`${MINIMAL}search:\n  restarts: &n 7\n  required: *n\n`);
    expect(c.search.required).toBe(7);
  });

  test('empty optional sections take the defaults', () => {
    expect(parse(`${MINIMAL}search:\ngate:\n`).search.restarts).toBe(10);
  });
});

describe('each rule names the key, what was expected, what was found, and where', () => {
  // [description, config text, key, fragment of the message, text expected at the reported position]
  const cases: [string, string, string, string, string][] = [
    ['integer as text', `${MINIMAL}search:\n  restarts: ten\n`, 'search.restarts', 'found "ten"', 'ten'],
    ['integer zero', `${MINIMAL}search:\n  restarts: 0\n`, 'search.restarts', 'from 1 to 1000', '0'],
    ['integer too large', `${MINIMAL}search:\n  restarts: 1001\n`, 'search.restarts', 'found 1001', '1001'],
    ['fractional width', `${MINIMAL}search:\n  min-width: 1.5\n`, 'search.min-width', 'found 1.5', '1.5'],
    ['width 0', `${MINIMAL}search:\n  min-width: 0\n`, 'search.min-width', 'from 1 to 1024', '0'],
    ['negative seed', `${MINIMAL}search:\n  seed: -1\n`, 'search.seed', 'found -1', '-1'],
    ['seed above 32 bits', `${MINIMAL}search:\n  seed: 4294967296\n`, 'search.seed', 'found 4294967296', '4294967296'],
    ['infinite number', `${MINIMAL}search:\n  time-budget: .inf\n`, 'search.time-budget', 'found Infinity', '.inf'],
    ['time budget 0', `${MINIMAL}search:\n  time-budget: 0\n`, 'search.time-budget', 'above 0', '0'],
    [
      'validation negative',
      MINIMAL.replace('target: condition\n', 'target: condition\n  validation: -0.1\n'),
      'data.validation',
      'found -0.1',
      '-0.1',
    ],
    [
      'validation 1',
      MINIMAL.replace('target: condition\n', 'target: condition\n  validation: 1\n'),
      'data.validation',
      'below 1',
      '1',
    ],
    ['boolean as text', `${MINIMAL}search:\n  prune: "true"\n`, 'search.prune', 'true or false', '"true"'],
    ['enum typo', `${MINIMAL}search:\n  optimizer: irprop\n`, 'search.optimizer', 'did you mean "irprop+"', 'irprop'],
    ['enum of wrong type', `${MINIMAL}search:\n  growth: 3\n`, 'search.growth', 'one of fresh, in-place', '3'],
    ['threshold zero', MINIMAL.replace('threshold: 0.95', 'threshold: 0'), 'target.threshold', 'above 0', '0'],
    [
      'accuracy above 1',
      MINIMAL.replace('threshold: 0.95', 'metric: accuracy\n  threshold: 95'),
      'target.threshold',
      'at most 1',
      '95',
    ],
    [
      'metric for the other task',
      MINIMAL.replace('target: condition\n', 'target: condition\n  task: regression\n').replace(
        '  threshold',
        '  metric: accuracy\n  threshold',
      ),
      'target.metric',
      'rmse, mae or max-abs-error',
      'accuracy',
    ],
    [
      'features not a list',
      MINIMAL.replace('target: condition\n', 'target: condition\n  features: rms\n'),
      'data.features',
      'a list of column names',
      'rms',
    ],
    [
      'features empty',
      MINIMAL.replace('target: condition\n', 'target: condition\n  features: []\n'),
      'data.features',
      'empty list',
      '[]',
    ],
    [
      'feature twice',
      MINIMAL.replace('target: condition\n', 'target: condition\n  features: [a, b, a]\n'),
      'data.features',
      'listed twice',
      'a]',
    ],
    [
      'numeric column name',
      MINIMAL.replace('target: condition\n', 'target: condition\n  ignore: [id, 7]\n'),
      'data.ignore',
      'in quotes',
      '7]',
    ],
    [
      'target ignored',
      MINIMAL.replace('target: condition\n', 'target: condition\n  ignore: [condition]\n'),
      'data.ignore',
      'target',
      '[condition]',
    ],
    [
      'feature also ignored',
      MINIMAL.replace('target: condition\n', 'target: condition\n  features: [a, b]\n  ignore: [b]\n'),
      'data.ignore',
      '"b"',
      '[b]',
    ],
    ['target as a number', MINIMAL.replace('target: condition', 'target: 12'), 'data.target', 'in quotes', '12'],
    ['empty path', MINIMAL.replace('path: readings.csv', 'path: ""'), 'data.path', 'found ""', '""'],
    [
      'delimiter is a quote',
      MINIMAL.replace('target: condition\n', "target: condition\n  delimiter: '\"'\n"),
      'data.delimiter',
      'single character',
      `'"'`,
    ],
    [
      'max-width below min-width',
      `${MINIMAL}search:\n  min-width: 4\n  max-width: 3\n`,
      'search.max-width',
      'at least search.min-width (4)',
      '3',
    ],
    [
      'min-width above default max-width',
      `${MINIMAL}search:\n  min-width: 20\n`,
      'search.min-width',
      'at most search.max-width (16, the default)',
      '20',
    ],
    [
      'required above restarts',
      `${MINIMAL}search:\n  restarts: 2\n  required: 3\n`,
      'search.required',
      'at most search.restarts (2)',
      '3',
    ],
    [
      'restarts below default required',
      `${MINIMAL}search:\n  restarts: 2\n`,
      'search.restarts',
      'at least search.required (3, the default)',
      '2',
    ],
    [
      'check-every above max-epochs',
      `${MINIMAL}search:\n  max-epochs: 5\n  check-every: 6\n`,
      'search.check-every',
      'at most search.max-epochs (5)',
      '6',
    ],
    [
      'device budget below min-width',
      `${MINIMAL}search:\n  min-width: 3\ngate:\n  max-width: 2\n`,
      'gate.max-width',
      'over the budget',
      '2',
    ],
    [
      'accuracy tolerance of 1',
      `${MINIMAL.replace('threshold: 0.95', 'metric: accuracy\n  threshold: 0.95')}gate:\n  metric-tolerance: 1\n`,
      'gate.metric-tolerance',
      'below 1',
      '1',
    ],
    ['empty value', `${MINIMAL}search:\n  seed:\n`, 'search.seed', 'found nothing', 'seed:'],
    ['section as a list', `${MINIMAL}search: [1, 2]\n`, 'search', 'found a list', '[1, 2]'],
    ['unknown key', `${MINIMAL}search:\n  restart: 3\n`, 'search.restart', 'did you mean "restarts"', 'restart:'],
    ['camelCase key', `${MINIMAL}search:\n  maxWidth: 3\n`, 'search.maxWidth', 'did you mean "max-width"', 'maxWidth:'],
    ['unknown section', `${MINIMAL}gates:\n  max-width: 3\n`, 'gates', 'did you mean "gate"', 'gates:'],
  ];
  test.each(cases)('%s', (_name, text, key, fragment, token) => {
    const e = failure(text);
    expect(e.key).toBe(key);
    expect(e.message).toContain(`${key}: `);
    expect(e.message).toContain(fragment);
    expect(
      textAt(text, e.line!, e.column!).startsWith(token),
      `${e.message} → "${textAt(text, e.line!, e.column!)}"`,
    ).toBe(true);
  });

  test('a key far from every valid one gets no suggestion', () => {
    const e = failure(`${MINIMAL}search:\n  zzzzzzzz: 3\n`);
    expect(e.message).not.toContain('did you mean');
    expect(e.message).toContain('search accepts min-width, max-width');
  });

  test('required keys and sections', () => {
    expect(failure('target:\n  threshold: 0.9\n').message).toContain('data: section is required');
    expect(failure('data:\n  path: a.csv\ntarget:\n  threshold: 0.9\n').key).toBe('data.target');
    expect(failure('data:\n  target: c\ntarget:\n  threshold: 0.9\n').key).toBe('data.path');
    expect(failure('data:\n  path: a.csv\n  target: c\ntarget:\n  metric: accuracy\n').key).toBe('target.threshold');
  });

  test('a byte-order mark and CRLF line endings do not shift the reported position', () => {
    const text = `\uFEFF${MINIMAL}search:\n  restarts: ten\n`.replace(/\n/g, '\r\n');
    const e = failure(text);
    expect([e.line, e.column]).toEqual([7, 13]);
  });

  test('file-level problems', () => {
    expect(failure('').message).toContain('empty');
    expect(failure('just text').message).toContain('expected a mapping');
    expect(failure('data:\n  path: [a\n').message).toContain('YAML syntax error');
    const dup = failure(`${MINIMAL}search:\n  seed: 1\n  seed: 2\n`);
    expect(dup.message).toContain('"seed" appears twice');
    expect(dup.line).toBe(8);
  });
});

describe('paths stay inside the workspace', () => {
  test('relative to the config file, which may sit in a subfolder', () => {
    const c = parse(MINIMAL.replace('path: readings.csv', 'path: ../data/readings.csv'), join(root, 'ci', 'gate.yml'));
    expect(c.data.path).toBe(join(root, 'data', 'readings.csv'));
    expect(c.gate.baseline).toBe(join(root, 'ci', 'neuron-budget.baseline.json'));
  });

  test('absolute inside the workspace is allowed, outside is refused', () => {
    expect(parse(MINIMAL.replace('path: readings.csv', `path: ${join(root, 'x.csv')}`)).data.path).toBe(
      join(root, 'x.csv'),
    );
    const e = failure(MINIMAL.replace('path: readings.csv', 'path: /etc/passwd'));
    expect(e.key).toBe('data.path');
    expect(e.message).toContain('absolute path outside the workspace');
  });

  test.each(['../readings.csv', 'a/../../readings.csv', '../../../../../../etc/passwd'])('"%s" is refused', (p) => {
    const e = failure(MINIMAL.replace('path: readings.csv', `path: "${p}"`));
    expect(e.key).toBe('data.path');
    expect(e.message).toContain('outside the workspace');
  });

  test('a symbolic link out of the workspace is refused', () => {
    const outside = mkdtempSync(join(tmpdir(), 'neuron-budget-outside-'));
    try {
      symlinkSync(outside, join(root, 'escape'));
      const e = failure(`${MINIMAL}gate:\n  baseline: escape/base.json\n`);
      expect(e.key).toBe('gate.baseline');
      expect(e.message).toContain('symbolic link');
    } finally {
      rmSync(join(root, 'escape'), { force: true });
      rmSync(outside, { recursive: true, force: true });
    }
  });

  test('a config file outside the workspace cannot use the default baseline', () => {
    const outsideFile = join(tmpdir(), 'elsewhere', 'neuron-budget.yml');
    expect(() =>
      parseConfig(MINIMAL.replace('path: readings.csv', `path: ${join(root, 'r.csv')}`), { file: outsideFile, root }),
    ).toThrow(/gate\.baseline/);
  });
});

describe('loadConfig', () => {
  test('reads the file relative to the root', async () => {
    mkdirSync(join(root, 'ci'), { recursive: true });
    writeFileSync(join(root, 'ci', 'gate.yml'), MINIMAL);
    const c = await loadConfig('ci/gate.yml', root);
    expect(c.data.path).toBe(join(root, 'ci', 'readings.csv'));
  });

  test('a missing file is a UserError that names it', async () => {
    const error = await loadConfig('nope.yml', root).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(UserError);
    expect((error as UserError).message).toMatch(/^nope\.yml: config file not found/);
    expect((error as UserError).file).toBe('nope.yml');
  });
});
