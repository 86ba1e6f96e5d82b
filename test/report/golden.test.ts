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
 * This rewrites test/report/golden/demo-fail.md, test/report/golden/demo-fail.txt and
 * docs/example-comment.md.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { renderMarkdown, renderText } from '../../src/report/index.js';
import type { Report } from '../../src/report/types.js';

const here = (p: string): string => fileURLToPath(new URL(p, import.meta.url));
const FIXTURE = here('./fixtures/demo-fail.report.json');
const GOLDEN_MD = here('./golden/demo-fail.md');
const GOLDEN_TXT = here('./golden/demo-fail.txt');
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
  const md = renderMarkdown(report);
  const text = renderText(report);
  if (UPDATE) {
    write(GOLDEN_MD, md);
    write(GOLDEN_TXT, text);
    write(EXAMPLE, exampleDocument(md));
  }

  it('the fixture is a failing report', () => {
    expect(report.verdict).toBe('fail');
  });

  it('renders the comment exactly as the golden file', () => {
    expect(md).toBe(readFileSync(GOLDEN_MD, 'utf8'));
  });

  it('renders the terminal text exactly as the golden file', () => {
    expect(text).toBe(readFileSync(GOLDEN_TXT, 'utf8'));
  });

  it('keeps docs/example-comment.md in step with the golden comment', () => {
    expect(readFileSync(EXAMPLE, 'utf8')).toBe(exampleDocument(md));
  });
});
