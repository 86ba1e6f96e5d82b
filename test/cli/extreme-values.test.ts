// End-to-end: huge finite numbers, in a data file and in a baseline file, through the BUILT
// command line. A cell beyond the float32 range (±3.4e38) is refused at its line and column
// (it would overflow the column statistics, and no device could hold it); a baseline whose
// numbers are huge still gives a verdict and a report, never an internal error (exit 3).
// The rows are invented for the test, not measurements.
import { afterAll, describe, expect, test } from 'vitest';
import { expectOneUserError, hasStackTrace, removeCliTempDirs, runCli } from '../helpers/cli.js';

afterAll(removeCliTempDirs);

const CONFIG = [
  'data:',
  '  path: readings.csv',
  '  target: condition',
  '  validation: 0',
  'target:',
  '  threshold: 0.9',
  'search:',
  '  max-width: 3',
  '  restarts: 2',
  '  required: 1',
  '  max-epochs: 300',
  '  workers: 1',
  '',
].join('\n');

/** 24 rows; rms_velocity separates the classes. `kurtosis` replaces the kurtosis of some rows (1-based data row). */
function readings(kurtosisOf: Record<number, string> = {}): string {
  const lines = ['rms_velocity,kurtosis,condition'];
  for (let i = 1; i <= 24; i++) {
    const worn = i % 2 === 0;
    const kurtosis = kurtosisOf[i] ?? (3 + (i % 7) / 10).toFixed(1);
    lines.push(`${((worn ? 4 : 1) + (i % 5) / 10).toFixed(1)},${kurtosis},${worn ? 'worn' : 'healthy'}`);
  }
  return `${lines.join('\n')}\n`;
}

describe('huge numbers in the data', () => {
  test.each(['1.7e308', '1e160', '-3.5e38', '1e39'])(
    'a cell of %s is refused at its line and column by check and by baseline; nothing is written',
    async (value) => {
      const files = { 'neuron-budget.yml': CONFIG, 'readings.csv': readings({ 7: value }) };
      const check = await runCli(['check', '--model', 'model.json', '--report', 'report.json'], { files });
      expectOneUserError(check, 'readings.csv:8:2:', [
        'column 2 "kurtosis"',
        `found "${value}"`,
        'too large',
        'from -3.4e38 to 3.4e38',
      ]);
      expect(check.created).toEqual([]);
      const baseline = await runCli(['baseline'], { files });
      expectOneUserError(baseline, 'readings.csv:8:2:', [`found "${value}"`, 'too large']);
      expect(baseline.created).toEqual([]);
    },
  );

  test('numbers up to ±3e38 are accepted, and the model keeps finite statistics', async () => {
    const files = { 'neuron-budget.yml': CONFIG, 'readings.csv': readings({ 7: '3e38', 8: '-3e38', 9: '3.4e38' }) };
    const run = await runCli(['check', '--model', 'model.json'], { files });
    expect(run.code, run.stderr).toBe(0);
    const model = JSON.parse(run.read('model.json'));
    for (const f of model.encoding.features) {
      expect(Number.isFinite(f.mean), JSON.stringify(f)).toBe(true);
      expect(Number.isFinite(f.std) && f.std > 0, JSON.stringify(f)).toBe(true);
    }
    const recorded = await runCli(['baseline'], { files });
    expect(recorded.code, recorded.stderr).toBe(0);
    const profile = JSON.parse(recorded.read('neuron-budget.baseline.json')).data.profile.features.kurtosis;
    expect(profile).toMatchObject({ min: -3e38, max: 3.4e38 });
    expect(Number.isFinite(profile.std)).toBe(true);
  });
});

describe('huge numbers in the baseline file', () => {
  test('a baseline of 1.7e308-sized widths, rows, metrics and means still gives a verdict and a report', async () => {
    const files = { 'neuron-budget.yml': CONFIG, 'readings.csv': readings() };
    const first = await runCli(['baseline'], { files });
    expect(first.code, first.stderr).toBe(0);
    const baseline = JSON.parse(first.read('neuron-budget.baseline.json'));
    baseline.history[0].width = 1.7e308;
    baseline.history[0].rows = 1e300;
    baseline.history.push({ ...baseline.history[0], width: 1e21, metric: -1.7e308 });
    baseline.result.width = 1.7e308;
    baseline.widths[0].best = 1.7e308;
    baseline.widths.push({ width: 1e21, restarts: 1, met: 0, adequate: false, best: -1.7e308 });
    baseline.data.profile.features.kurtosis.mean = -1.7e308;
    baseline.data.profile.features.kurtosis.std = 5e-324;
    baseline.data.profile.features.rms_velocity.max = 1.7e308;
    baseline.data.profile.features.rms_velocity.min = -1.7e308;

    const check = await runCli(['check', '--report', 'report.json'], {
      files: { ...files, 'neuron-budget.baseline.json': JSON.stringify(baseline, null, 2) },
    });
    expect(hasStackTrace(check.stderr), check.stderr).toBe(false);
    expect(check.stderr).not.toContain('internal error');
    // Far below a baseline of 1.7e308 neurons: improved.
    expect(check.code, check.stderr).toBe(0);
    expect(check.created).toEqual(['report.json']);
    const report = JSON.parse(check.read('report.json'));
    expect(report.verdict).toBe('improved');
    expect(report.baseline.width).toBe(1.7e308);
    // The mean moved by more than the largest float: the shift is that, not Infinity (which JSON turns into null).
    const kurtosis = report.changes.features.find((f: { name: string }) => f.name === 'kurtosis');
    expect(kurtosis.shiftInStd).toBe(Number.MAX_VALUE);
    expect(check.stderr).toContain('capacity drift');
  });
});
