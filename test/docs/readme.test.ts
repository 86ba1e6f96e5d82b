/**
 * The README's config reference is rendered from the same key table the validator walks, so
 * the docs cannot drift from the code. `UPDATE_README=1 npx vitest run test/docs` rewrites the
 * section between its markers.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CONFIG_SPEC, DERIVED, REQUIRED, type KeySpec } from '../../src/config/spec.js';
import { MAX_CONFIG_BYTES } from '../../src/config/index.js';
import { MAX_MAGNITUDE } from '../../src/data/numbers.js';
import { MAX_NAME_LENGTH } from '../../src/data/where.js';

const README = new URL('../../README.md', import.meta.url);
const BEGIN = '<!-- config-reference:begin (generated from src/config/spec.ts by test/docs/readme.test.ts) -->';
const END = '<!-- config-reference:end -->';

function shownDefault(k: KeySpec): string {
  if (k.default === REQUIRED) return '**required**';
  if (k.default === DERIVED) return 'see meaning';
  if (Array.isArray(k.default)) return k.default.length === 0 ? '`[]`' : `\`[${k.default.join(', ')}]\``;
  return `\`${String(k.default)}\``;
}

function reference(): string {
  const out: string[] = [];
  for (const section of CONFIG_SPEC) {
    out.push(`**\`${section.name}\`**${section.required ? '' : ' (optional)'}: ${section.description}`, '');
    out.push('| key | default | meaning |', '|---|---|---|');
    for (const k of section.keys) {
      out.push(`| \`${section.name}.${k.name}\` | ${shownDefault(k)} | ${k.description.replace(/\|/g, '\\|')} |`);
    }
    out.push('');
  }
  return out.join('\n');
}

describe('README config reference', () => {
  it('lists every config key with the default and meaning the validator uses', () => {
    const text = readFileSync(README, 'utf8');
    const start = text.indexOf(BEGIN);
    const end = text.indexOf(END);
    expect(start, 'README lacks the config-reference markers').toBeGreaterThanOrEqual(0);
    expect(end).toBeGreaterThan(start);
    const expected = `${BEGIN}\n${reference()}${END}`;
    const actual = text.slice(start, end + END.length);
    if (process.env.UPDATE_README === '1' && actual !== expected) {
      writeFileSync(README, text.slice(0, start) + expected + text.slice(end + END.length));
      return;
    }
    expect(actual).toBe(expected);
  });

  it('names each of the two set-up commands and the test command CI runs', () => {
    const text = readFileSync(README, 'utf8');
    expect(text).toContain('npm ci && npm start');
    expect(text).toContain('npm ci && npm test');
    const ci = readFileSync(new URL('../../.ci/run', import.meta.url), 'utf8');
    expect(ci).toMatch(/^npm test$/m);
  });
});

describe('README limits', () => {
  it('states the limits the code enforces', () => {
    const text = readFileSync(README, 'utf8');
    const limits = text.slice(text.indexOf('## Limits'), text.indexOf('\n## ', text.indexOf('## Limits') + 1));
    expect(limits).toContain(`at most\n  ${MAX_NAME_LENGTH} characters`);
    const magnitude = MAX_MAGNITUDE.toPrecision(2).replace('e+', 'e');
    expect(limits).toContain(`between -${magnitude} and ${magnitude}`);
    expect(limits).toContain(`at most ${MAX_CONFIG_BYTES / 1024} KiB`);
  });
});
