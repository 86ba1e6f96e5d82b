import { describe, expect, it } from 'vitest';
import { progressLine, throttledProgress } from '../../src/report/progress.js';
import { annotationPath, toAnnotation, withinLimit } from '../../src/github/annotations.js';
import { UserError } from '../../src/common/errors.js';

describe('progress lines', () => {
  it('print the first event, then at most one per interval', () => {
    let t = 0;
    const lines: string[] = [];
    const on = throttledProgress(
      (l) => lines.push(l),
      5000,
      () => t,
    );
    const ev = { phase: 'growth' as const, kind: 'done' as const, width: 3, restart: 0, epoch: 10, best: 0.5 };
    on(ev);
    for (t = 100; t < 4900; t += 100) on({ ...ev, epoch: t });
    expect(lines).toHaveLength(1);
    t = 5000;
    on({ ...ev, epoch: 999, best: 0.91234567 });
    expect(lines).toEqual([progressLine(ev), 'growth: width 3, restart 1, epoch 999, best so far 0.9123']);
    expect(progressLine({ ...ev, best: null })).toContain('none yet');
  });

  it('print the start of a phase as the first line, before any training finished', () => {
    const lines: string[] = [];
    const on = throttledProgress(
      (l) => lines.push(l),
      5000,
      () => 0,
    );
    on({ phase: 'growth', kind: 'start', width: 2, restart: 0, epoch: 0, best: null });
    on({ phase: 'growth', kind: 'done', width: 2, restart: 0, epoch: 40, best: 0.7 });
    expect(lines).toEqual(['growth: starting at width 2']);
    expect(progressLine({ phase: 'prune', kind: 'start', width: 5, restart: 0, epoch: 0, best: null })).toBe(
      'prune: starting from width 5',
    );
  });

  it('format the best metric as every other screen does (formatMetric: 0.698, never 0.6980; 3.0934, never 3.093)', () => {
    const ev = { phase: 'growth' as const, kind: 'done' as const, width: 1, restart: 1, epoch: 200 };
    expect(progressLine({ ...ev, best: 0.698 })).toBe('growth: width 1, restart 2, epoch 200, best so far 0.698');
    expect(progressLine({ ...ev, best: 3.0934017 })).toBe('growth: width 1, restart 2, epoch 200, best so far 3.0934');
    expect(progressLine({ ...ev, best: 412.3456 })).toBe('growth: width 1, restart 2, epoch 200, best so far 412.35');
  });
});

describe('annotations', () => {
  it('name files relative to the repository root and keep line and column', () => {
    const e = new UserError('neuron-budget.yml:12:13: search.restarts: expected an integer', {
      file: 'models/neuron-budget.yml',
      line: 12,
      column: 13,
    });
    expect(toAnnotation(e, '/ws')).toEqual({
      message: e.message,
      file: 'models/neuron-budget.yml',
      startLine: 12,
      startColumn: 13,
    });
    expect(annotationPath('/ws/a/b.csv', '/ws')).toBe('a/b.csv');
    expect(annotationPath('/elsewhere/b.csv', '/ws')).toBe(undefined);
    expect(toAnnotation(new UserError('no file'), '/ws')).toEqual({ message: 'no file' });
  });
  // 10: the runner's limit of error annotations per step, as the GitHub Actions docs state it (from memory; the brief names it too).
  it('keep at most 10 and send the rest to the log', () => {
    const list = Array.from({ length: 13 }, (_, i) => ({ message: `e${i}` }));
    const { annotated, logged } = withinLimit(list);
    expect(annotated.map((a) => a.message)).toEqual(list.slice(0, 10).map((a) => a.message));
    expect(logged).toHaveLength(3);
  });
});
