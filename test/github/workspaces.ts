/**
 * Workspaces for the end-to-end runs of the action bundle. The datasets are invented for the
 * tests (pump vibration readings), not measurements.
 */
import { makeWorkspace } from './harness.js';

/** 24 invented readings: healthy pumps vibrate at 1–2 mm/s RMS, worn ones at 4–5; one feature separates them. */
export function separableCsv(): string {
  const lines = ['reading_id,rms_mm_s,kurtosis,condition'];
  for (let i = 0; i < 24; i++) {
    const worn = i % 2 === 1;
    const rms = (worn ? 4 : 1) + ((i * 7) % 11) / 10;
    const kurtosis = 3 + ((i * 5) % 7) / 10;
    lines.push(
      `r${String(i + 1).padStart(3, '0')},${rms.toFixed(2)},${kurtosis.toFixed(2)},${worn ? 'worn' : 'healthy'}`,
    );
  }
  return lines.join('\n') + '\n';
}

/** Same invented readings, but every one duplicated with the opposite label: no network can be 100% right. */
export function contradictoryCsv(): string {
  const [header, ...rows] = separableCsv().trimEnd().split('\n');
  const flipped = rows.map((r, i) =>
    r
      .replace(/^r\d+/, `x${String(i + 1).padStart(3, '0')}`)
      .replace(/(healthy|worn)$/, (m) => (m === 'worn' ? 'healthy' : 'worn')),
  );
  return [header, ...rows, ...flipped].join('\n') + '\n';
}

/** Small and fast on purpose: restarts 3, widths 1–4. */
export function config(opts: { csv?: string; threshold?: number; validation?: number } = {}): string {
  return [
    'data:',
    `  path: ${opts.csv ?? 'data/readings.csv'}`,
    '  target: condition',
    '  ignore: [reading_id]',
    `  validation: ${opts.validation ?? 0.25}`,
    'target:',
    '  metric: accuracy',
    `  threshold: ${opts.threshold ?? 0.9}`,
    'search:',
    '  min-width: 1',
    '  max-width: 4',
    '  restarts: 3',
    '  required: 2',
    '  max-epochs: 300',
    '  seed: 11',
    'gate:',
    '  baseline: neuron-budget.baseline.json',
    '  max-width: 4',
    '',
  ].join('\n');
}

export function passingWorkspace(): string {
  return makeWorkspace({ 'neuron-budget.yml': config(), 'data/readings.csv': separableCsv() });
}

export function failingWorkspace(): string {
  return makeWorkspace({
    'neuron-budget.yml': config({ threshold: 1, validation: 0 }),
    'data/readings.csv': contradictoryCsv(),
  });
}
