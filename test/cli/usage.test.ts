// End-to-end: the command line's own surface (commands, flags, exit codes, streams) and a
// data-stage run, through the BUILT dist/cli/index.js.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { hasStackTrace, REPO_ROOT, removeCliTempDirs, runCli } from '../helpers/cli.js';

afterAll(removeCliTempDirs);

// Invented rows, just enough for a stratified split: three classes, one text feature.
const CSV = [
  'reading_id,pump_model,rms_velocity,kurtosis,condition',
  ...Array.from({ length: 30 }, (_, i) => {
    const condition = ['normal', 'imbalance', 'bearing_wear'][i % 3];
    const model = i % 2 === 0 ? 'P-100' : 'P-200';
    return `${i + 1},${model},${(1 + (i % 3) + i / 100).toFixed(2)},${(3 + 2 * (i % 3) + i / 50).toFixed(2)},${condition}`;
  }),
  '',
].join('\n');
const CONFIG =
  'data:\n  path: readings.csv\n  target: condition\n  ignore: [reading_id]\n  validation: 0.2\ntarget:\n  threshold: 0.9\n';
const FILES = { 'neuron-budget.yml': CONFIG, 'readings.csv': CSV };

function expectUsageError(
  run: { code: number; stdout: string; stderr: string; created: string[] },
  ...fragments: string[]
): void {
  expect(run.code, run.stderr).toBe(2);
  expect(run.stdout).toBe('');
  expect(hasStackTrace(run.stderr)).toBe(false);
  const lines = run.stderr.trimEnd().split('\n');
  expect(lines).toHaveLength(1);
  expect(lines[0].startsWith('error: ')).toBe(true);
  for (const f of fragments) expect(lines[0]).toContain(f);
  expect(run.created).toEqual([]);
}

describe('help and version', () => {
  test('--version prints the version from package.json to stdout', async () => {
    const pkg = JSON.parse(readFileSync(join(REPO_ROOT, 'package.json'), 'utf8')) as { version: string };
    const run = await runCli(['--version']);
    expect(run.code).toBe(0);
    expect(run.stdout).toBe(`${pkg.version}\n`);
    expect(run.stderr).toBe('');
  });

  test('--version after a command still prints the version', async () => {
    const run = await runCli(['check', '--version']);
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/^\d+\.\d+\.\d+/);
  });

  test('--help lists both commands and the exit codes, on stdout', async () => {
    const run = await runCli(['--help']);
    expect(run.code).toBe(0);
    expect(run.stderr).toBe('');
    for (const word of ['check', 'baseline', '--version', 'exit codes']) expect(run.stdout).toContain(word);
    for (const line of run.stdout.split('\n')) expect(line.length, line).toBeLessThanOrEqual(80);
  });

  test('check --help lists every option of check', async () => {
    const run = await runCli(['check', '--help']);
    expect(run.code).toBe(0);
    for (const flag of ['--config', '--report', '--model', '--baseline', '--workers'])
      expect(run.stdout).toContain(flag);
  });

  test('baseline --help lists only the options of baseline', async () => {
    const run = await runCli(['baseline', '--help']);
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('--baseline');
    expect(run.stdout).not.toContain('--report');
  });
});

describe('usage mistakes exit with code 2 and one line', () => {
  test('no command', async () => expectUsageError(await runCli([], { files: FILES }), 'command'));
  test('unknown command suggests the nearest', async () =>
    expectUsageError(await runCli(['chek'], { files: FILES }), '"chek"', 'did you mean "check"'));
  test('unknown option suggests the nearest', async () =>
    expectUsageError(
      await runCli(['check', '--confg', 'x.yml'], { files: FILES }),
      '--confg',
      'did you mean "--config"',
    ));
  test('an option of the other command', async () =>
    expectUsageError(await runCli(['baseline', '--report', 'r.json'], { files: FILES }), 'baseline has no --report'));
  test('option without its value', async () =>
    expectUsageError(await runCli(['check', '--report'], { files: FILES }), '--report needs a value'));
  test('option followed by another option instead of a value', async () =>
    expectUsageError(
      await runCli(['check', '--config', '--report', 'r.json'], { files: FILES }),
      '--config needs a value',
    ));
  test('empty value with =', async () =>
    expectUsageError(await runCli(['check', '--report='], { files: FILES }), '--report needs a value'));
  test('option given twice', async () =>
    expectUsageError(
      await runCli(['check', '--report', 'a.json', '--report=b.json'], { files: FILES }),
      'given twice',
    ));
  test.each(['0', '257', 'four', '2.5', '-1', '1e2'])('--workers %s is refused', async (n) =>
    expectUsageError(
      await runCli(['check', `--workers=${n}`], { files: FILES }),
      '--workers',
      'from 1 to 256',
      `"${n}"`,
    ),
  );
  test('stray positional argument', async () =>
    expectUsageError(await runCli(['check', 'neuron-budget.yml'], { files: FILES }), 'unexpected argument'));
  test('report below a file instead of a folder', async () =>
    expectUsageError(
      await runCli(['check', '--report', 'readings.csv/out.json'], { files: FILES }),
      'is not a folder',
    ));
  test('report path that is a folder', async () =>
    expectUsageError(
      await runCli(['check', '--report', 'out'], { files: { ...FILES, 'out/.keep': '' } }),
      'is a folder',
    ));
  test('report into a folder that does not exist', async () =>
    expectUsageError(
      await runCli(['check', '--report', 'missing/out.json'], { files: FILES }),
      'missing',
      'does not exist',
    ));
});

