/**
 * The start from the baseline, through the built command line, on invented data from a random
 * teacher network (test/helpers/teacher.ts) whose hidden-neuron count is known from its
 * construction: 10 neurons for data A, 12 for data B. `baseline` on A scans every width from
 * min-width; `check` on the same data then decides only the baseline's width and the one below,
 * and must give the same width with at least 3× fewer trainings; `check` on B, against A's
 * baseline, must step up to B's full-scan width.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { removeCliTempDirs, runCli } from '../helpers/cli.js';
import { TEACHER_CASE, teacherConfigYaml, teacherCsv } from '../helpers/teacher.js';

interface Figures {
  width: number | null;
  trainings: number;
  from: string;
  decided: number[];
  verdict: string;
}

function figures(reportText: string): Figures {
  const r = JSON.parse(reportText) as {
    width: number | null;
    verdict: string;
    search: { trainings: number; start: { from: string; decided: number[] } };
  };
  return {
    width: r.width,
    trainings: r.search.trainings,
    from: r.search.start.from,
    decided: r.search.start.decided,
    verdict: r.verdict,
  };
}

const files = {
  'a.yml': teacherConfigYaml('a.csv'),
  'b.yml': teacherConfigYaml('b.csv'),
  'a.csv': teacherCsv(TEACHER_CASE.a),
  'b.csv': teacherCsv(TEACHER_CASE.b),
};
const opts = { timeoutMs: 180_000 };

describe('search.start: baseline, on teacher-network data', () => {
  let fullA: Figures;
  let fullB: Figures;
  let baseline: string;

  beforeAll(async () => {
    // The full scans: no baseline yet, so growth walks up from min-width.
    const base = await runCli(['baseline', '--config', 'a.yml'], { files, ...opts });
    expect(base.code, base.stderr).toBe(0);
    baseline = base.read('neuron-budget.baseline.json');
    const a = await runCli(['check', '--config', 'a.yml', '--report', 'r.json'], { files, ...opts });
    expect(a.code, a.stderr).toBe(0);
    fullA = figures(a.read('r.json'));
    const b = await runCli(['check', '--config', 'b.yml', '--report', 'r.json'], { files, ...opts });
    expect(b.code, b.stderr).toBe(0);
    fullB = figures(b.read('r.json'));
  }, 600_000);
  afterAll(removeCliTempDirs);

  it('the full scan finds about the teacher’s neurons, and two more for the wider teacher', () => {
    expect(fullA.from).toBe('min-width');
    expect(fullA.width).toBeGreaterThanOrEqual(TEACHER_CASE.widthA - 1);
    expect(fullA.width).toBeLessThanOrEqual(TEACHER_CASE.widthA + 1);
    expect(fullB.width! - fullA.width!).toBeGreaterThanOrEqual(1);
    expect(fullB.width! - fullA.width!).toBeLessThanOrEqual(3);
    expect(JSON.parse(baseline).result.width).toBe(fullA.width);
  });

  it('check on the same data gives the same width with at least 3× fewer trainings', async () => {
    const run = await runCli(['check', '--config', 'a.yml', '--report', 'r.json'], {
      files: { ...files, 'neuron-budget.baseline.json': baseline },
      ...opts,
    });
    expect(run.code, run.stderr).toBe(0);
    const f = figures(run.read('r.json'));
    expect(f.verdict).toBe('pass');
    expect(f.from).toBe('baseline');
    expect(f.width).toBe(fullA.width);
    expect(f.decided).toEqual([fullA.width! - 1, fullA.width]);
    expect(fullA.trainings / f.trainings).toBeGreaterThanOrEqual(3);
  }, 300_000);

  it('check on data that needs more neurons steps up to the full scan’s width', async () => {
    const run = await runCli(['check', '--config', 'b.yml', '--report', 'r.json'], {
      files: { ...files, 'neuron-budget.baseline.json': baseline },
      ...opts,
    });
    const f = figures(run.read('r.json'));
    expect(f.from).toBe('baseline');
    expect(f.width).toBe(fullB.width);
    expect(f.decided[0]).toBe(fullA.width);
    expect(f.decided[f.decided.length - 1]).toBe(fullB.width);
    expect(f.trainings).toBeLessThan(fullB.trainings);
    // gate.allowed-growth is 0 by default: any growth over the baseline fails the gate.
    expect(f.verdict).toBe('fail');
    expect(run.code).toBe(1);
  }, 300_000);
});
