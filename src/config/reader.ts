/**
 * The YAML side of the config: parses the text once, walks it against the key list in spec.ts,
 * and checks each value against its rule. Every error names the file, the line and column, and
 * the key, and says what was expected and what was found. Where each key is written is kept, so
 * errors found later (after the data are read) still point at the right line.
 */
import {
  isAlias,
  isMap,
  isScalar,
  isSeq,
  LineCounter,
  parseDocument,
  visit,
  type Document,
  type Node,
  type Pair,
} from 'yaml';
import { quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';
import { didYouMean } from '../common/suggest.js';
import { CONFIG_SPEC, DERIVED, REQUIRED, type KeySpec, type SectionSpec } from './spec.js';
import { describeRule } from './keys.js';
import type { KeyPosition, RecallRule } from './types.js';

/** A key as written: its value node (null when empty), the key node, and the dotted key. */
export interface Found {
  node: Node | null;
  keyNode: Node;
  key: string;
}

/** The keys written in the file, by section and by key name. */
export interface WrittenKeys {
  sections: Map<string, Found>;
  values: Map<string, Map<string, Found>>;
}

/** YAML tags a config may carry: the core schema's plain types. Anything else is refused. */
const CORE_TAGS = new Set(['str', 'int', 'float', 'bool', 'null', 'seq', 'map'].map((t) => `tag:yaml.org,2002:${t}`));
const NUMBER_TAGS = new Set(['tag:yaml.org,2002:int', 'tag:yaml.org,2002:float']);
const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

export class ConfigReader {
  private readonly lines = new LineCounter();
  private readonly doc: Document.Parsed;

  constructor(
    private readonly text: string,
    /** The file as named in messages. */
    private readonly shown: string,
  ) {
    this.doc = parseDocument(text, { lineCounter: this.lines, uniqueKeys: true, prettyErrors: false });
  }

  /** Checks the syntax and the sections and keys against spec.ts; values are checked by `value`. */
  read(): WrittenKeys {
    this.checkSyntax();
    this.checkTags();
    const top = this.doc.contents;
    if (top === null || (isScalar(top) && top.value === null)) {
      throw this.error(
        null,
        null,
        'the config file is empty; expected a mapping with the sections data, target, search and gate',
      );
    }
    if (!isMap(top)) {
      throw this.error(
        top,
        null,
        `expected a mapping with the sections data, target, search and gate, found ${this.describe(top)}`,
      );
    }
    const sections = new Map<string, Found>();
    for (const pair of top.items as Pair<Node, Node | null>[]) {
      const name = this.keyName(pair, '');
      const spec = CONFIG_SPEC.find((s) => s.name === name);
      if (!spec) {
        const names = CONFIG_SPEC.map((s) => s.name);
        throw this.error(
          pair.key,
          name,
          `unknown section${didYouMean(name, names)}; the sections are ${names.join(', ')}`,
        );
      }
      sections.set(name, { node: this.deref(pair.value), keyNode: pair.key, key: name });
    }
    const values = new Map<string, Map<string, Found>>();
    for (const spec of CONFIG_SPEC) values.set(spec.name, this.readSection(spec, sections.get(spec.name)));
    return { sections, values };
  }

  /** Where every written section and key is (dotted key → line and column of the key). */
  positions(written: WrittenKeys): Map<string, KeyPosition> {
    const out = new Map<string, KeyPosition>();
    const add = (found: Found): void => {
      const { line, col } = this.lines.linePos(found.keyNode.range?.[0] ?? 0);
      out.set(found.key, { line, column: col });
    };
    for (const found of written.sections.values()) add(found);
    for (const section of written.values.values()) for (const found of section.values()) add(found);
    return out;
  }

  // ---- syntax and locations -------------------------------------------------------

  private checkSyntax(): void {
    const first = this.doc.errors[0];
    if (!first) return;
    const offset = first.pos[0];
    if (first.code === 'MULTIPLE_DOCS') {
      throw this.errorAt(offset, null, 'expected one YAML document, found a second one (a "---" line)');
    }
    if (first.code === 'DUPLICATE_KEY') {
      const key = /^\s*["']?([^"':\n]*)/.exec(this.text.slice(offset))?.[1]?.trim() ?? '';
      throw this.errorAt(offset, null, `key ${quote(key)} appears twice in the same mapping; keep one`);
    }
    const reason = first.message
      .replace(/ at line \d+, column \d+[\s\S]*$/, '')
      .replace(/\s+/g, ' ')
      .trim();
    throw this.errorAt(offset, null, `YAML syntax error: ${reason}`);
  }

  /**
   * Refuses tags outside the core schema (`!custom`, `!!binary`, `!!set`, …), which would
   * otherwise pass silently as plain text. `!!float 1` and `!!int 3` are numbers, as written.
   */
  private checkTags(): void {
    visit(this.doc, {
      Node: (_key, node) => {
        if (!isScalar(node) && !isMap(node) && !isSeq(node)) return;
        const tag = node.tag;
        if (tag === undefined) return;
        if (!CORE_TAGS.has(tag)) {
          const shown = tag.startsWith('tag:yaml.org,2002:') ? `!!${tag.slice('tag:yaml.org,2002:'.length)}` : tag;
          throw this.errorAt(
            this.tagOffset(node),
            null,
            `unsupported YAML tag ${quote(shown)}; the config takes plain values (text, numbers, true/false, null, lists, mappings), so remove the tag`,
          );
        }
        if (isScalar(node) && NUMBER_TAGS.has(tag) && typeof node.value === 'string') {
          const text = node.value.trim();
          if (!DECIMAL.test(text)) {
            throw this.error(
              node,
              null,
              `the tag ${tag.endsWith('int') ? '!!int' : '!!float'} needs a number, found ${quote(node.value)}`,
            );
          }
          node.value = Number(text);
        }
      },
    });
  }

  /** Where a tagged node's tag is written (the node's range starts after it), else the node. */
  private tagOffset(node: Node): number {
    const start = node.range?.[0] ?? 0;
    let end = start;
    while (end > 0 && /\s/.test(this.text[end - 1])) end--;
    let tag = end;
    while (tag > 0 && !/\s/.test(this.text[tag - 1])) tag--;
    return this.text[tag] === '!' && tag < end ? tag : start;
  }

  errorAt(offset: number, key: string | null, message: string): UserError {
    const { line, col } = this.lines.linePos(Math.min(offset, this.text.length));
    const prefix = key === null ? '' : `${key}: `;
    return new UserError(`${this.shown}:${line}:${col}: ${prefix}${message}`, {
      file: this.shown,
      line,
      column: col,
      ...(key === null ? {} : { key }),
    });
  }

  /** An error located at `node` (or the file's start when null). */
  error(node: Node | null | undefined, key: string | null, message: string): UserError {
    return this.errorAt(node?.range?.[0] ?? 0, key, message);
  }

  /** Locates a bad value: at the value itself, or at its key when the value is empty. */
  valueError(found: Found, message: string): UserError {
    const empty =
      found.node === null || (isScalar(found.node) && found.node.value === null && found.node.source === '');
    return this.error(empty ? found.keyNode : found.node, found.key, message);
  }

  private keyName(pair: Pair<Node, Node | null>, prefix: string): string {
    const key = pair.key;
    if (!isScalar(key) || (typeof key.value !== 'string' && typeof key.value !== 'number')) {
      throw this.error(
        key,
        null,
        `expected a key name${prefix ? ` in ${prefix.slice(0, -1)}` : ''}, found ${this.describe(key)}`,
      );
    }
    return String(key.value);
  }

  private deref(node: Node | null): Node | null {
    if (node && isAlias(node)) return (node.resolve(this.doc) as Node | undefined) ?? null;
    return node;
  }

  private describe(node: Node | null): string {
    if (node === null) return 'nothing';
    if (isMap(node)) return 'a mapping';
    if (isSeq(node)) return 'a list';
    if (isScalar(node)) {
      const v = node.value;
      if (v === null) return node.source === '' || node.source === undefined ? 'nothing' : `null`;
      if (typeof v === 'string') return quote(v);
      if (typeof v === 'number' || typeof v === 'boolean' || typeof v === 'bigint') return String(v);
    }
    return 'a value of an unsupported type';
  }

  // ---- sections and keys ----------------------------------------------------------

  private readSection(spec: SectionSpec, section: Found | undefined): Map<string, Found> {
    const out = new Map<string, Found>();
    if (!section || section.node === null || (isScalar(section.node) && section.node.value === null)) {
      if (spec.required) {
        const missing = spec.keys.filter((k) => k.default === REQUIRED).map((k) => `${spec.name}.${k.name}`);
        throw this.error(
          section?.keyNode ?? null,
          spec.name,
          `section is required (with ${missing.join(' and ')}); ${spec.description}`,
        );
      }
      return out;
    }
    if (!isMap(section.node)) {
      throw this.error(
        section.node,
        spec.name,
        `expected a mapping of ${spec.name} settings, found ${this.describe(section.node)}`,
      );
    }
    const names = spec.keys.map((k) => k.name);
    for (const pair of section.node.items as Pair<Node, Node | null>[]) {
      const name = this.keyName(pair, `${spec.name}.`);
      const full = `${spec.name}.${name}`;
      if (!names.includes(name)) {
        throw this.error(
          pair.key,
          full,
          `unknown key${didYouMean(name, names)}; ${spec.name} accepts ${names.join(', ')}`,
        );
      }
      out.set(name, { node: this.deref(pair.value), keyNode: pair.key, key: full });
    }
    for (const key of spec.keys) {
      if (key.default === REQUIRED && !out.has(key.name)) {
        throw this.error(section.keyNode, `${spec.name}.${key.name}`, `required key is missing (${key.description})`);
      }
    }
    return out;
  }

  /** The value of one key checked against its rule, or its default (undefined for required and derived keys). */
  value(found: Found | undefined, spec: KeySpec): unknown {
    if (!found) {
      if (spec.default === REQUIRED || spec.default === DERIVED) return undefined;
      return Array.isArray(spec.default) ? [...spec.default] : spec.default;
    }
    return this.checkRule(found, spec);
  }

  /** target.min-recall: one floor for every class, or floors for named classes. */
  private recallRule(found: Found, node: Node | null, expected: string): RecallRule {
    const floor = (value: unknown): value is number => typeof value === 'number' && value > 0 && value <= 1;
    if (node !== null && isScalar(node)) {
      if (!floor(node.value)) throw this.valueError(found, `expected ${expected}, found ${this.describe(node)}`);
      return { every: node.value };
    }
    if (node === null || !isMap(node) || node.items.length === 0) {
      throw this.valueError(found, `expected ${expected}, found ${this.describe(node)}`);
    }
    const classes: { label: string; min: number }[] = [];
    for (const pair of node.items as Pair<Node, Node | null>[]) {
      const label = this.keyName(pair, `${found.key}.`);
      const value = this.deref(pair.value);
      const v = value !== null && isScalar(value) ? value.value : undefined;
      if (!floor(v)) {
        throw this.error(
          value ?? pair.key,
          `${found.key}.${label}`,
          `expected a recall above 0 and at most 1, found ${this.describe(value)}`,
        );
      }
      classes.push({ label, min: v });
    }
    return { classes };
  }

  private checkRule(found: Found, spec: KeySpec): unknown {
    const rule = spec.rule;
    const node = found.node;
    const scalar = node !== null && isScalar(node) ? node.value : undefined;
    const isNull = node === null || (isScalar(node) && node.value === null);
    const expected = describeRule(rule);
    const bad = (): UserError => this.valueError(found, `expected ${expected}, found ${this.describe(node)}`);
    if (isNull && 'nullable' in rule && rule.nullable) return null;
    switch (rule.kind) {
      case 'integer':
      case 'number': {
        if (typeof scalar !== 'number' || !Number.isFinite(scalar)) throw bad();
        if (rule.kind === 'integer' && !Number.isInteger(scalar)) throw bad();
        const exMin = rule.kind === 'number' && rule.exclusiveMin;
        const exMax = rule.kind === 'number' && rule.exclusiveMax;
        if (scalar < rule.min || (exMin && scalar === rule.min)) throw bad();
        if (scalar > rule.max || (exMax && scalar === rule.max)) throw bad();
        return scalar;
      }
      case 'enum': {
        if (typeof scalar !== 'string' || !rule.values.includes(scalar)) {
          const hint = typeof scalar === 'string' ? didYouMean(scalar, rule.values) : '';
          throw this.valueError(found, `expected ${expected}, found ${this.describe(node)}${hint}`);
        }
        return scalar;
      }
      case 'boolean': {
        if (typeof scalar !== 'boolean') throw bad();
        return scalar;
      }
      case 'text':
      case 'path': {
        if (typeof scalar === 'number' && rule.kind === 'text') {
          throw this.valueError(
            found,
            `expected ${expected}, found the number ${this.describe(node)} (put a column name that looks like a number in quotes)`,
          );
        }
        if (typeof scalar !== 'string' || scalar.trim() === '') throw bad();
        return scalar;
      }
      case 'character': {
        if (typeof scalar !== 'string' || [...scalar].length !== 1 || /["\r\n]/.test(scalar)) throw bad();
        return scalar;
      }
      case 'text-list': {
        if (node === null || !isSeq(node)) throw bad();
        if (node.items.length < rule.minItems)
          throw this.valueError(found, `expected ${expected}, found an empty list`);
        const seen = new Set<string>();
        const out: string[] = [];
        for (const raw of node.items as (Node | null)[]) {
          const item = this.deref(raw);
          const v = item !== null && isScalar(item) ? item.value : undefined;
          if (typeof v !== 'string' || v.trim() === '') {
            const hint = typeof v === 'number' ? ' (put a column name that looks like a number in quotes)' : '';
            throw this.error(
              item ?? node,
              found.key,
              `expected column names as text, found ${this.describe(item)}${hint}`,
            );
          }
          if (seen.has(v)) throw this.error(item, found.key, `column ${quote(v)} is listed twice`);
          seen.add(v);
          out.push(v);
        }
        return out;
      }
      case 'recall':
        return this.recallRule(found, node, expected);
    }
  }
}
