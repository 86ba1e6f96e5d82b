import { describe, expect, it } from 'vitest';
import { evaluateGate } from '../../src/gate/index.js';
import { nextBaseline } from '../../src/gate/baseline.js';
import type { Baseline } from '../../src/gate/types.js';
import { COMMENT_LIMIT, renderMarkdown, renderText, TEXT_WIDTH, withGate } from '../../src/report/index.js';
import type { Report } from '../../src/report/types.js';
import type { DataProfile } from '../../src/data/types.js';
import type { PruneStep } from '../../src/search/types.js';
import { config, dataReport, found, inconclusive, loaded, notFound, profile, width } from '../gate/build.js';

/** GitHub's limit on a comment body. */
const GITHUB_LIMIT = 65_536;

function gated(
  result: ReturnType<typeof found>,
  baseline: Baseline | null,
  p: DataProfile = profile(),
  cfg = config(),
): Report {
  const outcome = evaluateGate({ result, loaded: loaded(p, 'b'.repeat(64)), config: cfg, baseline });
  return withGate(dataReport(result, cfg, p, 'b'.repeat(64)), outcome, cfg.gate);
}

function headAndTable(md: string): string {
  return md.slice(0, md.indexOf('#### '));
}

function mermaidBlocks(md: string): string[] {
  return md.match(/```mermaid\n[\s\S]*?\n```/g) ?? [];
}

describe('JSON report (withGate)', () => {
  it('fills verdict, reasons, baseline, gate settings and changes, and survives JSON', () => {
    const base = nextBaseline(
      null,
      { result: found(4, 0.96), loaded: loaded(), config: config() },
      {
        date: new Date('2026-02-01T00:00:00.000Z'),
        commit: 'abcdef0',
        toolVersion: '0.1.0',
      },
    );
    const r = gated(found(5, 0.97), base, profile({ rows: 2000 }));
    expect(r.verdict).toBe('fail');
    expect(r.reasons[0]).toBe("Needs 5 hidden neurons, 1 more than the baseline's 4; no growth is allowed.");
    expect(r.baseline).toMatchObject({
      width: 4,
      metric: 0.96,
      met: 4,
      restarts: 10,
      rows: 1800,
      sameSettings: true,
    });
    expect(r.baseline!.history).toHaveLength(1);
    expect(r.gate).toEqual({
      maxWidth: 8,
      allowedGrowth: 0,
      metricTolerance: 0.02,
      baselineFile: 'neuron-budget.baseline.json',
    });
    expect(r.changes!.rows).toEqual({ before: 1800, after: 2000 });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
  });

  it('is identical for identical inputs outside timing', () => {
    const a = gated({ ...found(5, 0.96), timing: { searchSeconds: 1, growthSeconds: 1, pruneSeconds: 0 } }, null);
    const b = gated({ ...found(5, 0.96), timing: { searchSeconds: 9, growthSeconds: 8, pruneSeconds: 1 } }, null);
    expect({ ...a, timing: null }).toEqual({ ...b, timing: null });
  });

  it('has no baseline or changes for a first run', () => {
    const r = gated(found(5, 0.96), null);
    expect(r.verdict).toBe('new');
    expect(r.baseline).toBeNull();
    expect(r.changes).toBeNull();
  });
});

