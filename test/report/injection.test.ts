/**
 * Strings from the repository (column names, class labels, categories, the data path,
 * setting values) must not become live Markdown, HTML, links or @-mentions in the
 * comment, and must not break the Mermaid charts. The comment is rendered by markdown-it (a
 * general-purpose CommonMark renderer with GFM tables, strikethrough and linkify) and the
 * HTML is checked, so "inert" means what a CommonMark renderer makes of it, not what the
 * escaper intends.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateGate } from '../../src/gate/index.js';
import { nextBaseline } from '../../src/gate/baseline.js';
import { escapeMarkdown, escapeText } from '../../src/common/escape.js';
import { renderMarkdown, renderText, withGate } from '../../src/report/index.js';
import type { DataProfile } from '../../src/data/types.js';
import { config, dataReport, found, loaded, profile } from '../gate/build.js';
import { expectNoAutolinks, renderer, textOf } from '../helpers/markdown.js';

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
  /^%%\{init: \{"themeVariables": \{"xyChart": \{"plotColorPalette": "#[0-9a-f]{6}(?:,#[0-9a-f]{6})*"\}\}\}\}%%$/,
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
  expect(lines[2]).toBe('xychart-beta');
  const categories = (lines.find((l) => l.startsWith('  x-axis'))!.match(/"[^"]*"/g) ?? []).length - 1;
  for (const series of lines.filter((l) => /^ {2}(line|bar) /.test(l))) {
    expect(series.split(',').length, 'one value per category').toBe(categories);
  }
}

describe('injection', () => {
  const report = hostileReport();
  const md = renderMarkdown(report);
  const { charts, rest } = split(md);
  const html = renderer.render(rest);

  it('puts the hostile strings into the report at all (the test would be empty otherwise)', () => {
    expect(report.changes!.columnsAdded.length).toBe(HOSTILE.length);
    expect(report.changes!.classesAppeared.length).toBe(HOSTILE.length - 1);
    expect(report.reasons.some((r) => r.includes('data.target'))).toBe(true);
    // Each hostile string shows up, escaped, in the comment.
    for (const h of HOSTILE) expect(md).toContain(escapeMarkdown(h));
  });

  it("leaves no live HTML: the only raw tags are the renderer's own details/summary", () => {
    const tags = html.match(/<\/?[A-Za-z][^>]*>/g) ?? [];
    const names = new Set(tags.map((t) => /^<\/?([A-Za-z0-9]+)/.exec(t)![1].toLowerCase()));
    const markdownTags = [
      'h3',
      'h4',
      'p',
      'table',
      'thead',
      'tbody',
      'tr',
      'th',
      'td',
      'ul',
      'li',
      'code',
      'strong',
      'em',
      'hr',
    ];
    for (const name of names) expect([...markdownTags, 'details', 'summary'], name).toContain(name);
    expect(
      tags.filter((t) => /^<(details|summary)\b/.test(t)).every((t) => t === '<details>' || t === '<summary>'),
    ).toBe(true);
    expect(rest.split('<details>').length).toBe(rest.split('</details>').length);
    // The hostile tags arrive as text.
    expect(textOf(html)).toContain('<img src=x onerror=alert(1)>');
    expect(textOf(html)).toContain('<script>alert(1)</script>');
  });

  it('leaves no links, images, strikethrough, mentions or emphasis and code from the data', () => {
    expect(html).not.toMatch(/<(a|img|s|del|blockquote|ol|h1|h2|h5|h6|pre)\b/);
    for (const [, inner] of html.matchAll(/<(?:strong|em|code)>([^<]*)</g)) {
      expect(inner, inner).not.toMatch(/bold|\bem\b|gone|rm -rf|fence|evil|someone|heading/);
    }
    const text = textOf(html);
    expect(text).toContain('@\u200bsomeone');
    expect(text).toContain('**bold** _em_ ~~gone~~');
    expectNoAutolinks(text);
    expect(text).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f\u202a-\u202e\u2066-\u2069]/);
  });

  it('keeps every table row to its column count (no pipe from a name splits a cell)', () => {
    for (const table of html.match(/<table>[\s\S]*?<\/table>/g) ?? []) {
      const rows = table.match(/<tr>[\s\S]*?<\/tr>/g) ?? [];
      const cells = rows.map((r) => (r.match(/<t[hd]\b/g) ?? []).length);
      expect(new Set(cells).size, table.slice(0, 200)).toBe(1);
    }
  });

  it("keeps block structure: the only headings are the renderer's own", () => {
    for (const [, level, inner] of html.matchAll(/<h(\d)>([\s\S]*?)<\/h\d>/g)) {
      if (level === '3') expect(inner).toMatch(/^neuron-budget: /);
      else expect(inner, inner).not.toMatch(/heading|evil|quote|list|ordered/);
    }
  });

  it('writes raw markdown without character references: only what needs escaping is escaped', () => {
    expect(rest).not.toMatch(/(?<!\\)&#?\w+;/);
  });

  it('emits only the chart constructs and alphabet checked here, one value per category', () => {
    expect(charts.length).toBeGreaterThanOrEqual(1);
    for (const block of charts) checkChart(block);
  });

  it('keeps terminal escape sequences and bidi controls out of the terminal text', () => {
    const text = renderText(report);
    expect(text).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f\u202a-\u202e\u2066-\u2069]/);
  });
});

describe('escapeMarkdown', () => {
  /** What a reader sees of one escaped string placed mid-line, as markdown-it renders it. */
  const seen = (s: string): string => textOf(renderer.renderInline(`x ${s}`)).slice(2);
  const SPECIAL =
    /[\u0000-\u001f\u007f-\u009f\u00ad\u061c\u180e\u200b-\u200f\u2028\u2029\u202a-\u202e\u2060-\u2064\u2066-\u2069\ufeff]/u;

  it('renders as literal text: no tag, and the reader sees the string itself', () => {
    fc.assert(
      fc.property(
        fc.string({ unit: fc.constantFrom(...'ab1 *_`[]()<>!|~&#;:@/.-+=\\$^'.split('')), maxLength: 40 }),
        (s) => {
          const html = renderer.renderInline(`x ${escapeMarkdown(s)}`);
          expect(html).not.toMatch(/<[a-z]/);
          expect(
            seen(escapeMarkdown(s))
              .replace(/\u200b/g, '')
              .replace(/\u00a0/g, ' '),
          ).toBe(s);
          // At the start of a list item, too, it stays one plain item (no heading, quote, list, rule or code).
          const item = renderer.render(`- ${escapeMarkdown(s)}`);
          expect(item, JSON.stringify(s)).toMatch(/^<ul>\n<li>[^<]*<\/li>\n<\/ul>\n$/);
        },
      ),
      { numRuns: 3000, seed: 7 },
    );
  });

  it('keeps any text other than control and invisible characters, and escapes nothing that needs no escape', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 60 }), (s) => {
        const out = escapeMarkdown(s);
        if (!SPECIAL.test(s))
          expect(
            seen(out)
              .replace(/[\u200b]/g, '')
              .replace(/\u00a0/g, ' '),
          ).toBe(s);
        // Letters, digits and plain punctuation pass as they are.
        if (/^[\p{L}\p{N},;'"/%?!()]*$/u.test(s)) expect(out).toBe(s);
      }),
      { numRuns: 2000, seed: 7 },
    );
  });

  it('breaks mentions, references and autolinks with a zero-width space', () => {
    expect(escapeMarkdown('@someone')).toBe('@\u200bsomeone');
    expect(escapeMarkdown('#12')).toBe('#\u200b12');
    expect(escapeMarkdown('# heading')).toBe('\\# heading');
    expect(escapeMarkdown('casing_temp _em_')).toBe('casing_temp \\_em\\_');
    expect(escapeMarkdown('0.1.0 and 1. x')).toBe('0.1.0 and 1. x');
    expect(escapeMarkdown('1. x')).toBe('1\\. x');
    expect(escapeMarkdown('see #12')).toBe('see #\u200b12');
    expect(escapeMarkdown('http://x')).toBe('http:\u200b//x');
    expect(escapeMarkdown('WWW.x.org')).toBe('WWW\u200b.x.org');
    expect(escapeMarkdown('ratio 3:1, at 5 @ 2')).toBe('ratio 3:\u200b1, at 5 @ 2');
  });

  it('turns control and invisible characters into U+FFFD and line breaks into spaces', () => {
    expect(escapeMarkdown('a\u001b[31mb\u202ec')).toBe('a\ufffd\\[31mb\ufffdc');
    expect(escapeMarkdown('one\ntwo\r\nthree')).toBe('one two  three');
  });

  it('terminal and log: shows control characters escaped, breaks "::", keeps the rest', () => {
    expect(escapeText('a\u001b[31mb\u202ec')).toBe('a\\x1b[31mb\\u202ec');
    expect(escapeText('pos\n::error file=evil.yml,line=1::X')).toBe('pos\\n:\\x3aerror file=evil.yml,line=1:\\x3aX');
    expect(escapeText('Pumpe Nr. 3 – Lager')).toBe('Pumpe Nr. 3 – Lager');
  });
});
