// schema/model.schema.json against the models the code writes, judged by ajv (a general-purpose
// JSON Schema validator, draft 2020-12): every written model validates, damaged ones do not,
// and every field is documented.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { isUserError } from '../../src/common/errors.js';
import { MODEL_SCHEMA, parseModel, serializeModel, type ModelDocument } from '../../src/model/index.js';
import { REPO_ROOT } from '../helpers/cli.js';
import { modelOf, trainedDemo, trainedIris } from '../device/fixtures.js';

const schema = JSON.parse(readFileSync(join(REPO_ROOT, 'schema', 'model.schema.json'), 'utf8'));
const ajv = new Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true });
const validate = ajv.compile(schema);

function valid(doc: unknown): boolean {
  return validate(JSON.parse(JSON.stringify(doc))) as boolean;
}

async function written(): Promise<ModelDocument[]> {
  const models = [
    modelOf(await trainedIris('species')),
    modelOf(await trainedIris('two-species')),
    modelOf(await trainedIris('petal-width', 3, 300, 'relu')),
    modelOf(await trainedDemo('readings.csv', 3, 100)),
  ];
  return [...models, { ...models[0], int8: null }];
}

describe('the model schema', () => {
  it('every model the code writes validates, as written and as read back', async () => {
    for (const doc of await written()) {
      expect(doc.schema).toBe(MODEL_SCHEMA);
      expect(valid(doc), JSON.stringify(validate.errors)).toBe(true);
      const back = parseModel(serializeModel(doc), 'model.json');
      expect(valid(back), JSON.stringify(validate.errors)).toBe(true);
      expect(back).toEqual(doc);
    }
  });

  it('a model of the previous version is read as this one, without an int8 form', async () => {
    const doc = (await written())[0];
    const { cost: _cost, int8: _int8, ...rest } = doc;
    // Version 1 had no judging rows and recorded the grown width and a 0-based restart.
    const v1 = {
      ...rest,
      schema: 'neuron-budget/model@1',
      target: { metric: doc.target.metric, threshold: doc.target.threshold, value: doc.target.value },
      origin: { seed: doc.origin.seed, restart: 2, grownWidth: doc.width },
    };
    const back = parseModel(JSON.stringify(v1), 'old.json');
    expect(back.schema).toBe(MODEL_SCHEMA);
    expect(back.origin).toEqual({ seed: doc.origin.seed, width: doc.width, restart: 3, how: 'fresh' });
    expect(back.target.on).toBe('validation');
    expect(back.int8).toBeNull();
    expect(back.cost).toEqual(doc.cost);
    expect(valid(back)).toBe(true);
  });

  it('rejects a model with a missing or mistyped field', async () => {
    const doc = JSON.parse(JSON.stringify((await written())[3])) as Record<string, any>;
    const damaged: [string, (d: Record<string, any>) => void][] = [
      ['no cost', (d) => delete d.cost],
      ['no int8', (d) => delete d.int8],
      ['no network weights', (d) => delete d.network.hiddenWeights],
      ['no activation table', (d) => delete d.int8.hidden.table],
      ['width as text', (d) => (d.width = '3')],
      ['old schema name', (d) => (d.schema = 'neuron-budget/model@1')],
      ['a table of 255 entries', (d) => d.int8.hidden.table.pop()],
      ['a weight code of 128', (d) => (d.int8.hidden.weights[0][0] = 128)],
      ['a fractional weight code', (d) => (d.int8.output.weights[0][0] = 0.5)],
      ['a negative multiplier', (d) => (d.int8.hidden.multiplier[0] = -1)],
      ['a shift of 40', (d) => (d.int8.hidden.shift[0] = 40)],
      ['flash bytes as text', (d) => (d.cost.flashBytes.int8 = '100')],
      ['an unknown key', (d) => (d.int8.hidden.extra = 1)],
      ['an unknown feature kind', (d) => (d.encoding.features[0].kind = 'date')],
      ['an unknown activation', (d) => (d.network.activation = 'gelu')],
    ];
    for (const [what, damage] of damaged) {
      const copy = structuredClone(doc);
      damage(copy);
      expect(valid(copy), what).toBe(false);
    }
    expect(valid(doc)).toBe(true);
  });

  it('the loader refuses a damaged int8 form, naming the key', async () => {
    const doc = JSON.parse(serializeModel((await written())[0]));
    doc.int8.hidden.table = doc.int8.hidden.table.slice(1);
    try {
      parseModel(JSON.stringify(doc), 'model.json');
      throw new Error('no error');
    } catch (e) {
      expect(isUserError(e)).toBe(true);
      if (isUserError(e)) {
        expect(e.key).toBe('int8.hidden.table');
        expect(e.message).toContain('model.json');
      }
    }
  });

  it('documents every field', () => {
    const missing: string[] = [];
    const walk = (node: any, path: string): void => {
      if (typeof node !== 'object' || node === null) return;
      if (node.properties) {
        for (const [key, child] of Object.entries<any>(node.properties)) {
          if (typeof child.description !== 'string' || child.description.length < 8) missing.push(`${path}.${key}`);
          walk(child, `${path}.${key}`);
        }
      }
      for (const k of ['items', 'oneOf', '$defs']) {
        const v = node[k];
        if (Array.isArray(v)) v.forEach((c, i) => walk(c, `${path}.${k}[${i}]`));
        else if (v && k === '$defs') for (const [name, c] of Object.entries(v)) walk(c, `${path}.$defs.${name}`);
        else if (v) walk(v, `${path}.${k}`);
      }
    };
    walk(schema, '');
    expect(missing).toEqual([]);
  });
});
