/**
 * Checks a parsed JSON document against one of our own JSON Schemas (schema/*.json), so each
 * file format has one definition: the schema editors read is the one the tool enforces. Only
 * the keywords our schemas use are understood (type, const, enum, properties, required,
 * additionalProperties, items, minItems, maxItems, minimum, maximum, pattern, maxLength, $ref
 * into $defs, anyOf, oneOf); a schema that uses any other keyword is refused when it is loaded,
 * so a schema cannot silently say more than is checked.
 *
 * The first problem is reported as `key: expected …, found …`, with the key written as a path
 * (`history[0].date`). A schema node's `title` is the "expected" phrase when it has one.
 */

import { quote } from './escape.js';

export type JsonSchema = {
  title?: string;
  description?: string;
  type?: JsonType | JsonType[];
  const?: unknown;
  enum?: unknown[];
  properties?: Record<string, JsonSchema>;
  required?: string[];
  additionalProperties?: boolean | JsonSchema;
  items?: JsonSchema;
  minItems?: number;
  maxItems?: number;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  minProperties?: number;
  pattern?: string;
  maxLength?: number;
  $ref?: string;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  $defs?: Record<string, JsonSchema>;
  $schema?: string;
  $id?: string;
};

type JsonType = 'object' | 'array' | 'string' | 'number' | 'integer' | 'boolean' | 'null';

export class SchemaProblem extends Error {
  constructor(
    /** Where, as a path (`result.width`, `history[0]`); '(top level)' for the document itself. */
    readonly key: string,
    readonly expected: string,
    /** What was found, described for a reader. */
    readonly found: string,
  ) {
    super(`${key}: expected ${expected}, found ${found}`);
    this.name = 'SchemaProblem';
  }
}

const KNOWN = new Set([
  'title',
  'description',
  'type',
  'const',
  'enum',
  'properties',
  'required',
  'additionalProperties',
  'items',
  'minItems',
  'maxItems',
  'minimum',
  'maximum',
  'exclusiveMinimum',
  'minProperties',
  'pattern',
  'maxLength',
  '$ref',
  'anyOf',
  'oneOf',
  '$defs',
  '$schema',
  '$id',
  '$comment',
]);

/** A validator for documents of one schema. Throws when the schema uses a keyword it does not check. */
export function schemaValidator(root: JsonSchema): (value: unknown) => void {
  checkKeywords(root, '#');
  const patterns = new Map<string, RegExp>();
  const regex = (p: string): RegExp => {
    let re = patterns.get(p);
    if (re === undefined) patterns.set(p, (re = new RegExp(p, 'u')));
    return re;
  };
  const resolve = (node: JsonSchema): JsonSchema => {
    if (node.$ref === undefined) return node;
    const m = /^#\/\$defs\/(.+)$/.exec(node.$ref);
    const target = m ? root.$defs?.[m[1]] : undefined;
    if (target === undefined) throw new Error(`schema: unresolved $ref ${node.$ref}`);
    return { ...target, ...(node.title ? { title: node.title } : {}) };
  };

  const check = (raw: JsonSchema, value: unknown, key: string): void => {
    const node = resolve(raw);
    const fail = (expected: string, found: unknown = value): never => {
      throw new SchemaProblem(key || '(top level)', node.title ?? expected, describe(found));
    };
    if (node.const !== undefined && value !== node.const) fail(JSON.stringify(node.const));
    if (node.enum !== undefined && !node.enum.includes(value))
      fail(`one of ${node.enum.map((v) => JSON.stringify(v)).join(', ')}`);
    if (node.type !== undefined) {
      const types = Array.isArray(node.type) ? node.type : [node.type];
      if (value === null && types.includes('null')) return;
      if (!types.some((t) => hasType(value, t)))
        fail(
          typePhrase(
            node,
            types.filter((t) => t !== 'null'),
          ),
        );
    }
    if (typeof value === 'number') {
      if (node.minimum !== undefined && value < node.minimum) fail(typePhrase(node, types(node)));
      if (node.maximum !== undefined && value > node.maximum) fail(typePhrase(node, types(node)));
      if (node.exclusiveMinimum !== undefined && value <= node.exclusiveMinimum) fail(typePhrase(node, types(node)));
    }
    if (typeof value === 'string') {
      if (node.maxLength !== undefined && value.length > node.maxLength)
        fail(`a string of at most ${node.maxLength} characters`);
      if (node.pattern !== undefined && !regex(node.pattern).test(value)) fail(`a string matching ${node.pattern}`);
    }
    if (Array.isArray(value)) {
      if (node.maxItems !== undefined && value.length > node.maxItems)
        fail(`a list of at most ${node.maxItems} entries`, value.length);
      if (node.minItems !== undefined && value.length < node.minItems)
        fail(`a list of at least ${node.minItems} entries`, value.length);
      if (node.items !== undefined) value.forEach((v, i) => check(node.items!, v, `${key}[${i}]`));
    }
    if (isObject(value)) {
      const props = node.properties ?? {};
      if (node.minProperties !== undefined && Object.keys(value).length < node.minProperties) {
        fail(`an object with at least ${node.minProperties} key${node.minProperties === 1 ? '' : 's'}`);
      }
      for (const [name, child] of Object.entries(value)) {
        if (Object.hasOwn(props, name)) check(props[name], child, join(key, name));
        else if (node.additionalProperties === false) {
          throw new SchemaProblem(
            join(key, name),
            `no such key (allowed: ${Object.keys(props).join(', ')})`,
            describe(child),
          );
        } else if (typeof node.additionalProperties === 'object')
          check(node.additionalProperties, child, join(key, name));
      }
      // What is there is checked before what is missing: a wrong value says more than a later absent key.
      for (const name of node.required ?? []) {
        if (!Object.hasOwn(value, name))
          throw new SchemaProblem(join(key, name), expectedOf(resolve(props[name] ?? {})), MISSING_KEY);
      }
    }
    if (node.anyOf !== undefined) {
      if (!node.anyOf.some((branch) => passes(branch, value, key)))
        fail(node.anyOf.map((b) => expectedOf(resolve(b))).join(' or '));
    }
    if (node.oneOf !== undefined) {
      // Our oneOf branches are told apart by a `kind` constant: check the branch the document names.
      const kinds: unknown[] = node.oneOf.map((b) => resolve(b).properties?.['kind']?.const);
      if (!kinds.includes(undefined) && isObject(value)) {
        const at = kinds.indexOf(value['kind']);
        if (at < 0)
          throw new SchemaProblem(
            join(key, 'kind'),
            `one of ${kinds.map((k) => JSON.stringify(k)).join(', ')}`,
            describe(Object.hasOwn(value, 'kind') ? value['kind'] : MISSING),
          );
        check(node.oneOf[at], value, key);
      } else {
        // When the value's type leaves one branch (null or an object, say), check that one: its error is the precise one.
        const typed = node.oneOf.filter((b) => {
          const t = resolve(b).type;
          const all = t === undefined ? [] : Array.isArray(t) ? t : [t];
          return all.length === 0 || all.some((x) => hasType(value, x));
        });
        if (typed.length === 1) check(typed[0], value, key);
        else if (node.oneOf.filter((branch) => passes(branch, value, key)).length !== 1) {
          fail(node.oneOf.map((b) => expectedOf(resolve(b))).join(' or '));
        }
      }
    }
  };
  const passes = (node: JsonSchema, value: unknown, key: string): boolean => {
    try {
      check(node, value, key);
      return true;
    } catch (e) {
      if (e instanceof SchemaProblem) return false;
      throw e;
    }
  };
  return (value) => check(root, value, '');
}

