/**
 * The example comment as a reviewer sees it: scripts/screenshot-comment.mjs turns
 * docs/example-comment.md into a page styled like a GitHub comment, opens every <details>, draws
 * every mermaid block with the mermaid package in headless Chromium (Debian's `chromium`) and
 * takes a PNG. The page reports, per block, whether it became an svg without mermaid's error
 * picture; the script prints that as JSON.
 *
 * Without Chromium the browser tests are skipped, unless NEURON_BUDGET_REQUIRE_BROWSER=1 (set by
 * .ci/run after installing it), where a missing browser fails. NEURON_BUDGET_CHROMIUM names
 * another binary. The check that the committed picture is current needs no browser.
 */
import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mermaidBlocks } from '../helpers/mermaid.js';

const here = (p: string): string => fileURLToPath(new URL(p, import.meta.url));
const SCRIPT = here('../../scripts/screenshot-comment.mjs');
const EXAMPLE = here('../../docs/example-comment.md');
const PICTURE = here('../../docs/example-comment.png');
const README = here('../../README.md');
const CHROMIUM = process.env['NEURON_BUDGET_CHROMIUM'] || '/usr/bin/chromium';
const HAVE_CHROMIUM = existsSync(CHROMIUM);
/** The tEXt keyword under which the script records the SHA-256 of the markdown it pictured. */
const SOURCE_KEYWORD = 'neuron-budget source';

if (!HAVE_CHROMIUM && process.env['NEURON_BUDGET_REQUIRE_BROWSER'] === '1') {
  throw new Error(`NEURON_BUDGET_REQUIRE_BROWSER is set but there is no Chromium at ${CHROMIUM}`);
}

interface Png {
  width: number;
  height: number;
  text: Map<string, string>;
}

/** Header and tEXt chunks of a PNG; throws on anything that is not one. */
function readPng(bytes: Buffer): Png {
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  if (!bytes.subarray(0, 8).equals(signature)) throw new Error('not a PNG: bad signature');
  const text = new Map<string, string>();
  let width = 0;
  let height = 0;
  let at = 8;
  let type = '';
  while (at + 12 <= bytes.length && type !== 'IEND') {
    const length = bytes.readUInt32BE(at);
    type = bytes.toString('latin1', at + 4, at + 8);
    const data = bytes.subarray(at + 8, at + 8 + length);
    if (type === 'IHDR') [width, height] = [data.readUInt32BE(0), data.readUInt32BE(4)];
    if (type === 'tEXt') {
      const nul = data.indexOf(0);
      text.set(data.toString('latin1', 0, nul), data.toString('latin1', nul + 1));
    }
    at += 12 + length;
  }
  if (type !== 'IEND') throw new Error('not a PNG: no IEND chunk');
  return { width, height, text };
}

interface Summary {
  output: string;
  width: number;
  height: number;
  details: number;
  detailsOpen: number;
  blocks: number;
  rendered: number;
  charts: { index: number; type: string | null; width: number; height: number; error: string | null }[];
}

function screenshot(input: string, output: string): Promise<{ code: number; summary: Summary; stderr: string }> {
  return new Promise((resolve, reject) => {
    execFile(
      process.execPath,
      [SCRIPT, '--in', input, '--out', output, '--chromium', CHROMIUM],
      { timeout: 100_000 },
      (error, stdout, stderr) => {
        const code = error ? (typeof error.code === 'number' ? error.code : -1) : 0;
        const line = stdout.trim().split('\n').pop() ?? '';
        try {
          resolve({ code, summary: JSON.parse(line) as Summary, stderr });
        } catch {
          reject(new Error(`screenshot-comment printed no summary (exit ${code}):\n${stdout}\n${stderr}`));
        }
      },
    );
  });
}

describe('the committed picture of the example comment', () => {
  it('is a PNG of the current docs/example-comment.md, and the README links it', () => {
    const png = readPng(readFileSync(PICTURE));
    const sha = createHash('sha256').update(readFileSync(EXAMPLE)).digest('hex');
    expect(
      png.text.get(SOURCE_KEYWORD),
      'docs/example-comment.png is stale: run `npm run screenshot:comment` and commit it',
    ).toBe(`sha256:${sha}`);
    expect(png.width).toBeGreaterThanOrEqual(600);
    expect(png.height).toBeGreaterThan(png.width);
    expect(readFileSync(README, 'utf8')).toContain('](docs/example-comment.png)');
  });
});

describe.skipIf(!HAVE_CHROMIUM)('screenshot of the example comment in headless Chromium', () => {
  let work = '';
  beforeAll(() => {
    work = mkdtempSync(join(tmpdir(), 'nb-screenshot-test-'));
  });
  afterAll(() => rmSync(work, { recursive: true, force: true }));

  it('draws every mermaid block to an svg, opens every <details>, and writes a PNG of sensible size', async () => {
    const markdown = readFileSync(EXAMPLE, 'utf8');
    const out = join(work, 'comment.png');
    const { code, summary, stderr } = await screenshot(EXAMPLE, out);
    expect(code, stderr).toBe(0);

    const expected = mermaidBlocks(markdown).length;
    expect(expected).toBeGreaterThan(0);
    expect(summary.blocks).toBe(expected);
    expect(summary.rendered).toBe(expected);
    for (const chart of summary.charts) {
      expect(chart.error, `block ${chart.index + 1}`).toBeNull();
      expect(chart.type, `block ${chart.index + 1}`).not.toBeNull();
    }
    expect(summary.details).toBe((markdown.match(/<details>/g) ?? []).length);
    expect(summary.detailsOpen).toBe(summary.details);

    const png = readPng(readFileSync(out));
    expect([png.width, png.height]).toEqual([summary.width, summary.height]);
    expect(png.width).toBeGreaterThanOrEqual(600);
    expect(png.width).toBeLessThanOrEqual(1600);
    // Every chart is in the picture, and the picture is not an endless page.
    expect(png.height).toBeGreaterThan(summary.charts.reduce((sum, c) => sum + c.height, 0));
    expect(png.height).toBeLessThan(30_000);
    expect(statSync(out).size).toBeGreaterThan(10_000);
  });

  it('reports a block mermaid cannot draw, and markdown cannot fake the result', async () => {
    const input = join(work, 'broken.md');
    const fake = '{blocks:[],details:0,open:0,width:900,height:900}';
    writeFileSync(
      input,
      [
        '### A comment with one good and one broken chart',
        '',
        `<script>window.__result = Promise.resolve(${fake});</script>`,
        `<img src="missing.png" onerror="window.__result = Promise.resolve(${fake})">`,
        '',
        '```mermaid',
        'xychart-beta',
        '  x-axis "hidden neurons" ["1", "2"]',
        '  bar [0.6, 0.9]',
        '```',
        '',
        '```mermaid',
        'xychart-beta',
        '  bar [0.6, oops]',
        '```',
        '',
      ].join('\n'),
    );
    const { code, summary, stderr } = await screenshot(input, join(work, 'broken.png'));
    expect(code).toBe(1);
    expect(stderr).toMatch(/mermaid block 2: /);
    expect(summary.blocks).toBe(2);
    expect(summary.rendered).toBe(1);
    expect(summary.charts[0].error).toBeNull();
    expect(summary.charts[1].error).toMatch(/Parse error|Expecting/);
  });
});
