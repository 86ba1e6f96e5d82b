/**
 * Strings from the repository (column names, class labels, categories, the data path,
 * setting values) must not become live Markdown, HTML, links or @-mentions in the
 * comment, and must not break the Mermaid charts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateGate } from '../../src/gate/index.js';
import { nextBaseline } from '../../src/gate/baseline.js';
import { escapeMarkdown, escapeText } from '../../src/common/escape.js';
import { renderMarkdown, renderText, withGate } from '../../src/report/index.js';
import type { DataProfile } from '../../src/data/types.js';
import { config, dataReport, found, loaded, profile } from '../gate/build.js';

const HOSTILE = [
  '**bold** _em_ ~~gone~~',
  '<img src=x onerror=alert(1)>',
  '<script>alert(1)</script>',
  '[click](https://evil.example/steal)',
  '![pixel](https://evil.example/p.png)',
  '@someone please look',
  'cc @org/team',
  '`rm -rf /` and ```fence```',
  'a | b | c',
  '# heading',
  '> quote',
  '- list',
  '1. ordered',
  'line\nbreak\r\nhere',
  'https://evil.example www.evil.example',
  'x"] bar [9, 9] %% "y', // Mermaid-breaking: quote, bracket, comment marker
  ':shipit: #123 GH-1',
  '&amp; &#64; &lt;',
  '\u202eevil\u202c bidi and \u0007 bell \u001b[31m red',
  '<details><summary>fake</summary>',
  '</details>',
];

function hostileReport() {
  const cfgBefore = config();
  const columnsBefore = ['pump_model', 'rms_velocity', 'condition'];
  const before: DataProfile = profile({
    columns: columnsBefore,
    classes: { normal: 10, [HOSTILE[0]]: 5 },
    features: {
      pump_model: { kind: 'categorical', counts: { 'P-100': 10 }, missing: 0 },
      rms_velocity: { kind: 'numeric', mean: 1, std: 1, min: 0, max: 2, missing: 0 },
    },
  });
  const baseline = nextBaseline(
    null,
    { result: found(3, 0.96), loaded: loaded(before), config: cfgBefore },
    {
      date: new Date('2026-01-01T00:00:00.000Z'),
      commit: null,
      toolVersion: '0.1.0',
    },
  );
  const features: DataProfile['features'] = {
    pump_model: { kind: 'categorical', counts: Object.fromEntries(HOSTILE.map((h) => [h, 1])), missing: 0 },
  };
  for (const h of HOSTILE) features[h] = { kind: 'numeric', mean: 0, std: 1, min: 0, max: 1, missing: 0 };
  // Shared numeric features that moved, so names also appear in the feature-shift list.
  features['rms_velocity'] = { kind: 'numeric', mean: 9, std: 1, min: 0, max: 20, missing: 0 };
  const after: DataProfile = {
    rows: 40,
    classes: Object.fromEntries([['normal', 12], ...HOSTILE.map((h) => [h, 1] as const)]),
    columns: [...columnsBefore, ...HOSTILE],
    features,
  };
  const cfg = config({ data: { pathAsWritten: `data/${HOSTILE[3]}.csv`, target: HOSTILE[6], ignore: [HOSTILE[1]] } });
  const result = found(4, 0.96);
  const outcome = evaluateGate({ result, loaded: loaded(after, 'f'.repeat(64)), config: cfg, baseline });
  return withGate(dataReport(result, cfg, after, 'f'.repeat(64)), outcome, cfg.gate);
}

/** Splits the comment into Mermaid blocks and everything else. */
function split(md: string): { charts: string[]; rest: string } {
  const charts: string[] = [];
  const rest = md.replace(/```mermaid\n[\s\S]*?\n```/g, (block) => {
    charts.push(block);
    return '';
  });
  return { charts, rest };
}

// The Mermaid constructs the renderer may emit, with labels from a safe alphabet. They are
// a subset of Mermaid's own xychart grammar (mermaid-js/mermaid,
// packages/mermaid/src/diagrams/xychart/parser/xychart.jison): a quoted string is any run
// without a double quote, and a number must match its token [+-]?(\d+(\.\d+)?|\.\d+),
// so no exponent form. Labels are narrowed further, to [A-Za-z0-9 .,-].
const LABEL = '"[A-Za-z0-9 .,-]*"';
const NUM = '-?\\d+(?:\\.\\d+)?';
const CHART_LINES = [
  /^```mermaid$/,
  /^xychart-beta$/,
  new RegExp(`^  title ${LABEL}$`),
  new RegExp(`^  x-axis ${LABEL} \\[${LABEL}(?:, ${LABEL})*\\]$`),
  new RegExp(`^  y-axis ${LABEL} ${NUM} --> ${NUM}$`),
  new RegExp(`^  (?:line|bar) \\[${NUM}(?:, ${NUM})*\\]$`),
  /^```$/,
];

