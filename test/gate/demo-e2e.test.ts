/**
 * End to end on the invented pump-vibration demo, through the BUILT command line
 * (dist/cli/index.js, built by `node scripts/build.mjs`), as a user would run it:
 *
 *   1. `baseline` on the base readings writes a valid baseline;
 *   2. `check` on the pull-request variant fails with a reason naming the width and the
 *      device budget, the data-change summary names the new rows, and the baseline file
 *      is left exactly as it was;
 *   3. `check` on the base readings after `baseline` passes.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import Ajv2020 from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import type { Report } from '../../src/report/types.js';
import { REPO_ROOT, runCli, type CliRun } from '../helpers/cli.js';

const DEMO = 'examples/pump-vibration';
const TIMEOUT = 600_000;

function demoFiles(): Record<string, string> {
  const files: Record<string, string> = {};
  for (const name of readdirSync(join(REPO_ROOT, DEMO))) {
    if (/\.(csv|yml|yaml)$/.test(name)) files[`${DEMO}/${name}`] = readFileSync(join(REPO_ROOT, DEMO, name), 'utf8');
  }
  return files;
}

const ajv = new Ajv2020.default({ allErrors: true, allowUnionTypes: true });
const validateBaseline = ajv.compile(JSON.parse(readFileSync(join(REPO_ROOT, 'schema/baseline.schema.json'), 'utf8')));

function onlyCreated(run: CliRun, suffix: string): string {
  const hits = run.created.filter((p) => p.endsWith(suffix));
  expect(hits, `files created: ${run.created.join(', ')}`).toHaveLength(1);
  return hits[0];
}

describe('demo, end to end through dist/cli/index.js', () => {
  it(
    'baseline on the base data, then check on the pull request fails and check on the base data passes',
    async () => {
      const files = demoFiles();
      expect(Object.keys(files)).toEqual(
        expect.arrayContaining([
          `${DEMO}/neuron-budget.yml`,
          `${DEMO}/neuron-budget.pr.yml`,
          `${DEMO}/readings.csv`,
          `${DEMO}/readings-pr.csv`,
        ]),
      );

      const base = await runCli(['baseline', '--config', `${DEMO}/neuron-budget.yml`], { files, timeoutMs: TIMEOUT });
      expect(base.code, base.stderr).toBe(0);
      const baselinePath = onlyCreated(base, '.json');
      const baselineText = base.read(baselinePath);
      const baseline = JSON.parse(baselineText);
      expect(validateBaseline(baseline), JSON.stringify(validateBaseline.errors)).toBe(true);
      expect(baseline.history).toHaveLength(1);
      const baseWidth: number = baseline.result.width;

      const withBaseline = { ...files, [baselinePath]: baselineText };
      const pr = await runCli(['check', '--config', `${DEMO}/neuron-budget.pr.yml`, '--report', 'report.json'], {
        files: withBaseline,
        timeoutMs: TIMEOUT,
      });
      expect(pr.code, pr.stderr).toBe(1);
      const report = JSON.parse(pr.read('report.json')) as Report;
      expect(report.verdict).toBe('fail');
      expect(report.baseline?.width).toBe(baseWidth);
      const budget = report.gate?.maxWidth;
      expect(budget).toBeTypeOf('number');
      expect(report.width!).toBeGreaterThan(budget!);
      expect(report.reasons[0]).toBe(`Needs ${report.width} hidden neurons; the device budget is ${budget}.`);
      expect(pr.stderr).toContain(`Needs ${report.width} hidden neurons; the device budget is ${budget}.`);
      // The data-change summary names the new rows.
      const rows = report.changes!.rows;
      expect(rows.after).toBeGreaterThan(rows.before);
      expect(rows.before).toBe(baseline.data.rows);
      expect(pr.stderr).toMatch(
        new RegExp(
          `Rows ${rows.before.toLocaleString('en-US')} → ${rows.after.toLocaleString('en-US')} \\(\\+${(rows.after - rows.before).toLocaleString('en-US')}\\)`,
        ),
      );
      // A failing check never touches the baseline.
      expect(pr.read(baselinePath)).toBe(baselineText);

      const same = await runCli(['check', '--config', `${DEMO}/neuron-budget.yml`, '--report', 'report.json'], {
        files: withBaseline,
        timeoutMs: TIMEOUT,
      });
      expect(same.code, same.stderr).toBe(0);
      const sameReport = JSON.parse(same.read('report.json')) as Report;
      expect(sameReport.verdict).toBe('pass');
      expect(sameReport.width).toBe(baseWidth);
      expect(sameReport.changes!.changed).toBe(false);
      expect(same.read(baselinePath)).toBe(baselineText);
    },
    TIMEOUT * 3,
  );
});
