/**
 * Golden files of the comment and the terminal text for a failing pull request, so any
 * change to the layout is deliberate.
 *
 * Input: test/report/fixtures/demo-fail.report.json, the real report of the demo's failing
 * case, made by
 *
 *   node dist/cli/index.js baseline --config examples/pump-vibration/neuron-budget.yml
 *   node dist/cli/index.js check --config examples/pump-vibration/neuron-budget.pr.yml \
 *     --report test/report/fixtures/demo-fail.report.json
 *
 * To regenerate the golden files after a deliberate layout change or a new fixture:
 *
 *   UPDATE_GOLDEN=1 npx vitest run test/report
 *
 * This rewrites the three screens' golden files under test/report/golden/ (the pull-request
 * comment and the job summary as the action writes them, the terminal text as the command line
 * prints it) and docs/example-comment.md.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { commentBody, commentMarker } from '../../src/github/comment.js';
import { fitSummary } from '../../src/github/markdown.js';
import { renderMarkdown, renderText, type RenderContext } from '../../src/report/index.js';
import type { Report } from '../../src/report/types.js';

const here = (p: string): string => fileURLToPath(new URL(p, import.meta.url));
const FIXTURE = here('./fixtures/demo-fail.report.json');
const GOLDEN_COMMENT = here('./golden/demo-fail.comment.md');
const GOLDEN_SUMMARY = here('./golden/demo-fail.summary.md');
const GOLDEN_TXT = here('./golden/demo-fail.txt');
const CONFIG = 'examples/pump-vibration/neuron-budget.pr.yml';
const ACTION: RenderContext = {
  surface: 'action',
  mode: 'check',
  configShown: CONFIG,
  baselineFile: 'examples/pump-vibration/neuron-budget.baseline.json',
  baseline: null,
};
const CLI: RenderContext = { ...ACTION, surface: 'cli' };
const EXAMPLE = here('../../docs/example-comment.md');
const UPDATE = process.env['UPDATE_GOLDEN'] === '1';

function write(path: string, text: string): void {
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, text);
}

function loadFixture(): Report {
  return JSON.parse(readFileSync(FIXTURE, 'utf8')) as Report;
}

export function exampleDocument(markdown: string): string {
  return [
    '<!-- Generated from test/report/fixtures/demo-fail.report.json by `UPDATE_GOLDEN=1 npx vitest run test/report`; do not edit by hand. -->',
    '',
    '# Example pull-request comment',
    '',
    'This is the comment neuron-budget posts on a pull request that fails the gate. It comes from the',
    'invented pump-vibration demo: the readings and every number below are made up for illustration and',
    'are not measurements of any real pump.',
    '',
    '---',
    '',
    markdown,
  ].join('\n');
}

describe('golden files', () => {
  const report = loadFixture();
  const md = renderMarkdown(report, { context: ACTION });
  const comment = commentBody(commentMarker(CONFIG), md, 'https://github.com/acme/pumps/actions/runs/1');
  const summary = fitSummary(md);
  const text = renderText(report, CLI);
  if (UPDATE) {
    write(GOLDEN_COMMENT, comment);
    write(GOLDEN_SUMMARY, summary);
    write(GOLDEN_TXT, text);
    write(EXAMPLE, exampleDocument(md));
  }

  it('the fixture is a failing report', () => {
    expect(report.verdict).toBe('fail');
  });

  it('renders the pull-request comment exactly as the golden file', () => {
    expect(comment).toBe(readFileSync(GOLDEN_COMMENT, 'utf8'));
  });

  it('renders the job summary exactly as the golden file', () => {
    expect(summary).toBe(readFileSync(GOLDEN_SUMMARY, 'utf8'));
  });

  it('renders the terminal text exactly as the golden file', () => {
    expect(text).toBe(readFileSync(GOLDEN_TXT, 'utf8'));
  });

  it('keeps docs/example-comment.md in step with the golden comment', () => {
    expect(readFileSync(EXAMPLE, 'utf8')).toBe(exampleDocument(md));
  });

  it('writes the example comment without character references: only what needs escaping is escaped', () => {
    expect(readFileSync(EXAMPLE, 'utf8')).not.toMatch(/&#?\w+;/);
  });
});
