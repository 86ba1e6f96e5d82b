/**
 * Reads and validates the YAML config into a typed Config with every default filled in.
 * Every error is a UserError that names the file, the line and column, and the key, and
 * says what was expected and what was found.
 */
import { readFile } from 'node:fs/promises';
import { dirname, relative, resolve, sep } from 'node:path';
import { isAlias, isMap, isScalar, isSeq, LineCounter, parseDocument, type Document, type Node, type Pair } from 'yaml';
import { UserError } from '../errors.js';
import { checkInside, isInside } from './paths.js';
import { CONFIG_SPEC, DERIVED, REQUIRED, type KeySpec, type SectionSpec, type ValueRule } from './spec.js';
import { didYouMean } from './suggest.js';
import type { Config, DataConfig, GateConfig, MetricName, SearchConfig, TargetConfig } from './types.js';

export { CONFIG_SPEC } from './spec.js';

/** How a file is named in messages: relative to the workspace root when inside it, forward slashes. */
export function displayPath(root: string, file: string): string {
  const absolute = resolve(file);
  if (!isInside(resolve(root), absolute)) return absolute;
  return relative(resolve(root), absolute).split(sep).join('/') || '.';
}

export async function loadConfig(configPath: string, root: string): Promise<Config> {
  const file = resolve(root, configPath);
  const shown = displayPath(root, file);
  let text: string;
  try {
    text = await readFile(file, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') {
      throw new UserError(`${shown}: config file not found (looked for ${file})`, { file: shown });
    }
    if (code === 'EISDIR')
      throw new UserError(`${shown}: expected a YAML config file, found a folder`, { file: shown });
    if (code === 'EACCES')
      throw new UserError(`${shown}: config file cannot be read (permission denied)`, { file: shown });
    throw error;
  }
  return parseConfig(text, { file, root });
}

/** Validates config text as if it were the file `file` (absolute) inside workspace `root`. */
export function parseConfig(text: string, where: { file: string; root: string }): Config {
  // Editors do not count a byte-order mark as a column; neither do we.
  return new ConfigReader(text.replace(/^\uFEFF/, ''), resolve(where.file), resolve(where.root)).read();
}

type Found = { node: Node | null; keyNode: Node; key: string };

class ConfigReader {
  private readonly lines = new LineCounter();
  private readonly shown: string;
  private readonly doc: Document.Parsed;

  constructor(
    private readonly text: string,
    private readonly file: string,
    private readonly root: string,
  ) {
    this.shown = displayPath(root, file);
    this.doc = parseDocument(text, { lineCounter: this.lines, uniqueKeys: true, prettyErrors: false });
  }

