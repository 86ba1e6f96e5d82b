/**
 * One set of words on every screen: the same width, backing and counts in the JSON, the comment
 * and the terminal; hints that fit the run; one word per outcome; one numbering; one minus sign.
 * Inputs are invented (test/gate/build.ts).
 */
import { describe, expect, it } from 'vitest';
import { evaluateGate } from '../../src/gate/index.js';
import { nextBaseline } from '../../src/gate/baseline.js';
import type { Baseline } from '../../src/gate/types.js';
import { formatDelta } from '../../src/common/format.js';
import { renderMarkdown, renderText, withGate, type RenderContext } from '../../src/report/index.js';
import type { Report } from '../../src/report/types.js';
import type { DataProfile } from '../../src/data/types.js';
import type { SearchResult } from '../../src/search/types.js';
import { config, dataReport, found, loaded, notFound, profile } from '../gate/build.js';

/** The report for `result` on data profiled as `p` (a different profile has a different fingerprint). */
function gated(result: SearchResult, baseline: Baseline | null, p: DataProfile = profile()): Report {
  const cfg = config();
  const fingerprint = p.rows === profile().rows ? 'b'.repeat(64) : 'c'.repeat(64);
  const outcome = evaluateGate({ result, loaded: loaded(p, fingerprint), config: cfg, baseline });
  return withGate(dataReport(result, cfg, p, fingerprint), outcome, cfg.gate);
}

function baselineOf(result: SearchResult, p: DataProfile = profile()): Baseline {
  return nextBaseline(
    null,
    { result, loaded: loaded(p, 'b'.repeat(64)), config: config() },
    { date: new Date('2026-02-01T00:00:00.000Z'), commit: null, toolVersion: '0.1.0' },
  );
}

/** Width 7 backed only by three networks pruned down from width 8 (growth stopped at 8). */
function prunedHeadline(): SearchResult {
  const r = found(8, 0.962);
  r.width = 7;
  r.grownWidth = 8;
  r.metric = 0.9571;
  r.widths[6] = {
    ...r.widths[6],
    met: 3,
    metBy: { fresh: 0, pruned: 3 },
    adequate: true,
    best: 0.9571,
    decisive: 0.951,
  };
  return r;
}

const flat = (s: string): string => s.replace(/\s+/g, ' ');
const cli = (over: Partial<RenderContext> = {}): RenderContext => ({
  surface: 'cli',
  mode: 'check',
  configShown: null,
  baselineFile: null,
  baseline: null,
  ...over,
});

describe('a headline that comes from pruning', () => {
  const report = gated(prunedHeadline(), null);
  const json = JSON.parse(JSON.stringify(report)) as Report;
  const md = flat(renderMarkdown(report));
  const text = flat(renderText(report));
  const backing =
    '3 networks of width 7 met the target on the judging rows (0 of 10 fresh restarts, 3 pruned from wider networks); 3 are required.';

  it('is the same width, met count and backing in the JSON, the comment and the terminal', () => {
    expect(json.width).toBe(7);
    const at = json.search!.widths.find((w) => w.width === 7)!;
    expect(at).toMatchObject({ met: 3, adequate: true, metBy: { fresh: 0, pruned: 3 } });
    expect(json.search!.widths.find((w) => w.adequate)!.width).toBe(json.width);
    for (const screen of [md, text]) {
      expect(screen).toContain('Needs 7 hidden neurons');
      expect(screen).toContain(backing);
    }
    expect(md).toContain('| **7** | 0 of 10 + 3 pruned | 0.951 | 0.9571 | yes |');
  });

  it('never says that no network reached the target', () => {
    for (const screen of [md, text]) expect(screen).not.toMatch(/no network (reached|met) the target/i);
  });
});

