// End-to-end through the BUILT dist/cli/index.js: with data.task auto and no target.metric, the
// metric follows the task the data show, and the threshold is checked against that metric. A
// regression config written the short way runs (it used to stop with "expected an accuracy");
// a numeric target with few values, read as classes, stops with what to write either way.
import { afterAll, describe, expect, test } from 'vitest';
import type { Report } from '../../src/report/types.js';
import { expectOneUserError, removeCliTempDirs, runCli } from '../helpers/cli.js';

afterAll(removeCliTempDirs);

// Invented pump readings: the bearing temperature rises with the vibration (no randomness).
const ROWS = Array.from({ length: 120 }, (_, i) => {
  const rms = 0.5 + (i % 40) * 0.05;
  const kurtosis = 2.5 + ((i * 7) % 13) * 0.1;
  return { rms, kurtosis, temp: 35 + 9 * rms + ((i * 11) % 5) * 0.2, age: i % 9 };
});
const CSV = [
  'rms_velocity,kurtosis,bearing_temp,age_years',
  ...ROWS.map((r) => `${r.rms.toFixed(2)},${r.kurtosis.toFixed(1)},${r.temp.toFixed(2)},${r.age}`),
  '',
].join('\n');
const SEARCH = 'search:\n  max-width: 2\n  restarts: 2\n  required: 1\n  max-epochs: 200\n';
const config = (target: string, ignore: string, rest: string): string =>
  `data:\n  path: readings.csv\n  target: ${target}\n  ignore: [${ignore}]\n${rest}${SEARCH}`;

describe('the metric follows the task found in the data', () => {
  test('a regression target without data.task or target.metric is judged by rmse, its threshold in its units', async () => {
    const run = await runCli(['check', '--report', 'report.json'], {
      files: {
        'neuron-budget.yml': config('bearing_temp', 'age_years', 'target:\n  threshold: 10\n'),
        'readings.csv': CSV,
      },
    });
    expect(run.code, run.stderr).toBe(0);
    const report = JSON.parse(run.read('report.json')) as Report;
    expect(report.data.task).toBe('regression');
    expect(report.metric).toMatchObject({ name: 'rmse', threshold: 10 });
    expect(run.stderr).toContain('rmse ≤ 10');
    // The target's spread, over all 120 rows, as the CSV holds them (population std).
    const temps = ROWS.map((r) => Number(r.temp.toFixed(2)));
    const mean = temps.reduce((s, t) => s + t, 0) / temps.length;
    const std = Math.sqrt(temps.reduce((s, t) => s + (t - mean) ** 2, 0) / temps.length);
    const spread = report.data.targetSpread!;
    expect(spread.mean).toBeCloseTo(mean, 9);
    expect(spread.std).toBeCloseTo(std, 9);
    expect([spread.min, spread.max]).toEqual([Math.min(...temps), Math.max(...temps)]);
  });

  test('a few distinct numbers read as classes: the threshold error says what to write either way', async () => {
    const run = await runCli(['check'], {
      files: {
        'neuron-budget.yml': config('age_years', 'bearing_temp', 'target:\n  threshold: 10\n'),
        'readings.csv': CSV,
      },
    });
    expectOneUserError(run, 'neuron-budget.yml:6:3:', [
      'target.threshold: the target column "age_years" was read as classification (it holds only 9 distinct numbers, and data.task auto reads at most 10 as class labels)',
      'expected above 0 and at most 1, found 10',
      'if "age_years" is a measurement, write "task: regression" under data (the metric is then rmse',
      'if it holds classes, write the accuracy as a fraction (95% as 0.95)',
    ]);
    expect(run.created).toEqual([]);
  });

  test('the same target with data.task regression written: rmse, and the threshold of 10 is accepted', async () => {
    const run = await runCli(['check', '--report', 'report.json'], {
      files: {
        'neuron-budget.yml': config('age_years', 'bearing_temp', '  task: regression\ntarget:\n  threshold: 10\n'),
        'readings.csv': CSV,
      },
    });
    expect(run.code, run.stderr).toBe(0);
    const report = JSON.parse(run.read('report.json')) as Report;
    expect(report.metric).toMatchObject({ name: 'rmse', threshold: 10 });
    expect(report.data.targetSpread).toMatchObject({ min: 0, max: 8 });
  });

  test('a class target keeps accuracy, and the report has no target spread', async () => {
    const labelled = CSV.replace(/,(\d)\n/g, (_, age: string) => `,${Number(age) < 5 ? 'new' : 'old'}\n`);
    const run = await runCli(['check', '--report', 'report.json'], {
      files: {
        'neuron-budget.yml': config('age_years', 'bearing_temp', 'target:\n  threshold: 0.5\n'),
        'readings.csv': labelled,
      },
    });
    // The labels do not follow the readings; whether the target is met does not matter here.
    expect([0, 1], run.stderr).toContain(run.code);
    const report = JSON.parse(run.read('report.json')) as Report;
    expect(report.metric.name).toBe('accuracy');
    expect(report.data.targetSpread).toBeNull();
  });
});
