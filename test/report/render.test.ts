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

/** The verdict and the three answers: everything before the first collapsed block. */
function answers(md: string): string {
  return md.slice(0, md.indexOf('<details>'));
}

/** Chart categories and series values, by the line that holds them. */
function chartParts(block: string): { categories: string[]; bars: string[][]; line: string[] | null } {
  const categories = JSON.parse(`[${block.match(/x-axis "[^"]*" \[(.*)\]/)![1]}]`) as string[];
  const bars = [...block.matchAll(/ {2}bar \[(.*)\]/g)].map((m) => m[1].split(', '));
  const line = block.match(/ {2}line \[(.*)\]/)?.[1].split(', ') ?? null;
  return { categories, bars, line };
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
      maxFlashBytes: null,
      maxRamBytes: null,
      maxMacs: null,
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
  it('leads with the verdict, then answers: needs, fits the device, why it changed; evidence after', () => {
    const md = renderMarkdown(gated(found(9, 0.96), null));
    const lines = md.split('\n');
    expect(lines[0]).toBe('### neuron-budget: FAIL. Needs 9 hidden neurons; the device budget is 8.');
    const head = answers(md);
    const order = [
      '**Needs:** 9 hidden neurons.',
      '**Fits the device:** No: 1 hidden neuron over the budget of 8.',
      '**Why it changed:** No baseline',
    ];
    const at = order.map((s) => head.indexOf(s));
    expect(
      at.every((i) => i > 0),
      JSON.stringify(at),
    ).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    expect(head).toContain('The witness scores accuracy 0.96 on 360 judging rows (target: at least 0.95).');
    expect(head).toContain('| hidden neurons | **9** | 8 (over by 1) |');
    expect(head).not.toContain('| Baseline | This change |');
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
    const [block] = mermaidBlocks(md);
    const { categories, bars, line } = chartParts(block);
    expect(bars).toHaveLength(2);
    expect(new Set(line)).toEqual(new Set(['0.95']));
    // Where a side has no bar, its value sits below the axis, so mermaid draws none.
    const floor = bars[0][0];
    expect(Number(floor)).toBeLessThan(Number(block.match(/y-axis "[^"]*" (\S+) -->/)![1]));
    const table = md.slice(md.indexOf('| Width |')).split('\n');
    const cellOf = (w: number, column: number): string => {
      const row = table.find((l) => new RegExp(`^\\| (\\*\\*)?${w}(\\*\\*)? \\|`).test(l))!;
      return row.split(' | ')[column].trim().replace(/ \|$/, '');
    };
    let checked = 0;
    categories.forEach((c, i) => {
      if (i === 0 || i === categories.length - 1) {
        // The pads: the widths just outside the range (blank for 0), with no bar.
        expect(c).toBe(i === 0 ? ' ' : '7');
        expect(bars.every((b) => b[i] === floor)).toBe(true);
        return;
      }
      const m = /^(b?)(\d+)( min)?$/.exec(c)!;
      const [baseBar, nowBar] = bars;
      if (m[1] === 'b') {
        expect(nowBar[i]).toBe(floor);
        expect(baseBar[i], c).toBe(cellOf(Number(m[2]), 6).replace('—', floor));
      } else {
        expect(baseBar[i]).toBe(floor);
        expect(nowBar[i], c).toBe(cellOf(Number(m[2]), 2).replace('—', floor));
      }
      checked++;
    });
    expect(checked).toBe(12);
    expect(categories).toContain('6 min');
    expect(categories).toContain('b3 min');
  });

  it('draws the threshold across the whole range, also with a single width, and states the axis', () => {
    const r = found(1, 0.97);
    const md = renderMarkdown(gated(r, null));
    const { categories, bars, line } = chartParts(mermaidBlocks(md)[0]);
    expect(categories).toEqual([' ', '1 min', '2']);
    expect(line).toEqual(['0.95', '0.95', '0.95']);
    expect(bars[0][1]).toBe('0.97');
    expect(md).toMatch(/The y-axis runs from 0\.9 to 1, not from 0/);
  });

  it('answers for a search that found nothing or ran out of budget, with nothing to accept', () => {
    const none = renderMarkdown(gated(notFound(16), null));
    expect(answers(none)).toContain(
      '**Needs:** No width in the search range is adequate (3 of its networks meeting accuracy of at least 0.95).',
    );
    expect(answers(none)).toContain('**Fits the device:** Nothing to cost: no width is adequate.');
    expect(none).not.toContain('accept it');
    expect(none).not.toContain('To record this result');
    const md = renderMarkdown(gated(inconclusive(), null));
    expect(md.split('\n')[0]).toMatch(/^### neuron-budget: INCONCLUSIVE\. The search ran out of budget/);
    expect(answers(md)).toContain('**Needs:** Not settled: the search stopped before it could decide.');
    expect(md).not.toContain('To record this result');
  });

  it('says how to record the baseline, and that a pass is not a safety sign-off', () => {
    const md = renderMarkdown(gated(found(5, 0.96), null));
    expect(md).toContain(
      'To record this result as the baseline: run `neuron-budget baseline` and commit neuron-budget.baseline.json.',
    );
    expect(md).toContain('A passing gate is not a safety sign-off for a device.');
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
    expect(drift).toContain(
      'x-axis "accepted baseline" [" ", "1", "2", "3", "4", "5", "6", "7", "8", "9", "10", "now", "later"]',
    );
    expect(drift).toContain(`bar [0, ${[...widths, 7].join(', ')}, 0]`);
    expect(drift).toContain('line [8, 8, 8, 8, 8, 8, 8, 8, 8, 8, 8, 8, 8]');
    // The history table lists the same ten entries with their rows.
    const history = md.slice(md.indexOf('Capacity drift: 10 accepted baselines'));
    for (let k = 0; k < 10; k++)
      expect(history).toContain(
        `| ${k + 1} | 2026-01-${String(k + 1).padStart(2, '0')} | — | ${(1000 + 100 * k).toLocaleString('en-US')} | ${widths[k]} |`,
      );
    expect(renderText(r)).toContain('width 2 -> 2 -> 3 -> 3 -> 3 -> 4 -> 4 -> 5 -> 5 -> 6 -> now 7 (budget 8)');
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
    // The verdict, the answers and the charts are exactly those of the unshortened comment.
    expect(answers(md)).toBe(answers(full));
    expect(mermaidBlocks(md)).toEqual(mermaidBlocks(full));
    expect(answers(md)).toContain('| hidden neurons | **1,500** | 8 (over by 1,492) | 900 |');
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
    expect(text).toContain('Needs: 9 hidden neurons (the baseline needed 4). The witness scores accuracy');
    expect(text).toMatch(/\n {2}hidden neurons +9 +8 \(over by 1\) +4\n/);
    expect(text).toContain('Rows 1,800 → 2,400 (+600).');
    expect(text).toContain('pruning: tried 2 removals on 2 networks: 1 removed, 1 put back.');
    // The same answers, word for word, as the comment (which has no repository string here to escape).
    const md = renderMarkdown(r);
    const flat = (s: string): string => s.replace(/\s+/g, ' ');
    for (const answer of ['Needs', 'Fits the device', 'Why it changed']) {
      const said = flat(md).match(new RegExp(`\\*\\*${answer}:\\*\\* (.*?) (\\*\\*|\\| |<details>)`))![1];
      expect(flat(text), answer).toContain(`${answer}: ${said}`);
    }
  });
});

describe('charts: edge cases', () => {
  it('leaves a width whose restarts all diverged out of the chart but keeps it in the table', () => {
    const r = found(4, 0.96);
    r.widths[1] = { ...r.widths[1], best: null, decisive: null, median: null, diverged: 10 };
    const md = renderMarkdown(gated(r, null));
    const { categories, bars } = chartParts(mermaidBlocks(md)[0]);
    expect(categories).toEqual([' ', '1', '2', '3', '4 min', '5']);
    expect(Number(bars[0][2])).toBeLessThan(Number(mermaidBlocks(md)[0].match(/y-axis "[^"]*" (\S+) -->/)![1]));
    expect(md).toMatch(/\n\| 2 \| 0 of 10 \| — \| — \| no \|/);
  });

  it('never draws a collapsed y-axis when every value is 1', () => {
    const r = found(2, 1);
    r.widths = r.widths.map((w) => ({ ...w, best: 1, decisive: 1 }));
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