describe('hints that fit the run', () => {
  it('gives the command with the config the user named, and the file to commit', () => {
    const r = gated(found(5, 0.96), null);
    const context = cli({ configShown: 'ml/pumps.yml', baselineFile: 'ml/pumps.baseline.json' });
    expect(flat(renderText(r, context))).toContain(
      'To record this result as the baseline: run neuron-budget baseline --config ml/pumps.yml and commit ml/pumps.baseline.json.',
    );
    expect(renderMarkdown(r, { context: { ...context, surface: 'action' } })).toContain(
      'run the action with `update-baseline: true`, or run `neuron-budget baseline --config ml/pumps.yml` and commit ml/pumps.baseline.json.',
    );
  });

  it('says what the baseline command wrote, and gives no advice to write it again', () => {
    const r = gated(found(5, 0.96), null);
    const written = cli({
      mode: 'baseline',
      baseline: { file: 'neuron-budget.baseline.json', width: 5, historyEntries: 4 },
    });
    const text = flat(renderText(r, written));
    expect(text).toContain('Baseline written: neuron-budget.baseline.json, width 5, 4 history entries.');
    expect(text).not.toContain('neuron-budget baseline');
    const notWritten = cli({ mode: 'baseline', baseline: { notWritten: 'no width reached the target' } });
    const none = flat(renderText(gated(notFound(12), null), notWritten));
    expect(none).toContain('Baseline not written: no width reached the target.');
    expect(none).not.toContain('To record this result');
  });

  it('says nothing about accepting when the baseline is already this result, or when there is none to accept', () => {
    const result = found(5, 0.96);
    const same = gated(result, baselineOf(result));
    expect(same.verdict).toBe('pass');
    expect(flat(renderText(same, cli()))).not.toMatch(/accept it|record this result/);
    expect(renderMarkdown(same)).not.toMatch(/accept it|record this result/);
    const changed = gated(result, baselineOf(result), profile({ rows: 2000 }));
    expect(flat(renderText(changed, cli()))).toContain('If this change is intended, accept it as the new baseline');
    expect(flat(renderText(gated(notFound(12), null), cli()))).not.toMatch(/accept it|record this result/);
  });
});

describe('one word per outcome, one numbering, one minus', () => {
  const pruned: SearchResult = {
    ...found(6, 0.96),
    pruning: [
      {
        source: { width: 6, restart: 0 },
        width: 6,
        neuron: 2,
        steeringBefore: 0.96,
        steeringAfter: 0.955,
        accepted: true,
        judged: 0.953,
      },
      {
        source: { width: 6, restart: 0 },
        width: 5,
        neuron: 1,
        steeringBefore: 0.955,
        steeringAfter: 0.91,
        accepted: false,
        judged: null,
      },
    ],
  };
  const report = gated(pruned, null);

  it('counts restarts from 1 in the JSON and on every screen; removals are "removed" or "put back"', () => {
    expect(report.search!.pruning[0].source.restart).toBe(1);
    const md = renderMarkdown(report);
    expect(md).toContain('| 6 | 1 | 6 | 2 | 0.96 | 0.955 | removed |');
    expect(md).toContain('| 6 | 1 | 5 | 1 | 0.955 | 0.91 | put back |');
    expect(md).not.toMatch(/kept \(needed\)|\(needed\)/);
    expect(flat(renderText(report))).toContain('pruning: tried 2 removals on 1 network: 1 removed, 1 put back.');
  });

  it('prints the "> marks" note only under a table with a marked row', () => {
    expect(renderText(report)).toContain("> marks this change's smallest adequate width");
    expect(renderText(gated(notFound(6), null))).not.toContain('> marks');
  });

  it('uses the ASCII minus in tables, lists and the terminal alike', () => {
    expect(formatDelta(-3)).toBe('-3');
    const shrunk = gated(found(5, 0.96), baselineOf(found(5, 0.96)), profile({ rows: 1700 }));
    const md = renderMarkdown(shrunk);
    expect(md).toContain('Rows 1,800 → 1,700 (-100).');
    expect(renderText(shrunk)).toContain('Rows 1,800 → 1,700 (-100).');
    expect(md + renderText(shrunk)).not.toContain('−');
  });
});