  read(): Config {
    this.checkSyntax();
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
    return this.build(values, sections);
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
      throw this.errorAt(offset, null, `key "${key}" appears twice in the same mapping; keep one`);
    }
    const reason = first.message
      .replace(/ at line \d+, column \d+[\s\S]*$/, '')
      .replace(/\s+/g, ' ')
      .trim();
    throw this.errorAt(offset, null, `YAML syntax error: ${reason}`);
  }

  private errorAt(offset: number, key: string | null, message: string): UserError {
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
  private error(node: Node | null | undefined, key: string | null, message: string): UserError {
    return this.errorAt(node?.range?.[0] ?? 0, key, message);
  }

  /** Locates a bad value: at the value itself, or at its key when the value is empty. */
  private valueError(found: Found, message: string): UserError {
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
      if (typeof v === 'string') return JSON.stringify(v);
      if (typeof v === 'number' || typeof v === 'boolean' || typeof v === 'bigint') return String(v);
      return 'a value of an unsupported type';
    }
    return 'a value of an unsupported type';
  }

  // ---- sections and keys ----------------------------------------------------------

  private readSection(spec: SectionSpec, section: Found | undefined): Map<string, Found> {
    const out = new Map<string, Found>();
    if (!section || section.node === null || (isScalar(section.node) && section.node.value === null)) {
      if (spec.required) {
        const missing = spec.keys.filter((k) => k.default === REQUIRED).map((k) => `${spec.name}.${k.name}`);
        const at = section ? section.keyNode : null;
        throw this.error(at, spec.name, `section is required (with ${missing.join(' and ')}); ${spec.description}`);
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

  /** The value of one key checked against its rule, or its default. */
  private value(section: Map<string, Found>, sectionName: string, name: string): unknown {
    const spec = CONFIG_SPEC.find((s) => s.name === sectionName)!.keys.find((k) => k.name === name)!;
    const found = section.get(name);
    if (!found) {
      if (spec.default === REQUIRED || spec.default === DERIVED) return undefined;
      return Array.isArray(spec.default) ? [...spec.default] : spec.default;
    }
    return this.checkRule(found, spec);
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
          if (seen.has(v)) throw this.error(item, found.key, `column "${v}" is listed twice`);
          seen.add(v);
          out.push(v);
        }
        return out;
      }
    }
  }

  // ---- the typed config and the rules between keys ---------------------------------

  private build(values: Map<string, Map<string, Found>>, sections: Map<string, Found>): Config {
    const d = values.get('data')!;
    const t = values.get('target')!;
    const s = values.get('search')!;
    const g = values.get('gate')!;
    const v = <T>(section: Map<string, Found>, sectionName: string, name: string): T =>
      this.value(section, sectionName, name) as T;
    const baseDir = dirname(this.file);

    const pathAsWritten = v<string>(d, 'data', 'path');
    const target = v<string>(d, 'data', 'target');
    const features = v<string[] | null>(d, 'data', 'features');
    const ignore = v<string[]>(d, 'data', 'ignore');
    for (const [list, name] of [
      [features, 'features'],
      [ignore, 'ignore'],
    ] as const) {
      if (list?.includes(target)) {
        throw this.valueError(
          d.get(name)!,
          `lists the target column "${target}"; the target cannot also be ${name === 'features' ? 'a feature' : 'ignored'}`,
        );
      }
    }
    const both = features?.find((f) => ignore.includes(f));
    if (both !== undefined) {
      throw this.valueError(
        d.get('ignore')!,
        `column "${both}" is both in data.features and in data.ignore; keep it in one`,
      );
    }
    const data: DataConfig = {
      path: this.insidePath(d.get('path')!, baseDir, pathAsWritten),
      pathAsWritten,
      target,
      features,
      ignore,
      task: v(d, 'data', 'task'),
      validation: v(d, 'data', 'validation'),
      delimiter: v(d, 'data', 'delimiter'),
      maxCategories: v(d, 'data', 'max-categories'),
      missing: v(d, 'data', 'missing'),
    };

    const metricGiven = v<MetricName | undefined>(t, 'target', 'metric');
    const metric: MetricName = metricGiven ?? (data.task === 'regression' ? 'rmse' : 'accuracy');
    if (metricGiven !== undefined && data.task !== 'auto') {
      const fits = data.task === 'classification' ? metric === 'accuracy' : metric !== 'accuracy';
      if (!fits) {
        const expected = data.task === 'classification' ? 'accuracy' : 'rmse, mae or max-abs-error';
        throw this.valueError(
          t.get('metric')!,
          `data.task is ${data.task}, so expected ${expected}, found "${metric}"`,
        );
      }
    }
    const threshold = v<number>(t, 'target', 'threshold');
    if (metric === 'accuracy' && threshold > 1) {
      throw this.valueError(
        t.get('threshold')!,
        `expected an accuracy above 0 and at most 1, found ${threshold} (write 95% as 0.95)`,
      );
    }
    const targetConfig: TargetConfig = { metric, threshold };

    const search: SearchConfig = {
      minWidth: v(s, 'search', 'min-width'),
      maxWidth: v(s, 'search', 'max-width'),
      restarts: v(s, 'search', 'restarts'),
      required: v(s, 'search', 'required'),
      maxEpochs: v(s, 'search', 'max-epochs'),
      seed: v(s, 'search', 'seed'),
      growth: v(s, 'search', 'growth'),
      activation: v(s, 'search', 'activation'),
      optimizer: v(s, 'search', 'optimizer'),
      init: v(s, 'search', 'init'),
      checkEvery: v(s, 'search', 'check-every'),
      pruneEpochs: v(s, 'search', 'prune-epochs'),
      prune: v(s, 'search', 'prune'),
      timeBudget: v(s, 'search', 'time-budget'),
      maxTrainings: v(s, 'search', 'max-trainings'),
      workers: v(s, 'search', 'workers'),
    };
    const searchFound = sections.get('search');
    this.ordered(s, searchFound, 'max-width', search.maxWidth, 'at least', 'min-width', search.minWidth);
    this.ordered(s, searchFound, 'required', search.required, 'at most', 'restarts', search.restarts);
    this.ordered(s, searchFound, 'check-every', search.checkEvery, 'at most', 'max-epochs', search.maxEpochs);

    const baselineAsWritten = v<string>(g, 'gate', 'baseline');
    const gateMaxWidth = v<number | null>(g, 'gate', 'max-width');
    if (gateMaxWidth !== null && gateMaxWidth < search.minWidth) {
      throw this.valueError(
        g.get('max-width')!,
        `expected at least search.min-width (${search.minWidth}), found ${gateMaxWidth}; every width tried would be over the budget`,
      );
    }
    const metricTolerance = v<number>(g, 'gate', 'metric-tolerance');
    if (metric === 'accuracy' && metricTolerance >= 1) {
      throw this.valueError(
        g.get('metric-tolerance')!,
        `expected a tolerance below 1 for accuracy, found ${metricTolerance}`,
      );
    }
    const gate: GateConfig = {
      baseline: g.has('baseline')
        ? this.insidePath(g.get('baseline')!, baseDir, baselineAsWritten)
        : this.defaultInside(baseDir, baselineAsWritten, 'gate.baseline'),
      baselineAsWritten,
      maxWidth: gateMaxWidth,
      allowedGrowth: v(g, 'gate', 'allowed-growth'),
      metricTolerance,
    };

    return { file: this.file, root: this.root, data, target: targetConfig, search, gate };
  }

  /** search.`name` must be at least / at most search.`otherName`; the error points at whichever was written. */
  private ordered(
    section: Map<string, Found>,
    sectionFound: Found | undefined,
    name: string,
    value: number,
    relation: 'at least' | 'at most',
    otherName: string,
    other: number,
  ): void {
    if (relation === 'at least' ? value >= other : value <= other) return;
    const written = section.get(name);
    if (written) {
      throw this.valueError(
        written,
        `expected search.${name} to be ${relation} search.${otherName} (${other}), found ${value}`,
      );
    }
    // Only the other key was written: blame it, against this key's default.
    const otherWritten = section.get(otherName);
    const reverse = relation === 'at least' ? 'at most' : 'at least';
    const message = `expected search.${otherName} to be ${reverse} search.${name} (${value}, the default), found ${other}`;
    if (otherWritten) throw this.valueError(otherWritten, message);
    throw this.error(sectionFound?.keyNode ?? null, `search.${otherName}`, message);
  }

  private insidePath(found: Found, baseDir: string, p: string): string {
    const result = checkInside(this.root, baseDir, p);
    if (!result.ok) throw this.valueError(found, `${result.reason}; paths must stay inside the workspace`);
    return result.path;
  }

  private defaultInside(baseDir: string, p: string, key: string): string {
    const result = checkInside(this.root, baseDir, p);
    if (!result.ok) {
      throw this.error(
        null,
        key,
        `the default ${result.reason} (the config file is outside the workspace); set ${key}`,
      );
    }
    return result.path;
  }
}