describe('comment', () => {
  it('starts with the verdict and the main reason, then the baseline-vs-change table', () => {
    const md = renderMarkdown(gated(found(9, 0.96), null));
    const lines = md.split('\n');
    expect(lines[0]).toBe('### neuron-budget: FAIL. Needs 9 hidden neurons; the device budget is 8&#46;');
    expect(md).toContain('| Smallest adequate width | — | **9** |');
    expect(md).toContain('| Accuracy at that width (network kept) | — | 0.96 |');
    expect(md).toContain('| Networks meeting the target there | — | 4 |');
    expect(md).toContain('| Data rows | — | 1,800 |');
    expect(md).toContain('| Search time | — | 12.5 s |');
  });

  it('shows every chart number in the per-width table too (a chart that fails to render loses nothing)', () => {
    const base = nextBaseline(
      null,
      { result: found(3, 0.97), loaded: loaded(), config: config() },
      {
        date: new Date('2026-02-01T00:00:00.000Z'),
        commit: null,
        toolVersion: '0.1.0',
      },
    );
    const md = renderMarkdown(gated(found(6, 0.96), base));
    const details = md.slice(md.indexOf('<summary>Per-width results'));
    const [current, baseline] = mermaidBlocks(md);
    for (const [block, column] of [
      [current, 1],
      [baseline, 4],
    ] as const) {
      const widths = block
        .match(/x-axis "[^"]*" \[(.*)\]/)![1]
        .split(', ')
        .map((s) => Number(s.replace(/"/g, '')));
      const values = block.match(/ {2}bar \[(.*)\]/)![1].split(', ');
      widths.forEach((w, i) => {
        const row = details
          .split('\n')
          .find((l) => new RegExp(`^\\| (\\*\\*)?${w}(\\*\\*)?( \\([a-z, ]+\\))? \\|`).test(l))!;
        expect(row.split(' | ')[column].trim(), `width ${w}`).toBe(values[i]);
      });
    }
  });

  it('words the table for a search that found nothing or ran out of budget', () => {
    expect(renderMarkdown(gated(notFound(16), null))).toContain('| Smallest adequate width | — | none in range |');
    const md = renderMarkdown(gated(inconclusive(), null));
    expect(md.split('\n')[0]).toMatch(/^### neuron-budget: INCONCLUSIVE\. The search ran out of budget/);
    expect(md).toContain('| Smallest adequate width | — | not settled |');
  });

  it('says how to refresh the baseline, and that a pass is not a safety sign-off', () => {
    const md = renderMarkdown(gated(found(5, 0.96), null));
    expect(md).toContain('run `neuron-budget baseline` and commit neuron&#45;budget&#46;baseline&#46;json');
    expect(md).toContain('`update-baseline: true`');
    expect(md).toContain('a passing gate is not a safety sign-off for a device');
  });

  it('puts a blank line after every </summary> so GitHub renders the Markdown inside', () => {
    const base = nextBaseline(
      null,
      { result: found(3, 0.97), loaded: loaded(), config: config() },
      {
        date: new Date('2026-02-01T00:00:00.000Z'),
        commit: null,
        toolVersion: '0.1.0',
      },
    );
    const md = renderMarkdown(gated({ ...found(6, 0.96), pruning: [step(6, 1)] }, base, profile({ rows: 1900 })));
    const count = md.split('</summary>').length - 1;
    expect(count).toBe(4);
    expect(md.split('</summary>\n\n').length - 1).toBe(count);
  });
});

describe('capacity drift', () => {
  it('ten successive baselines over growing data: the drift chart shows all ten in order, then this change', () => {
    let b: Baseline | null = null;
    const widths = [2, 2, 3, 3, 3, 4, 4, 5, 5, 6];
    widths.forEach((w, k) => {
      b = nextBaseline(
        b,
        { result: found(w, 0.96), loaded: loaded(profile({ rows: 1000 + 100 * k })), config: config() },
        {
          date: new Date(Date.UTC(2026, 0, k + 1)),
          commit: null,
          toolVersion: '0.1.0',
        },
      );
    });
    expect(b!.history).toHaveLength(10);
    const r = gated(found(7, 0.96), b, profile({ rows: 2100 }), config({ gate: { allowedGrowth: 1 } }));
    const md = renderMarkdown(r);
    const drift = mermaidBlocks(md).find((m) => m.includes('Smallest adequate width over time'))!;
    expect(drift).toContain('x-axis "accepted baseline" ["1", "2", "3", "4", "5", "6", "7", "8", "9", "10", "now"]');
    expect(drift).toContain(`bar [${[...widths, 7].join(', ')}]`);
    expect(drift).toContain('line [8, 8, 8, 8, 8, 8, 8, 8, 8, 8, 8]');
    // The history table lists the same ten entries with their rows.
    const history = md.slice(md.indexOf('Baseline history (10)'));
    for (let k = 0; k < 10; k++)
      expect(history).toContain(
        `| ${k + 1} | 2026&#45;01&#45;${String(k + 1).padStart(2, '0')} | — | ${(1000 + 100 * k).toLocaleString('en-US')} | ${widths[k]} |`,
      );
    expect(renderText(r)).toContain('width 2 -> 2 -> 3 -> 3 -> 3 -> 4 -> 4 -> 5 -> 5 -> 6 -> now 7');
  });
});

function step(w: number, i: number): PruneStep {
  const accepted = i % 2 === 0;
  return {
    source: { width: w, restart: i % 10 },
    width: w,
    neuron: i % w,
    steeringBefore: 0.96,
    steeringAfter: 0.95,
    accepted,
    judged: accepted ? 0.95 : null,
  };
}

describe('length cap', () => {
  it('a huge per-width table, history, pruning and data-change list stay under the limit with headline and table intact', () => {
    const base = nextBaseline(
      null,
      { result: found(900, 0.96), loaded: loaded(), config: config({ search: { maxWidth: 2000 } }) },
      {
        date: new Date('2026-02-01T00:00:00.000Z'),
        commit: null,
        toolVersion: '0.1.0',
      },
    );
    let b: Baseline = base;
    for (let k = 0; k < 120; k++) {
      b = nextBaseline(
        b,
        { result: found(900, 0.96), loaded: loaded(), config: config({ search: { maxWidth: 2000 } }) },
        {
          date: new Date(Date.UTC(2026, 1, 1, 0, k)),
          commit: 'deadbeef'.repeat(5),
          toolVersion: '0.1.0',
        },
      );
    }
    const result = found(1500, 0.96);
    result.widths = Array.from({ length: 1500 }, (_, i) => width(i + 1, i === 1499 ? 5 : 0, 10, 0.5 + i / 3100));
    result.pruning = Array.from({ length: 5000 }, (_, i) => step(1500, i));
    const names = Array.from({ length: 3000 }, (_, i) => `vibration_band_${i}_${'x'.repeat(60)}`);
    const after = profile({
      rows: 900_000,
      columns: [...profile().columns, ...names],
      classes: Object.fromEntries(names.map((n) => [n, 300])),
    });
    const cfg = config({ search: { maxWidth: 2000 } });
    const report = gated(result, b, after, cfg);
    const full = renderMarkdown(report, { limit: Infinity });
    expect(full.length).toBeGreaterThan(GITHUB_LIMIT);
    const md = renderMarkdown(report);
    expect(md.length).toBeLessThanOrEqual(COMMENT_LIMIT);
    expect(COMMENT_LIMIT).toBeLessThan(GITHUB_LIMIT);
    // Headline, table and charts are exactly those of the unshortened comment.
    expect(headAndTable(md)).toBe(headAndTable(full));
    expect(mermaidBlocks(md)).toEqual(mermaidBlocks(full));
    expect(md).toContain('| Smallest adequate width | 900 | **1500** |');
    expect(md).toMatch(/left out for length/);
    expect(md.trimEnd().endsWith('not a safety sign-off for a device._')).toBe(true);
  });
});

describe('terminal text', () => {
  it('fits 80 columns and carries the same facts as the comment', () => {
    const base = nextBaseline(
      null,
      { result: found(4, 0.9622), loaded: loaded(), config: config() },
      {
        date: new Date('2026-02-01T00:00:00.000Z'),
        commit: null,
        toolVersion: '0.1.0',
      },
    );
    const r = gated({ ...found(9, 0.9583), pruning: [step(10, 1), step(9, 2)] }, base, profile({ rows: 2400 }));
    const text = renderText(r);
    for (const line of text.split('\n')) expect(line.length, line).toBeLessThanOrEqual(TEXT_WIDTH);
    expect(text.split('\n')[0]).toBe('neuron-budget: FAIL. Needs 9 hidden neurons; the device budget is 8.');
    expect(text).toContain("  - Needs 9 hidden neurons, 5 more than the baseline's 4; no growth is allowed.");
    expect(text).toMatch(/smallest adequate width +4 +9\n/);
    expect(text).toMatch(/accuracy at that width +0\.9622 +0\.9583\n/);
    expect(text).toMatch(/data rows +1,800 +2,400 \(\+600\)\n/);
    expect(text).toContain('rows 1,800 -> 2,400 (+600)');
    expect(text).toContain('pruning: 2 steps, 1 neuron removed');
  });
});

describe('charts: edge cases', () => {
  it('leaves a width whose restarts all diverged out of the chart but keeps it in the table', () => {
    const r = found(4, 0.96);
    r.widths[1] = { ...r.widths[1], best: null, median: null, diverged: 10 };
    const md = renderMarkdown(gated(r, null));
    const [chart] = mermaidBlocks(md);
    expect(chart).toContain('x-axis "hidden neurons" ["1", "3", "4"]');
    expect(md).toMatch(/\n\| 2 \| — \| 0 \|/);
  });

  it('never draws a collapsed y-axis when every value is 1', () => {
    const r = found(2, 1);
    r.widths = r.widths.map((w) => ({ ...w, best: 1 }));
    const md = renderMarkdown(gated(r, null, profile(), config({ target: { threshold: 1 } })));
    expect(mermaidBlocks(md)[0]).toContain('y-axis "accuracy" 0.9 --> 1');
  });
});

describe('footer over the device budget', () => {
  it('says a new baseline does not lift the device budget, only when the width exceeds it', () => {
    const over = renderMarkdown(gated(found(9, 0.96), null));
    expect(over).toContain('A new baseline does not lift the device budget');
    expect(renderText(gated(found(9, 0.96), null))).toContain('A new baseline does not lift the device budget');
    expect(renderMarkdown(gated(found(8, 0.96), null))).not.toContain('does not lift the device budget');
  });
});
