/**
 * Every Mermaid block the comment can carry goes through the mermaid package's own parser
 * (mermaid, a general-purpose reference library; see test/helpers/mermaid.ts). GitHub shows a
 * block that does not parse as an error box where the chart should be, so a chart that only
 * looks right to our own regexes is not enough.
 *
 * The reports are built for each kind of result the renderer words differently: found (first
 * run and against a baseline), not found, inconclusive, improved, a single width, a regression
 * task, a long history with more widths than a chart shows, extreme numbers read from a
 * baseline file, and the demo's failing case. Whatever renderMarkdown emits for them is
 * parsed, so the test follows the renderer's layout without knowing it.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateGate } from '../../src/gate/index.js';
import { nextBaseline } from '../../src/gate/baseline.js';
import type { Baseline } from '../../src/gate/types.js';
import { renderMarkdown, withGate } from '../../src/report/index.js';
import type { Report } from '../../src/report/types.js';
import type { DataProfile } from '../../src/data/types.js';
import type { SearchResult } from '../../src/search/types.js';
import type { Config } from '../../src/config/types.js';
import { config, dataReport, found, inconclusive, loaded, notFound, profile, width } from '../gate/build.js';
import { mermaidBlocks, parseMermaid } from '../helpers/mermaid.js';

function gated(result: SearchResult, baseline: Baseline | null, p: DataProfile = profile(), cfg = config()): Report {
  const outcome = evaluateGate({ result, loaded: loaded(p, 'b'.repeat(64)), config: cfg, baseline });
  return withGate(dataReport(result, cfg, p, 'b'.repeat(64)), outcome, cfg.gate);
}

/** Accepted baselines, one per entry of `widths` (each a found result of that width), oldest first. */
function baselines(results: SearchResult[], cfg: Config = config(), p: DataProfile = profile()): Baseline {
  let b: Baseline | null = null;
  results.forEach((result, k) => {
    b = nextBaseline(
      b,
      { result, loaded: loaded(p), config: cfg },
      { date: new Date(Date.UTC(2026, 0, 1, 0, k)), commit: null, toolVersion: '0.1.0' },
    );
  });
  return b!;
}

function regressionCase(): Report {
  // Invented pump-vibration regression: predict bearing temperature, rmse at most 0.5 (degrees).
  const cfg = config({
    data: { task: 'regression', target: 'bearing_temp' },
    target: { metric: 'rmse', threshold: 0.5 },
  });
  const p = profile({
    classes: null,
    columns: ['pump_model', 'rms_velocity', 'kurtosis', 'band_1x', 'bearing_temp'],
  });
  const curve = (last: number): SearchResult => {
    const r = found(last, 0.42);
    const rmse = [2.1, 1.3, 0.81, 0.47, 0.42, 0.4];
    r.widths = r.widths.map((w, i) => width(w.width, w.width === last ? 4 : 0, 10, rmse[i]));
    return r;
  };
  return gated(curve(5), baselines([curve(4)], cfg, p), p, cfg);
}

function longHistoryCase(): Report {
  // 120 accepted baselines (the file keeps the newest 100) and 40 widths: more than a chart shows.
  const cfg = config({ search: { maxWidth: 64 }, gate: { maxWidth: 48, allowedGrowth: 2 } });
  const history = Array.from({ length: 120 }, (_, k) => found(20 + Math.floor(k / 8), 0.96));
  const now = found(40, 0.961);
  now.widths = Array.from({ length: 40 }, (_, i) => width(i + 1, i === 39 ? 5 : 0, 10, 0.5 + i / 82));
  return gated(now, baselines(history, cfg), profile({ rows: 4000 }), cfg);
}

function extremeNumbersCase(): Report {
  // A baseline file is the repository's to write: any finite number may come back from it.
  const b = structuredClone(baselines([found(3, 0.96), found(4, 0.96)]));
  b.result.width = 1e21;
  b.result.metric.value = -Number.MAX_VALUE;
  b.widths = [
    { width: 1e21, restarts: 2 ** 53 + 2, met: 0, adequate: false, best: Number.MAX_VALUE },
    { width: 2 ** 53 + 2, restarts: 10, met: 0, adequate: false, best: Number.MIN_VALUE },
  ];
  b.history = b.history.map((h, i) => ({ ...h, width: i === 0 ? Number.MAX_VALUE : 1e21 }));
  return gated(found(4, 0.96), b);
}

function demoFailCase(): Report {
  const fixture = new URL('./fixtures/demo-fail.report.json', import.meta.url);
  return JSON.parse(readFileSync(fixture, 'utf8')) as Report;
}