function checkChart(block: string): void {
  const lines = block.split('\n');
  for (const line of lines) {
    expect(
      CHART_LINES.some((re) => re.test(line)),
      `chart line outside the allowed grammar: ${JSON.stringify(line)}`,
    ).toBe(true);
  }
  expect(lines[1]).toBe('xychart-beta');
  const categories = (lines.find((l) => l.startsWith('  x-axis'))!.match(/"[^"]*"/g) ?? []).length - 1;
  for (const series of lines.filter((l) => /^ {2}(line|bar) /.test(l))) {
    expect(series.split(',').length, 'one value per category').toBe(categories);
  }
}

describe('injection', () => {
  const report = hostileReport();
  const md = renderMarkdown(report);
  const { charts, rest } = split(md);

  it('puts the hostile strings into the report at all (the test would be empty otherwise)', () => {
    expect(report.changes!.columnsAdded.length).toBe(HOSTILE.length);
    expect(report.changes!.classesAppeared.length).toBe(HOSTILE.length - 1);
    expect(report.reasons.some((r) => r.includes('data.target'))).toBe(true);
    // Each hostile string shows up, escaped, in the comment.
    for (const h of HOSTILE) expect(md).toContain(escapeMarkdown(h));
  });

  it("leaves no live HTML: the only tags are the renderer's own details/summary", () => {
    const tags = rest.match(/<\/?[A-Za-z][^>]*>/g) ?? [];
    expect(new Set(tags)).toEqual(new Set(['<details>', '<summary>', '</summary>', '</details>']));
    // Every <details> opens and closes in order.
    expect(rest.split('<details>').length).toBe(rest.split('</details>').length);
  });

  it('leaves no links, images, emphasis, mentions or extra code', () => {
    expect(rest).not.toMatch(/\]\(|!\[|\[[^\]]*\]/);
    // GitHub links mentions, #123 references, URLs and :emoji: in the text after decoding
    // character references, so those checks run on the decoded text.
    const decoded = rest.replace(/&#(\d+);/g, (_, n: string) => String.fromCodePoint(Number(n)));
    expect(decoded).toContain('@\u200bsomeone');
    expect(decoded.match(/.{0,40}(https?:\/\/|www\.).{0,40}/i)?.[0] ?? null).toBeNull();
    expect(decoded).not.toMatch(/@[A-Za-z0-9]/);
    expect(decoded).not.toMatch(/#[0-9]/);
    expect(decoded).not.toMatch(/:[a-z_]+:/);
    expect(rest).not.toMatch(/\*\*bold|_em_|~~gone/);
    expect(rest).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f\u202a-\u202e\u2066-\u2069]/);
    // Code spans: only the two commands the footer names.
    const spans = rest.match(/`[^`\n]*`/g) ?? [];
    const ours = ['`neuron-budget baseline`', '`update-baseline: true`', '`gate.max-width`'];
    for (const span of spans) expect(ours).toContain(span);
    expect(spans.length).toBeGreaterThanOrEqual(2);
    expect(rest.replace(/`neuron-budget baseline`|`update-baseline: true`|`gate\.max-width`/g, '')).not.toContain('`');
  });

  it('keeps every table row to its column count (no pipe from a name splits a cell)', () => {
    const lines = rest.split('\n');
    for (let i = 0; i < lines.length; i++) {
      if (!/^\|[-:| ]+\|$/.test(lines[i])) continue;
      const cols = lines[i - 1].split('|').length;
      for (let j = i + 1; j < lines.length && lines[j].startsWith('|'); j++) {
        expect(lines[j].split('|').length, lines[j]).toBe(cols);
      }
    }
  });

  it("keeps block structure: no line starts a heading, quote, list or fence except the renderer's own", () => {
    for (const line of rest.split('\n')) {
      if (/^(#{1,6} |> |```|\d+\. )/.test(line)) {
        expect(line, line).toMatch(/^### neuron-budget: |^#### /);
      }
    }
  });

  it('emits only the chart constructs and alphabet checked here, one value per category', () => {
    expect(charts.length).toBeGreaterThanOrEqual(3);
    for (const block of charts) checkChart(block);
  });

  it('keeps terminal escape sequences and bidi controls out of the terminal text', () => {
    const text = renderText(report);
    expect(text).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f\u202a-\u202e\u2066-\u2069]/);
  });
});

describe('escapeMarkdown', () => {
  /** Minimal decoder of the numeric references the escaper writes. */
  const decode = (s: string): string => s.replace(/&#(\d+);/g, (_, n: string) => String.fromCodePoint(Number(n)));

  it('outputs only letters, digits, inert punctuation, references and non-ASCII text, and loses nothing', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 60 }), (s) => {
        const out = escapeMarkdown(s);
        expect(out).toMatch(/^(?:[A-Za-z0-9 ,;'"/%=?]|&#\d+;|[^\u0000-\u007f])*$/u);
        const clean =
          !/[\u0000-\u001f\u007f-\u009f\u061c\u180e\u200b-\u200f\u202a-\u202e\u2060-\u2064\u2066-\u2069\ufeff\u00ad\uff20\ufe6b]/u.test(
            s,
          );
        if (clean) expect(decode(out).replace(/\u200b/g, '')).toBe(s);
      }),
      { numRuns: 2000, seed: 7 },
    );
  });

  it('breaks mentions, references and autolinks with a zero-width space', () => {
    expect(decode(escapeMarkdown('@someone'))).toBe('@\u200bsomeone');
    expect(decode(escapeMarkdown('#12'))).toBe('#\u200b12');
    expect(decode(escapeMarkdown('http://x'))).toBe('http:\u200b//x');
    expect(decode(escapeMarkdown('WWW.x.org'))).toBe('WWW\u200b.x.org');
  });

  it('terminal and log: shows control characters escaped, breaks "::", keeps the rest', () => {
    expect(escapeText('a\u001b[31mb\u202ec')).toBe('a\\x1b[31mb\\u202ec');
    expect(escapeText('pos\n::error file=evil.yml,line=1::X')).toBe('pos\\n:\\x3aerror file=evil.yml,line=1:\\x3aX');
    expect(escapeText('Pumpe Nr. 3 – Lager')).toBe('Pumpe Nr. 3 – Lager');
  });
});
