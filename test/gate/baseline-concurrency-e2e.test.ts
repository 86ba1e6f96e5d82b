/**
 * Two `neuron-budget baseline` runs at once, through the BUILT command line
 * (dist/cli/index.js), 20 rounds on one baseline file: in every round each run either
 * records its result or refuses with a clear message (exit 2, naming the file); the file
 * always parses and validates, and its history never loses an entry. And a killed writer's
 * temp file is removed by the next run.
 *
 * The data set is invented for the test (two linearly separable pump conditions), small
 * so that one run takes well under a second.
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Ajv2020 from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { CLI_BUNDLE, REPO_ROOT, hasStackTrace, makeTempDir, writeFiles } from '../helpers/cli.js';

const BASELINE = 'neuron-budget.baseline.json';
const ROUNDS = 20;

function files(): Record<string, string> {
  const rows = ['reading_id,rms_mm_s,condition'];
  for (let i = 0; i < 16; i++) {
    const worn = i % 2 === 1;
    rows.push(`r${i},${((worn ? 4 : 1) + (i % 5) / 10).toFixed(2)},${worn ? 'worn' : 'healthy'}`);
  }
  const config = [
    'data:',
    '  path: readings.csv',
    '  target: condition',
    '  ignore: [reading_id]',
    '  validation: 0',
    'target:',
    '  metric: accuracy',
    '  threshold: 0.9',
    'search:',
    '  min-width: 1',
    '  max-width: 2',
    '  restarts: 2',
    '  required: 1',
    '  max-epochs: 300',
    '  seed: 3',
    'gate:',
    `  baseline: ${BASELINE}`,
    '  max-width: 4',
    '',
  ].join('\n');
  return { 'readings.csv': rows.join('\n') + '\n', 'neuron-budget.yml': config };
}

interface Exit {
  code: number | null;
  stderr: string;
}

/** One `baseline` run in `dir`, started now; resolves when it ends. */
function baselineRun(dir: string): Promise<Exit> {
  return new Promise((done) => {
    const child = spawn(process.execPath, [CLI_BUNDLE, 'baseline'], {
      cwd: dir,
      env: { ...process.env, FORCE_COLOR: '0', NODE_OPTIONS: '' },
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    let stderr = '';
    child.stderr.setEncoding('utf8').on('data', (d: string) => (stderr += d));
    child.on('close', (code) => done({ code, stderr }));
  });
}

const validate = new Ajv2020.default({ allErrors: true, allowUnionTypes: true }).compile(
  JSON.parse(readFileSync(join(REPO_ROOT, 'schema/baseline.schema.json'), 'utf8')),
);

interface HistoryEntry {
  date: string;
  width: number;
}
function readHistory(dir: string): HistoryEntry[] {
  const baseline = JSON.parse(readFileSync(join(dir, BASELINE), 'utf8')) as { history: HistoryEntry[] };
  expect(validate(baseline), JSON.stringify(validate.errors)).toBe(true);
  return baseline.history;
}

const REFUSAL = new RegExp(
  `^error: ${BASELINE.replace(/\./g, '\\.')}: (the baseline file changed while this run was searching|another neuron-budget run is writing this baseline)`,
);

describe('baseline writes through dist/cli/index.js', () => {
  it(`two baseline runs at once, ${ROUNDS} rounds: no lost entry, no corrupt file`, async () => {
    expect(existsSync(CLI_BUNDLE), `${CLI_BUNDLE} is missing: run npm run build`).toBe(true);
    const dir = makeTempDir('nb-concurrent-');
    writeFiles(dir, files());
    const first = await baselineRun(dir);
    expect(first.code, first.stderr).toBe(0);
    let history = readHistory(dir);
    expect(history).toHaveLength(1);

    let refused = 0;
    for (let round = 1; round <= ROUNDS; round++) {
      const runs = await Promise.all([baselineRun(dir), baselineRun(dir)]);
      for (const r of runs) {
        expect([0, 2], r.stderr).toContain(r.code);
        if (r.code === 2) {
          const lines = r.stderr.trimEnd().split('\n');
          expect(lines.at(-1), r.stderr).toMatch(REFUSAL);
          expect(hasStackTrace(r.stderr), r.stderr).toBe(false);
        }
      }
      const recorded = runs.filter((r) => r.code === 0).length;
      refused += runs.length - recorded;
      // One of the two always gets through: the first to take the lock finds the file as it read it.
      expect(recorded, `round ${round}`).toBeGreaterThanOrEqual(1);
      const after = readHistory(dir);
      // Every entry of before is still there, in order, and each run that said it recorded did.
      expect(after.slice(0, history.length), `round ${round}`).toEqual(history);
      expect(after, `round ${round}: ${recorded} recorded`).toHaveLength(history.length + recorded);
      history = after;
      // Nothing left beside the baseline: no lock file, no temp file.
      expect(readdirSync(dir).sort()).toEqual([BASELINE, 'neuron-budget.yml', 'readings.csv']);
    }
    // Shown in the test log: how often the two runs overlapped so that one had to refuse.
    console.log(`${ROUNDS} rounds: ${2 * ROUNDS - refused} results recorded, ${refused} refused, 0 lost`);
  }, 300_000);

  it("a dead writer's temp file beside the baseline is removed by the next baseline run; others stay", async () => {
    const dir = makeTempDir('nb-stale-temp-');
    writeFiles(dir, files());
    // A process that has ended: its PID stands for the killed writer's.
    const gone = spawnSync(process.execPath, ['-e', '']).pid;
    const stale = `.${BASELINE}.${gone}.0123456789ab.neuron-budget.tmp`;
    const legacy = `.${BASELINE}.${gone}.ba9876543210.tmp`; // named as 0.1.0 named them
    const unrelated = `.${BASELINE}.${gone}.notes.tmp`;
    for (const name of [stale, legacy, unrelated]) writeFileSync(join(dir, name), '{"schema": "neuron-budget/base');
    const r = await baselineRun(dir);
    expect(r.code, r.stderr).toBe(0);
    expect(readdirSync(dir).sort()).toEqual([unrelated, BASELINE, 'neuron-budget.yml', 'readings.csv'].sort());
    expect(readHistory(dir)).toHaveLength(1);
  }, 60_000);
});