/** "an integer from 1 to 1000", "one of tanh, logistic, relu", … for messages. */
export function describeRule(rule: ValueRule): string {
  const orNull = 'nullable' in rule && rule.nullable ? ', or null' : '';
  switch (rule.kind) {
    case 'integer':
      return `an integer from ${rule.min} to ${rule.max}${orNull}`;
    case 'number': {
      const low = rule.exclusiveMin ? `above ${rule.min}` : `of ${rule.min} or more`;
      if (rule.max === Number.MAX_VALUE) return `a number ${low}${orNull}`;
      if (rule.exclusiveMax)
        return `a number ${rule.exclusiveMin ? low : `from ${rule.min}`} and below ${rule.max}${orNull}`;
      return `a number ${rule.exclusiveMin ? low : `from ${rule.min}`} and at most ${rule.max}${orNull}`;
    }
    case 'enum':
      return `one of ${rule.values.join(', ')}${orNull}`;
    case 'boolean':
      return 'true or false';
    case 'text':
      return 'a column name (text)';
    case 'character':
      return 'a single character other than a quote or a line break';
    case 'path':
      return 'a path relative to the config file';
    case 'text-list':
      return `a list of column names${rule.minItems > 0 ? ` (at least ${rule.minItems})` : ''}${orNull}`;
  }
}

/**
 * Where a dotted key (`target.metric`) is written in a config file, for errors found after
 * validation (when the data show the metric does not suit the task). Falls back to the
 * enclosing section, then to null.
 */
export async function keyPosition(file: string, dottedKey: string): Promise<{ line: number; column: number } | null> {
  const text = await readFile(file, 'utf8').catch(() => null);
  if (text === null) return null;
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines });
  const parts = dottedKey.split('.');
  while (parts.length > 0) {
    const pair = doc.getIn(parts.slice(0, -1), true);
    const map = parts.length === 1 ? doc.contents : pair;
    if (map && isMap(map)) {
      const found = (map.items as Pair<Node, Node | null>[]).find(
        (p) => isScalar(p.key) && p.key.value === parts[parts.length - 1],
      );
      if (found?.key.range) {
        const { line, col } = lines.linePos(found.key.range[0]);
        return { line, column: col };
      }
    }
    parts.pop();
  }
  return null;
}
