// End-to-end: class labels, categories and column names that are also the names of object
// properties (`__proto__`, `constructor`, `toString`, `hasOwnProperty`, `valueOf`), through the
// BUILT command line: the data summary counts every class, the baseline file records every
// table entry and reads back, and the data-change list compares them as plain strings.
// The rows are invented for the test, not measurements.
import { afterAll, describe, expect, test } from 'vitest';
import { hasStackTrace, removeCliTempDirs, runCli } from '../helpers/cli.js';
import { csv } from '../helpers/hostile.js';

afterAll(removeCliTempDirs);

const NAMES = ['__proto__', 'constructor', 'toString', 'hasOwnProperty'] as const;

/**
 * Columns `__proto__` (numeric), `constructor` (categorical, categories named like properties),
 * `toString` or `valueOf` (numeric), and the target `hasOwnProperty`; `counts` rows per class.
 */
function table(counts: Record<string, number>, categories: readonly string[], third: string): string {
  const rows: (string | number)[][] = [];
  let i = 0;
  for (const [label, n] of Object.entries(counts)) {
    const k = Object.keys(counts).indexOf(label);
    for (let r = 0; r < n; r++, i++)
      rows.push([k + (r % 5) / 10, categories[i % categories.length], (i * 7) % 13, label]);
  }
  return csv(['__proto__', 'constructor', third, 'hasOwnProperty'], rows);
}

/** The class counts as an own-keys table (built with defineProperty: `__proto__` is a key like any other). */
function counts(entries: [string, number][]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [k, v] of entries) Object.defineProperty(out, k, { value: v, enumerable: true, writable: true });
  return out;
}

const CONFIG = [
  'data:',
  '  path: readings.csv',
  '  target: hasOwnProperty',
  '  validation: 0',
  'target:',
  '  threshold: 0.3',
  'search:',
  '  max-width: 3',
  '  restarts: 2',
  '  required: 1',
  '  max-epochs: 200',
  '  workers: 1',
  '',
].join('\n');

describe('labels, categories and column names that are property names', () => {
  test('the summary, the baseline round trip and the data changes keep every one', async () => {
    const before = counts([
      ['__proto__', 10],
      ['constructor', 20],
      ['toString', 10],
      ['hasOwnProperty', 10],
    ]);
    const first = await runCli(['baseline'], {
      files: { 'neuron-budget.yml': CONFIG, 'readings.csv': table(before, NAMES, 'toString') },
    });
    expect(first.code, first.stderr).toBe(0);
    expect(first.stderr).toContain('classification, 4 classes; 4 network outputs');
    for (const [label, n] of Object.entries(before))
      expect(first.stderr).toMatch(new RegExp(`^\\s+(?:classes)?\\s+${label}\\s+${n}\\s`, 'm'));

    // The baseline file records every class, category and column, and reads back (the check below).
    const baselineText = first.read('neuron-budget.baseline.json');
    const profile = JSON.parse(baselineText).data.profile;
    expect(Object.entries(profile.classes).sort()).toEqual(Object.entries(before).sort());
    expect(Object.keys(profile.features).sort()).toEqual(['__proto__', 'constructor', 'toString']);
    // 50 rows take the four categories in turn: 13, 13, 12, 12.
    expect(Object.entries(profile.features.constructor.counts).sort()).toEqual([
      ['__proto__', 13],
      ['constructor', 13],
      ['hasOwnProperty', 12],
      ['toString', 12],
    ]);
    expect(profile.features['__proto__'].kind).toBe('numeric');

    // Next: `__proto__` is gone, `constructor` grew, `valueOf` is new (as a class, a category and a column).
    const after = counts([
      ['constructor', 25],
      ['toString', 10],
      ['hasOwnProperty', 10],
      ['valueOf', 10],
    ]);
    const second = await runCli(['check', '--report', 'report.json'], {
      files: {
        'neuron-budget.yml': CONFIG,
        'readings.csv': table(after, ['__proto__', 'constructor', 'hasOwnProperty', 'valueOf'], 'valueOf'),
        'neuron-budget.baseline.json': baselineText,
      },
    });
    expect([0, 1], second.stderr).toContain(second.code);
    expect(hasStackTrace(second.stderr)).toBe(false);
    const report = JSON.parse(second.read('report.json'));
    expect(report.data.classes).toEqual(
      Object.entries(after)
        .sort(([a], [b]) => (a < b ? -1 : 1))
        .map(([label, count]) => ({ label, count })),
    );
    const changes = JSON.parse(second.read('report.json')).changes;
    expect(changes.classesAppeared).toEqual(['valueOf']);
    expect(changes.classesVanished).toEqual(['__proto__']);
    expect(changes.classes).toEqual([
      { label: '__proto__', before: 10, after: 0 },
      { label: 'constructor', before: 20, after: 25 },
      { label: 'hasOwnProperty', before: 10, after: 10 },
      { label: 'toString', before: 10, after: 10 },
      { label: 'valueOf', before: 0, after: 10 },
    ]);
    expect(changes.columnsAdded).toEqual(['valueOf']);
    expect(changes.columnsRemoved).toEqual(['toString']);
    expect(changes.categories).toEqual([{ feature: 'constructor', appeared: ['valueOf'], vanished: ['toString'] }]);
    expect(second.stderr).toContain('Class constructor: 20 → 25 rows (+5');
    expect(second.stderr).toContain('Class __proto__ no longer appears.');
    expect(second.stderr).not.toMatch(/NaN|undefined|\[object|function/);
  });
});
