/**
 * docs/model-format.md documents every field of the model file, generated from
 * schema/model.schema.json (the definition the loader enforces), so the two cannot drift.
 * `UPDATE_DOCS=1 npx vitest run test/docs` rewrites it.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { REPO_ROOT } from '../helpers/cli.js';

type Node = {
  description?: string;
  type?: string | string[];
  enum?: unknown[];
  const?: unknown;
  properties?: Record<string, Node>;
  items?: Node;
  oneOf?: Node[];
  anyOf?: Node[];
  additionalProperties?: boolean | Node;
  $ref?: string;
  $defs?: Record<string, Node>;
};

const schemaPath = join(REPO_ROOT, 'schema/model.schema.json');
const docPath = join(REPO_ROOT, 'docs/model-format.md');

function render(schema: Node): string {
  const resolve = (n: Node): Node =>
    n.$ref ? { ...schema.$defs![n.$ref.replace('#/$defs/', '')], ...n, $ref: undefined } : n;
  const typeOf = (raw: Node): string => {
    const n = resolve(raw);
    if (n.const !== undefined) return `\`${JSON.stringify(n.const)}\``;
    if (n.enum) return n.enum.map((v) => `\`${JSON.stringify(v)}\``).join(' \\| ');
    const alt = n.oneOf ?? n.anyOf;
    if (alt) return alt.map(typeOf).join(' or ');
    const t = Array.isArray(n.type) ? n.type.join(' or ') : (n.type ?? 'any');
    if (t === 'array' && n.items) return `list of ${typeOf(n.items)}`;
    return t;
  };
  const rows: string[] = [];
  const walk = (raw: Node, path: string, seen: Set<string>): void => {
    const n = resolve(raw);
    const alt = (n.oneOf ?? n.anyOf ?? []).map(resolve).find((b) => b.properties);
    const props = n.properties ?? alt?.properties;
    if (path !== '')
      rows.push(`| \`${path}\` | ${typeOf(raw)} | ${(raw.description ?? n.description ?? '').replace(/\|/g, '\\|')} |`);
    if (props) for (const [k, v] of Object.entries(props)) walk(v, path === '' ? k : `${path}.${k}`, seen);
    const items = n.items ? resolve(n.items) : null;
    if (items?.properties) for (const [k, v] of Object.entries(items.properties)) walk(v, `${path}[].${k}`, seen);
  };
  walk(schema, '', new Set());
  return [
    '<!-- Generated from schema/model.schema.json by test/docs/model-format.test.ts; do not edit. -->',
    '# The model file (`neuron-budget/model@2`)',
    '',
    "Written by `neuron-budget check --model FILE` (and the action's `model` output): the witness",
    'network, everything needed to run it on raw rows (`neuron-budget predict`), its int8 form and',
    'what it costs on a device (`neuron-budget export` turns it into C). The loader checks every',
    'file against [`schema/model.schema.json`](../schema/model.schema.json) and names the key of the',
    'first problem. Files of version 1 are still read (without an int8 form).',
    '',
    'Weight layout: `network.hiddenWeights[j][i]` is the weight from input i to hidden neuron j,',
    '`network.outputWeights[k][j]` from hidden neuron j to output k; inputs are the encoded features',
    'in `encoding.features` order (a numeric feature is one input, `(x − mean) / std`; a categorical',
    'feature is one input per category, one-hot in the listed order).',
    '',
    '| field | type | meaning |',
    '|---|---|---|',
    ...rows,
    '',
  ].join('\n');
}

describe('docs/model-format.md', () => {
  it('documents every field of the model schema', () => {
    const text = render(JSON.parse(readFileSync(schemaPath, 'utf8')) as Node);
    if (process.env['UPDATE_DOCS'] === '1') writeFileSync(docPath, text);
    expect(readFileSync(docPath, 'utf8')).toBe(text);
    expect(text).toContain('| `int8.hidden.table` |');
    expect(text).toContain('| `origin.restart` |');
  });
});
