/**
 * Device reality on the invented pump-vibration demo, through the BUILT command line:
 * - `check --model --report`, then `export` to C and a compile by the system C compiler: the
 *   exported int8 path, run on the rows that judged the witness, scores exactly the int8 metric
 *   the report states;
 * - `predict` on those same rows reproduces the report's metric exactly;
 * - every model the tool writes validates against schema/model.schema.json (ajv, a
 *   general-purpose validator);
 * - a byte budget the pull-request variant exceeds fails the gate with a reason naming the bytes.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import Ajv2020 from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../src/config/index.js';
import { loadData } from '../../src/data/index.js';
import type { Report } from '../../src/report/types.js';
import { REPO_ROOT, runCli } from '../helpers/cli.js';
import { build, CC } from './c-driver.js';

const DEMO = 'examples/pump-vibration';
const TIMEOUT = 600_000;

function demoFiles(extraGate = ''): Record<string, string> {
  const read = (name: string) => readFileSync(join(REPO_ROOT, DEMO, name), 'utf8');
  return {
    [`${DEMO}/readings.csv`]: read('readings.csv'),
    [`${DEMO}/readings-pr.csv`]: read('readings-pr.csv'),
    [`${DEMO}/neuron-budget.yml`]: read('neuron-budget.yml'),
    [`${DEMO}/neuron-budget.pr.yml`]: read('neuron-budget.pr.yml').replace(
      '  max-width: 5\n',
      `  max-width: 12\n${extraGate}`,
    ),
  };
}

const ajv = new Ajv2020.default({ allErrors: true, allowUnionTypes: true, strict: false });
const validateModel = ajv.compile(JSON.parse(readFileSync(join(REPO_ROOT, 'schema/model.schema.json'), 'utf8')));

/** The rows that judged the witness, as the data stage holds them (the split is deterministic). */
async function judgedRows(config: string) {
  const cfg = parseConfig(readFileSync(join(REPO_ROOT, DEMO, config), 'utf8'), {
    file: join(REPO_ROOT, DEMO, config),
    root: REPO_ROOT,
  });
  const data = await loadData(cfg);
  const ds = data.dataset;
  return { ds, judging: data.splitRows!.judging, lines: readFileSync(cfg.data.path, 'utf8').split('\n') };
}

describe('the demo on the device, through dist/cli/index.js', () => {
  it(
    'the exported int8 path scores the report’s int8 metric exactly, and predict reproduces the report’s metric',
    async () => {
      const files = demoFiles();
      const run = await runCli(
        ['check', '--config', `${DEMO}/neuron-budget.yml`, '--model', 'm.json', '--report', 'r.json'],
        { files, timeoutMs: TIMEOUT },
      );
      expect(run.code, run.stderr).toBe(0);
      const report = JSON.parse(run.read('r.json')) as Report;
      const model = JSON.parse(run.read('m.json'));
      expect(validateModel(model), JSON.stringify(validateModel.errors)).toBe(true);
      expect(report.device).not.toBeNull();
      const device = report.device!;
      expect(device.metric.int8).not.toBeNull();
      // The confusion matrix covers every row that judged the witness.
      expect(device.confusion!.flat().reduce((s, v) => s + v, 0)).toBe(report.search!.judging.rows);

      const { ds, judging, lines } = await judgedRows('neuron-budget.yml');
      expect(judging.length).toBe(report.search!.judging.rows);

      // predict on exactly those rows (the header, then each judging row as it is in the file).
      const kept = lines.slice(1).filter((l) => l.trim() !== '');
      const csv = [lines[0], ...Array.from(judging, (r) => kept[r])].join('\n');
      const predicted = await runCli(['predict', 'm.json', 'judged.csv', '--out', 'p.csv'], {
        files: { 'm.json': run.read('m.json'), 'judged.csv': `${csv}\n` },
        timeoutMs: TIMEOUT,
      });
      expect(predicted.code, predicted.stderr).toBe(0);
      const out = predicted
        .read('p.csv')
        .trim()
        .split('\n')
        .slice(1)
        .map((l) => l.split(',')[0]);
      const labels = ds.encoding.target.classes!;
      const truth = Array.from(ds.yJudging, (y) => labels[y]);
      const correct = out.filter((label, i) => label === truth[i]).length;
      expect(correct / truth.length).toBe(report.metric.value);
      expect(predicted.stderr).toContain(`scored ${truth.length} rows`);

      // export, compile, run the int8 path on the same rows as the device gets them.
      const exported = await runCli(['export', 'm.json', '--format', 'c', '--out', 'fw', '--name', 'pump'], {
        files: { 'm.json': run.read('m.json') },
        timeoutMs: TIMEOUT,
      });
      expect(exported.code, exported.stderr).toBe(0);
      expect(exported.created.sort()).toEqual(['fw/pump.c', 'fw/pump.h']);
      const header = exported.read('fw/pump.h');
      expect(header).toContain(report.data.fingerprint);
      if (CC === null) return; // the compile below needs gcc or cc (CI installs one)
      const built = build(
        { headerFile: 'pump.h', sourceFile: 'pump.c', header, source: exported.read('fw/pump.c') },
        'pump',
      );
      const rows = built.run(ds.rawJudged!, ds.encoding.features.length);
      const int8Correct = rows.filter((r, i) => r.int8Class === ds.yJudging[i]).length;
      expect(int8Correct / rows.length).toBe(device.metric.int8);
    },
    TIMEOUT,
  );

  it(
    'a flash budget the pull-request variant exceeds fails the gate, naming the bytes and the budget',
    async () => {
      const files = demoFiles('  max-flash-bytes: 400\n');
      const run = await runCli(['check', '--config', `${DEMO}/neuron-budget.pr.yml`, '--report', 'r.json'], {
        files,
        timeoutMs: TIMEOUT,
      });
      expect(run.code, run.stderr).toBe(1);
      const report = JSON.parse(run.read('r.json')) as Report;
      const bytes = report.device!.cost.flashBytes.float32;
      expect(bytes).toBeGreaterThan(400);
      expect(report.verdict).toBe('fail');
      expect(report.reasons[0]).toBe(
        `Needs ${bytes} flash bytes for its float32 weights (width ${report.width}); the device budget is 400 bytes.`,
      );
    },
    TIMEOUT,
  );
});