const MISSING = Symbol('missing');
const MISSING_KEY = 'nothing (the key is missing)';

function checkKeywords(node: JsonSchema, where: string): void {
  for (const [k, v] of Object.entries(node)) {
    if (!KNOWN.has(k)) throw new Error(`schema: keyword ${k} at ${where} is not checked by schemaValidator`);
    if (k === 'properties' || k === '$defs')
      for (const [name, child] of Object.entries(v as object))
        checkKeywords(child as JsonSchema, `${where}/${k}/${name}`);
    if ((k === 'items' || k === 'additionalProperties') && typeof v === 'object')
      checkKeywords(v as JsonSchema, `${where}/${k}`);
    if (k === 'anyOf' || k === 'oneOf')
      (v as JsonSchema[]).forEach((child, i) => checkKeywords(child, `${where}/${k}/${i}`));
  }
}

function types(node: JsonSchema): JsonType[] {
  const t = node.type === undefined ? [] : Array.isArray(node.type) ? node.type : [node.type];
  return t.filter((x) => x !== 'null');
}

function hasType(value: unknown, type: JsonType): boolean {
  switch (type) {
    case 'object':
      return isObject(value);
    case 'array':
      return Array.isArray(value);
    case 'string':
      return typeof value === 'string';
    case 'number':
      return typeof value === 'number' && Number.isFinite(value);
    case 'integer':
      return typeof value === 'number' && Number.isInteger(value);
    case 'boolean':
      return typeof value === 'boolean';
    case 'null':
      return value === null;
  }
}

/** "an integer of at least 1", "a number", "a list", … */
function typePhrase(node: JsonSchema, ts: JsonType[]): string {
  const bound = (): string => {
    const parts: string[] = [];
    if (node.minimum !== undefined && node.maximum !== undefined) return ` from ${node.minimum} to ${node.maximum}`;
    if (node.exclusiveMinimum !== undefined) parts.push(` above ${node.exclusiveMinimum}`);
    if (node.minimum !== undefined) parts.push(` of at least ${node.minimum}`);
    if (node.maximum !== undefined) parts.push(` of at most ${node.maximum}`);
    return parts.join('');
  };
  const one = (t: JsonType): string => {
    switch (t) {
      case 'object':
        return 'an object';
      case 'array':
        return 'a list';
      case 'string':
        return 'a string';
      case 'number':
        return `a number${bound()}`;
      case 'integer':
        return `an integer${bound()}`;
      case 'boolean':
        return 'true or false';
      case 'null':
        return 'null';
    }
  };
  return ts.length === 0 ? 'a value' : ts.map(one).join(' or ');
}

function expectedOf(node: JsonSchema): string {
  if (node.title !== undefined) return node.title;
  if (node.const !== undefined) return JSON.stringify(node.const);
  if (node.enum !== undefined) return `one of ${node.enum.map((v) => JSON.stringify(v)).join(', ')}`;
  return typePhrase(node, types(node));
}

function join(key: string, child: string): string {
  return key === '' ? child : `${key}.${child}`;
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** A found value for a message: short, and never a repository string in full. */
function describe(v: unknown): string {
  if (v === MISSING) return 'nothing';
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object') return 'an object';
  if (typeof v === 'string') return quote(v, 60);
  return typeof v === 'number' || typeof v === 'boolean' ? String(v) : typeof v;
}
