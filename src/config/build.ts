/**
 * From checked values to the typed Config: every key of spec.ts becomes a field of its section
 * (camelCase), paths become absolute inside the workspace, and the rules between keys are
 * checked (each error points at the key that was written).
 */
import { dirname } from 'node:path';
import { quote } from '../common/escape.js';
import { checkInside } from '../common/paths.js';
import { defaultMetric, metricFitsTask, metricsFor, type MetricName } from '../common/metric.js';
import type { ConfigReader, Found, WrittenKeys } from './reader.js';
import { CONFIG_SPEC } from './spec.js';
import { derivedJudging, fieldName } from './keys.js';
import type { Config } from './types.js';

type Section = Record<string, unknown>;

export function buildConfig(reader: ConfigReader, written: WrittenKeys, file: string, root: string): Config {
  const baseDir = dirname(file);
  const sections: Record<string, Section> = {};
  for (const spec of CONFIG_SPEC) {
    const found = written.values.get(spec.name) ?? new Map<string, Found>();
    const section: Section = {};
    for (const key of spec.keys) {
      const at = found.get(key.name);
      const value = reader.value(at, key);
      const field = fieldName(key.name);
      if (key.rule.kind === 'path' && typeof value === 'string') {
        section[field] = insidePath(reader, at, root, baseDir, value, `${spec.name}.${key.name}`);
        section[`${field}AsWritten`] = value;
      } else {
        section[field] = value;
      }
    }
    sections[spec.name] = section;
  }
  const config = {
    file,
    root,
    data: sections['data'],
    target: sections['target'],
    search: sections['search'],
    gate: sections['gate'],
    positions: reader.positions(written),
    metricGiven: written.values.get('target')?.has('metric') ?? false,
  } as unknown as Config;
  checkRules(reader, written, config);
  return config;
}

function insidePath(
  reader: ConfigReader,
  found: Found | undefined,
  root: string,
  baseDir: string,
  p: string,
  key: string,
): string {
  const result = checkInside(root, baseDir, p);
  if (result.ok) return result.path;
  if (found) throw reader.valueError(found, `${result.reason}; paths must stay inside the workspace`);
  throw reader.error(null, key, `the default ${result.reason} (the config file is outside the workspace); set ${key}`);
}

/** The rules between keys, each reported at the key the user wrote. */
function checkRules(reader: ConfigReader, written: WrittenKeys, config: Config): void {
  const at = (section: string, key: string): Found | undefined => written.values.get(section)?.get(key);
  const { data, target, search, gate } = config;

  for (const [list, name] of [
    [data.features, 'features'],
    [data.ignore, 'ignore'],
  ] as const) {
    if (list?.includes(data.target)) {
      const role = name === 'features' ? 'a feature' : 'ignored';
      throw reader.valueError(
        at('data', name)!,
        `lists the target column ${quote(data.target)}; the target cannot also be ${role}`,
      );
    }
  }
  const both = data.features?.find((f) => data.ignore.includes(f));
  if (both !== undefined) {
    throw reader.valueError(
      at('data', 'ignore')!,
      `column ${quote(both)} is both in data.features and in data.ignore; keep it in one`,
    );
  }

  if (data.judging === undefined) data.judging = derivedJudging(data.validation);
  if (data.validation + data.judging >= 1) {
    const found = at('data', 'judging') ?? at('data', 'validation')!;
    throw reader.valueError(
      found,
      `expected data.validation + data.judging below 1 (some rows must be left to train on), found ${data.validation} + ${data.judging}`,
    );
  }

  if (!config.metricGiven) target.metric = defaultMetric(data.task === 'regression' ? 'regression' : 'classification');
  if (config.metricGiven && data.task !== 'auto' && !metricFitsTask(target.metric, data.task)) {
    throw reader.valueError(
      at('target', 'metric')!,
      `data.task is ${data.task}, so expected ${metricsFor(data.task)
        .join(', ')
        .replace(/, (?=[^,]*$)/, ' or ')}, found "${target.metric}"`,
    );
  }
  const thresholdAt = at('target', 'threshold')!;
  if (config.metricGiven || data.task === 'classification')
    checkThreshold(reader, thresholdAt, target.metric, target.threshold);

  const searchFound = written.sections.get('search');
  const ordered = (name: string, relation: 'at least' | 'at most', otherName: string): void => {
    const value = search[fieldName(name) as keyof typeof search] as number;
    const other = search[fieldName(otherName) as keyof typeof search] as number;
    if (relation === 'at least' ? value >= other : value <= other) return;
    const mine = at('search', name);
    if (mine)
      throw reader.valueError(
        mine,
        `expected search.${name} to be ${relation} search.${otherName} (${other}), found ${value}`,
      );
    // Only the other key was written: blame it, against this key's default.
    const reverse = relation === 'at least' ? 'at most' : 'at least';
    const message = `expected search.${otherName} to be ${reverse} search.${name} (${value}, the default), found ${other}`;
    const theirs = at('search', otherName);
    if (theirs) throw reader.valueError(theirs, message);
    throw reader.error(searchFound?.keyNode ?? null, `search.${otherName}`, message);
  };
  ordered('max-width', 'at least', 'min-width');
  ordered('required', 'at most', 'restarts');
  ordered('check-every', 'at most', 'max-epochs');

  if (gate.maxWidth !== null && gate.maxWidth < search.minWidth) {
    throw reader.valueError(
      at('gate', 'max-width')!,
      `expected at least search.min-width (${search.minWidth}), found ${gate.maxWidth}; every width tried would be over the budget`,
    );
  }
  const accuracyKnown = config.metricGiven || data.task === 'classification';
  if (accuracyKnown && target.metric === 'accuracy' && gate.metricTolerance >= 1) {
    throw reader.valueError(
      at('gate', 'metric-tolerance')!,
      `expected a tolerance below 1 for accuracy, found ${gate.metricTolerance}`,
    );
  }
}

/** An accuracy threshold must be a fraction; error thresholds are in the target's own units. */
function checkThreshold(reader: ConfigReader, found: Found, metric: MetricName, threshold: number): void {
  if (metric === 'accuracy' && threshold > 1) {
    throw reader.valueError(
      found,
      `expected an accuracy above 0 and at most 1, found ${threshold} (write 95% as 0.95)`,
    );
  }
}
