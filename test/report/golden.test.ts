/**
 * Golden files of the comment and the terminal text for a failing pull request, so any
 * change to the layout is deliberate.
 *
 * Input: test/report/fixtures/demo-fail.report.json, a JSON report (what `check --report`
 * writes). To regenerate everything after a deliberate layout change, or after replacing
 * the fixture with the real demo's report:
 *
 *   UPDATE_GOLDEN=1 npx vitest run test/report
 *
 * This rewrites test/report/golden/demo-fail.md, test/report/golden/demo-fail.txt and
 * docs/example-comment.md (and creates the fixture from demo-fixture.ts if it is absent).
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { renderMarkdown, renderText } from '../../src/report/index.js';
import type { Report } from '../../src/report/types.js';
import { demoFailReport } from './demo-fixture.js';

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
  if (!existsSync(FIXTURE)) {
    if (!UPDATE) throw new Error(`${FIXTURE} is missing; run UPDATE_GOLDEN=1 npx vitest run test/report`);
    write(FIXTURE, `${JSON.stringify(demoFailReport(), null, 2)}\n`);
  }
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
