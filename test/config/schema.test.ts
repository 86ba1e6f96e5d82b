// schema/neuron-budget.schema.json against the validator: same keys, same rules, same
// defaults, and the same verdict on boundary values, judged by ajv (a general-purpose
// JSON Schema validator, draft 2020-12).
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, test } from 'vitest';
import { parse as parseYaml, stringify } from 'yaml';
import { parseConfig } from '../../src/config/index.js';
import { CONFIG_SPEC, DERIVED, REQUIRED, type KeySpec } from '../../src/config/spec.js';
import { REPO_ROOT } from '../helpers/cli.js';

type JsonSchema = {
  type?: string | string[];
  properties?: Record<string, JsonSchema>;
  required?: string[];
  additionalProperties?: boolean;
  default?: unknown;
  description?: string;
  enum?: unknown[];
  minimum?: number;
  minItems?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
};

const schemaPath = join(REPO_ROOT, 'schema', 'neuron-budget.schema.json');
const schema = JSON.parse(readFileSync(schemaPath, 'utf8')) as JsonSchema & Record<string, unknown>;
// strictRequired is off: the conditional rules name keys ("required") declared in the main branch, not beside them.
const ajv = new Ajv2020({ allErrors: true, strict: true, strictRequired: false, allowUnionTypes: true });
const validateWithSchema = ajv.compile(schema);

const ROOT = REPO_ROOT;
const FILE = join(REPO_ROOT, 'neuron-budget.yml');

function validatorAccepts(config: unknown): boolean {
  try {
    parseConfig(stringify(config), { file: FILE, root: ROOT });
    return true;
  } catch {
    return false;
  }
}

describe('the schema and the validator describe the same keys', () => {
  test('sections: the same names, and the same required ones', () => {
    expect(Object.keys(schema.properties!).sort()).toEqual(CONFIG_SPEC.map((s) => s.name).sort());
    expect([...schema.required!].sort()).toEqual(
      CONFIG_SPEC.filter((s) => s.required)
        .map((s) => s.name)
        .sort(),
    );
    expect(schema.additionalProperties).toBe(false);
  });

  test.each(CONFIG_SPEC.map((s) => [s.name, s] as const))(
    'section %s: every key in both, none extra',
    (_name, section) => {
      const props = schema.properties![section.name];
      expect(props.additionalProperties).toBe(false);
      expect(Object.keys(props.properties!).sort()).toEqual(section.keys.map((k) => k.name).sort());
      const required = section.keys
        .filter((k) => k.default === REQUIRED)
        .map((k) => k.name)
        .sort();
      expect([...(props.required ?? [])].sort()).toEqual(required);
    },
  );

  const allKeys = CONFIG_SPEC.flatMap((s) => s.keys.map((k) => [`${s.name}.${k.name}`, s.name, k] as const));
  test.each(allKeys)('%s: same default, a description, same enum and range', (_full, sectionName, key) => {
    const prop = schema.properties![sectionName].properties![key.name];
    expect(prop.description && prop.description.length > 10).toBe(true);
    if (key.default === REQUIRED || key.default === DERIVED) expect(prop.default).toBeUndefined();
    else expect(prop.default).toEqual(key.default);
    const rule = key.rule;
    if (rule.kind === 'text-list') expect(prop.minItems).toBe(rule.minItems);
    if (rule.kind === 'enum') expect(prop.enum).toEqual(rule.nullable ? [...rule.values, null] : [...rule.values]);
    if (rule.kind === 'integer' || rule.kind === 'number') {
      const exMin = rule.kind === 'number' && rule.exclusiveMin;
      const exMax = rule.kind === 'number' && rule.exclusiveMax;
      expect(exMin ? prop.exclusiveMinimum : prop.minimum).toBe(rule.min);
      if (rule.max !== Number.MAX_VALUE) expect(exMax ? prop.exclusiveMaximum : prop.maximum).toBe(rule.max);
    }
  });
});

/** Values worth trying for a key: its edges, just past them, wrong types. */
function probes(key: KeySpec): unknown[] {
  const r = key.rule;
  const common: unknown[] = [null, 'text', true, [], {}];
  switch (r.kind) {
    case 'integer':
      return [...common, r.min, r.max, r.min - 1, r.max + 1, r.min + 0.5];
    case 'number':
      return [
        ...common,
        r.min,
        r.min + 0.001,
        r.min - 0.001,
        ...(r.max === Number.MAX_VALUE ? [1e9] : [r.max, r.max - 0.001, r.max + 0.001]),
      ];
    case 'enum':
      return [...common, ...r.values, `${r.values[0]}x`, 3];
    case 'boolean':
      return [...common, false, 'yes', 0];
    case 'text':
    case 'path':
      return [...common, 'column_a', 'sub/file.csv', '', ' ', 12];
    case 'character':
      return [...common, ';', '\t', ';;', '', '"', '\n'];
    case 'text-list':
      return [...common, ['a'], ['a', 'b'], ['a', 'a'], [''], [1], ['a', 2]];
    case 'recall':
      return [
        ...common,
        0.9,
        1,
        0,
        1.5,
        -0.2,
        { normal: 0.9 },
        { normal: 0.9, worn: 1 },
        { normal: 0 },
        { normal: 'x' },
      ];
  }
}

/**
 * A base config where no rule between keys can interfere with the key being probed:
 * widths and epochs span their whole ranges, the task is left to the data, and the
 * metric is an error metric (no upper bound on threshold or tolerance).
 */
function base(): Record<string, Record<string, unknown>> {
  return {
    data: { path: 'readings.csv', target: 'condition' },
    target: { metric: 'rmse', threshold: 0.5 },
    search: {
      'min-width': 1,
      'max-width': 1024,
      restarts: 1000,
      required: 1,
      'max-epochs': 10_000_000,
      'check-every': 1,
    },
    gate: {},
  };
}