const CASES: [string, () => Report][] = [
  ['found, first run (no baseline)', () => gated(found(5, 0.96), null)],
  ['found, same width as the baseline', () => gated(found(5, 0.96), baselines([found(5, 0.97)]))],
  ['not found', () => gated(notFound(16), baselines([found(4, 0.96)]))],
  ['inconclusive', () => gated(inconclusive(), baselines([found(3, 0.96)]))],
  ['improved', () => gated(found(4, 0.97), baselines([found(5, 0.96), found(6, 0.96)]))],
  [
    'single width',
    () => {
      const cfg = config({ search: { minWidth: 1, maxWidth: 1 } });
      return gated(found(1, 0.97), baselines([found(1, 0.96)], cfg), profile(), cfg);
    },
  ],
  ['regression task', regressionCase],
  ['long history and more widths than a chart shows', longHistoryCase],
  ['extreme numbers from the baseline file', extremeNumbersCase],
  ['the demo failing case (docs/example-comment.md)', demoFailCase],
];

describe('Mermaid blocks of the comment, through mermaid.parse', () => {
  it.each(CASES)('%s', async (_name, build) => {
    const md = renderMarkdown(build());
    const blocks = mermaidBlocks(md);
    // Every case has a per-width curve, so every comment carries at least one chart.
    expect(blocks.length).toBeGreaterThan(0);
    // The extractor saw every fence that opens a mermaid block.
    expect(blocks.length).toBe((md.match(/(`{3,}|~{3,})[ \t]*mermaid/g) ?? []).length);
    for (const block of blocks) {
      const parsed = await parseMermaid(block);
      expect(parsed, block).toMatchObject({ ok: true });
      if (!parsed.ok || parsed.chart === null) continue;
      const { categories, plots } = parsed.chart;
      expect(plots.length, block).toBeGreaterThan(0);
      for (const plot of plots) {
        // mermaid drops values beyond the categories and draws a missing one as a broken path.
        if (categories !== null) expect(plot.values.length, block).toBe(categories.length);
        for (const v of plot.values) expect(Number.isFinite(v), `${String(v)} in\n${block}`).toBe(true);
      }
    }
  });
});

describe('the harness can fail', () => {
  const good = [
    'xychart-beta',
    '  title "Control chart"',
    '  x-axis "hidden neurons" ["1", "2", "3"]',
    '  y-axis "accuracy" 0.5 --> 1',
    '  bar [0.61, 0.83, 0.97]',
    '  line [0.95, 0.95, 0.95]',
  ].join('\n');

  it('parses a hand-written block and reads back its categories and values', async () => {
    const parsed = await parseMermaid(good);
    expect(parsed).toEqual({
      ok: true,
      diagramType: 'xychart',
      chart: {
        categories: ['1', '2', '3'],
        yRange: [0.5, 1],
        plots: [
          { type: 'bar', values: [0.61, 0.83, 0.97] },
          { type: 'line', values: [0.95, 0.95, 0.95] },
        ],
      },
    });
  });

  it.each([
    ['a word among the numbers', good.replace('0.83', 'n/a')],
    ['an unclosed category list', good.replace('"3"]', '"3"')],
    ['an exponent, which the grammar has no token for', good.replace('0.97', '9.7e-1')],
    ['an unterminated title', good.replace('"Control chart"', '"Control chart')],
    ['an unknown diagram type', good.replace('xychart-beta', 'capacity-chart')],
  ])('rejects a block with %s', async (_name, broken) => {
    const parsed = await parseMermaid(broken);
    expect(parsed.ok).toBe(false);
  });

  it('rejects a broken copy of a block the renderer emits', async () => {
    const [block] = mermaidBlocks(renderMarkdown(gated(found(5, 0.96), null)));
    expect((await parseMermaid(block)).ok).toBe(true);
    const broken = block.replace(/ bar \[([^\]]*)\]/, ' bar [$1, oops]');
    expect(broken).not.toBe(block);
    expect((await parseMermaid(broken)).ok).toBe(false);
  });

  it('finds blocks under any fence CommonMark allows, and refuses an unclosed one', () => {
    const md = ['```mermaid', 'a', '```', '', '~~~~ mermaid', 'b', '```', '~~~~', '```js', 'c', '```'].join('\n');
    expect(mermaidBlocks(md)).toEqual(['a', 'b\n```']);
    expect(() => mermaidBlocks('text\n```mermaid\nxychart-beta\n')).toThrow(/line 2 is never closed/);
  });
});