describe('check on a small table', () => {
  test('prints the data summary and the verdict to stderr, keeps stdout clean, writes the report JSON', async () => {
    const run = await runCli(['check', '--report', 'out/report.json'], {
      files: { ...FILES, 'out/.keep': '' },
    });
    expect(run.code, run.stderr).toBe(0);
    expect(run.stdout).toBe('');
    expect(run.created).toEqual(['out/report.json']);
    const report = JSON.parse(run.read('out/report.json')) as {
      schema: string;
      verdict: unknown;
      data: {
        rows: number;
        trainRows: number;
        validationRows: number;
        judgingRows: number;
        inputs: number;
        task: string;
        fingerprint: string;
        classes: { label: string; count: number }[];
      };
      timing: Record<string, number>;
    };
    expect(report.schema).toBe('neuron-budget/report@2');
    // No baseline in the temp folder: the first result is new.
    expect(report.verdict).toBe('new');
    // Counted from the CSV above: 30 rows, 10 per class; 20% held out to validate is 6 rows, and
    // the judging rows (data.judging's default, 0.2) are 6 more.
    expect(report.data.rows).toBe(30);
    expect(report.data.trainRows + report.data.validationRows + report.data.judgingRows).toBe(30);
    expect(report.data.validationRows).toBe(6);
    expect(report.data.judgingRows).toBe(6);
    // Two numeric features plus the two pump models one-hot.
    expect(report.data.inputs).toBe(4);
    expect(report.data.task).toBe('classification');
    expect(report.data.classes).toEqual([
      { label: 'bearing_wear', count: 10 },
      { label: 'imbalance', count: 10 },
      { label: 'normal', count: 10 },
    ]);
    expect(report.data.fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(Object.keys(report.timing).sort()).toEqual([
      'growthSeconds',
      'loadSeconds',
      'pruneSeconds',
      'searchSeconds',
    ]);
    // Rounded to whole milliseconds, in the JSON as in the baseline's searchSeconds.
    for (const seconds of Object.values(report.timing)) expect(/^\d+(\.\d{1,3})?$/.test(String(seconds))).toBe(true);
    for (const shown of [
      '30 used',
      '18 training / 6 validation / 6 judging',
      'bearing_wear',
      report.data.fingerprint,
      'NEW',
    ]) {
      expect(run.stderr).toContain(shown);
    }
  });

  test('two runs give the same report apart from timing', async () => {
    const strip = (text: string): unknown => ({ ...(JSON.parse(text) as object), timing: null });
    const a = await runCli(['check', '--report', 'r.json'], { files: FILES });
    const b = await runCli(['check', '--report=r.json', '--workers', '2'], { files: FILES });
    expect(a.code).toBe(0);
    expect(b.code).toBe(0);
    expect(strip(b.read('r.json'))).toEqual(strip(a.read('r.json')));
  });

  test('--config in a subfolder: data.path resolves against the config file, the workspace is the current folder', async () => {
    const run = await runCli(['check', '--config', 'ci/gate.yml', '--report', 'r.json'], {
      files: {
        'ci/gate.yml': CONFIG.replace('path: readings.csv', 'path: ../data/readings.csv'),
        'data/readings.csv': CSV,
      },
    });
    expect(run.code, run.stderr).toBe(0);
    expect(JSON.parse(run.read('r.json')).data.file).toBe('data/readings.csv');
  });

  test('default config is neuron-budget.yml in the current folder', async () => {
    const run = await runCli(['check'], {
      files: { 'sub/neuron-budget.yml': CONFIG, 'sub/readings.csv': CSV },
      cwd: 'sub',
    });
    expect(run.code, run.stderr).toBe(0);
    expect(run.stderr).toContain('30 used');
  });
});

describe('baseline on a small table', () => {
  test('says on stdout what it wrote: the file, the width and the history entries', async () => {
    const first = await runCli(['baseline'], { files: FILES });
    expect(first.code, first.stderr).toBe(0);
    const written = JSON.parse(first.read('neuron-budget.baseline.json')) as { result: { width: number } };
    expect(first.stdout).toBe(
      `baseline written: neuron-budget.baseline.json, width ${written.result.width}, 1 history entry\n`,
    );
    expect(first.stderr).not.toContain('baseline written');

    const files = { ...FILES, 'neuron-budget.baseline.json': first.read('neuron-budget.baseline.json') };
    const second = await runCli(['baseline'], { files });
    expect(second.stdout).toBe(
      `baseline written: neuron-budget.baseline.json, width ${written.result.width}, 2 history entries\n`,
    );

    // --baseline names another file: the line names it as given.
    const other = await runCli(['baseline', '--baseline', 'gates/pump.json'], {
      files: { ...FILES, 'gates/.keep': '' },
    });
    expect(other.code, other.stderr).toBe(0);
    expect(other.stdout).toMatch(/^baseline written: gates\/pump\.json, width \d+, 1 history entry\n$/);
  });

  test('says on stdout why nothing was written when the search could not finish', async () => {
    const config = `${CONFIG}search:\n  max-trainings: 1\n`;
    const run = await runCli(['baseline'], { files: { 'neuron-budget.yml': config, 'readings.csv': CSV } });
    expect(run.code, run.stderr).toBe(1);
    expect(run.stdout).toBe(
      'baseline not written: the search did not finish, so there is no result to record; the baseline file was left unchanged\n',
    );
    expect(run.created).toEqual([]);
  });

  test('check prints nothing about the baseline file on stdout', async () => {
    const run = await runCli(['check'], { files: FILES });
    expect(run.code, run.stderr).toBe(0);
    expect(run.stdout).toBe('');
  });
});