describe('ajv and the validator agree on boundary values of every key', () => {
  const allKeys = CONFIG_SPEC.flatMap((s) => s.keys.map((k) => [`${s.name}.${k.name}`, s.name, k] as const));
  test.each(allKeys)('%s', (_full, sectionName, key) => {
    let tried = 0;
    for (const value of probes(key)) {
      const config = base();
      config[sectionName][key.name] = value;
      // Keep rules between keys out of the way of the probe.
      if (sectionName === 'data' && key.name === 'task') delete config.target.metric;
      // validation + judging must stay below 1: a rule the schema cannot state, checked on its own below.
      if (sectionName === 'data' && key.name === 'validation') config.data.judging = 0;
      if (sectionName === 'data' && key.name === 'judging') config.data.validation = 0;
      if (sectionName === 'target' && key.name === 'metric' && value === 'accuracy') config.target.threshold = 0.5;
      if (sectionName === 'data' && (key.name === 'features' || key.name === 'ignore') && Array.isArray(value)) {
        config.data.target = 'target_column';
      }
      const bySchema = validateWithSchema(config);
      const byValidator = validatorAccepts(config);
      expect(byValidator, `${sectionName}.${key.name} = ${JSON.stringify(value)}: schema says ${bySchema}`).toBe(
        bySchema,
      );
      tried++;
    }
    expect(tried).toBeGreaterThan(4);
  });

  test('rules between keys that the schema states: metric and task, accuracy threshold and tolerance', () => {
    const cases: [Record<string, Record<string, unknown>>, boolean][] = [
      [
        { data: { path: 'a.csv', target: 'c', task: 'classification' }, target: { metric: 'rmse', threshold: 0.5 } },
        false,
      ],
      [
        { data: { path: 'a.csv', target: 'c', task: 'regression' }, target: { metric: 'accuracy', threshold: 0.5 } },
        false,
      ],
      [{ data: { path: 'a.csv', target: 'c', task: 'regression' }, target: { threshold: 5 } }, true],
      // With data.task auto and no metric, the metric follows the task found in the data: a threshold
      // of 5 may be an rmse, so the file is valid; the data stage checks it against the task it finds.
      [{ data: { path: 'a.csv', target: 'c' }, target: { threshold: 5 } }, true],
      [{ data: { path: 'a.csv', target: 'c', task: 'classification' }, target: { threshold: 5 } }, false],
      [{ data: { path: 'a.csv', target: 'c' }, target: { metric: 'mae', threshold: 5 } }, true],
      [{ data: { path: 'a.csv', target: 'c' }, target: { threshold: 0.9 }, gate: { 'metric-tolerance': 1 } }, true],
      [
        {
          data: { path: 'a.csv', target: 'c', task: 'classification' },
          target: { threshold: 0.9 },
          gate: { 'metric-tolerance': 1 },
        },
        false,
      ],
      [
        {
          data: { path: 'a.csv', target: 'c' },
          target: { metric: 'mae', threshold: 0.9 },
          gate: { 'metric-tolerance': 1 },
        },
        true,
      ],
    ];
    for (const [config, valid] of cases) {
      expect(validateWithSchema(config), JSON.stringify(config)).toBe(valid);
      expect(validatorAccepts(config), JSON.stringify(config)).toBe(valid);
    }
  });

  test('a rule the schema cannot state: data.validation + data.judging below 1, checked by the validator', () => {
    const config = (validation: number, judging?: number) => ({
      data: { path: 'a.csv', target: 'c', validation, ...(judging === undefined ? {} : { judging }) },
      target: { threshold: 0.9 },
    });
    expect(validatorAccepts(config(0.5, 0.49))).toBe(true);
    expect(validatorAccepts(config(0.5, 0.5))).toBe(false);
    expect(validateWithSchema(config(0.5, 0.5))).toBe(true);
    // Without data.judging it follows validation and never breaks the rule.
    expect(validatorAccepts(config(0.95))).toBe(true);
  });
});

describe('shipped configs', () => {
  const dir = join(REPO_ROOT, 'examples', 'pump-vibration');
  const shipped = ['neuron-budget.yml', 'neuron-budget.pr.yml'];
  test.each(shipped)('examples/pump-vibration/%s validates against the schema and the validator', (name) => {
    const path = join(dir, name);
    expect(existsSync(path), `${path} should be shipped with the demo`).toBe(true);
    const text = readFileSync(path, 'utf8');
    const ok = validateWithSchema(parseYaml(text));
    expect(ok, JSON.stringify(validateWithSchema.errors)).toBe(true);
    expect(() => parseConfig(text, { file: path, root: REPO_ROOT })).not.toThrow();
  });

  test('a config with every key written validates against the schema', () => {
    const config: Record<string, Record<string, unknown>> = {};
    for (const section of CONFIG_SPEC) {
      config[section.name] = {};
      for (const key of section.keys) {
        const d = key.default;
        config[section.name][key.name] =
          d === DERIVED && key.rule.kind === 'number'
            ? 0.2
            : d === REQUIRED || d === DERIVED
              ? probes(key).find((v) => v !== null && typeof v === typeof '')
              : d;
      }
    }
    config.data = { ...config.data, path: 'readings.csv', target: 'condition', features: ['rms_velocity'] };
    config.target = { metric: 'accuracy', threshold: 0.95 };
    expect(validateWithSchema(config), JSON.stringify(validateWithSchema.errors)).toBe(true);
    expect(validatorAccepts(config)).toBe(true);
  });
});
