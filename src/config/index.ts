/**
 * The config stage: the YAML file → a typed Config with every default filled in (reader.ts
 * walks the YAML against spec.ts, build.ts makes the typed config and checks the rules between
 * keys). Errors found after the data are read point at the key through the positions kept here.
 */
import { readFile, stat } from 'node:fs/promises';
import { resolve } from 'node:path';
import { quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';
import { formatCount } from '../common/format.js';
import { AUTO_MAX_CLASSES, defaultMetric, metricFitsTask, type Task } from '../common/metric.js';
import { displayPath } from '../common/paths.js';
import { didYouMean } from '../common/suggest.js';
import { buildConfig } from './build.js';
import { ConfigReader } from './reader.js';
import type { Config } from './types.js';

export { CONFIG_SPEC } from './spec.js';

/** A config is a few dozen lines; anything this big is not one (and parsing it could take minutes). @testOnly */
export const MAX_CONFIG_BYTES = 256 * 1024;

export async function loadConfig(configPath: string, root: string): Promise<Config> {
  const file = resolve(root, configPath);
  const shown = displayPath(root, file);
  let text: string;
  try {
    const info = await stat(file);
    if (info.isFile() && info.size > MAX_CONFIG_BYTES) {
      throw new UserError(
        `${shown}: the config file has ${formatCount(info.size)} bytes; a config may have at most ${formatCount(MAX_CONFIG_BYTES)} (is this the right file?)`,
        { file: shown },
      );
    }
    text = await readFile(file, 'utf8');
  } catch (error) {
    if (error instanceof UserError) throw error;
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw new UserError(`${shown}: config file not found (looked for ${file})`, { file: shown });
    if (code === 'EISDIR')
      throw new UserError(`${shown}: expected a YAML config file, found a folder`, { file: shown });
    if (code === 'EACCES')
      throw new UserError(`${shown}: config file cannot be read (permission denied)`, { file: shown });
    throw error;
  }
  return parseConfig(text, { file, root });
}

/** Validates config text as if it were the file `file` (absolute) inside workspace `root`. @testOnly */
export function parseConfig(text: string, where: { file: string; root: string }): Config {
  const file = resolve(where.file);
  const root = resolve(where.root);
  // Editors do not count a byte-order mark as a column; neither do we.
  const reader = new ConfigReader(text.replace(/^\uFEFF/, ''), displayPath(root, file));
  return buildConfig(reader, reader.read(), file, root);
}

/**
 * A UserError about a config key found after validation (the data showed the problem): at the
 * key's line and column when it is written, else at its section's, else at the file.
 */
export function configKeyError(config: Config, key: string, detail: string): UserError {
  const shown = displayPath(config.root, config.file);
  const at = config.positions.get(key) ?? config.positions.get(key.split('.')[0]) ?? null;
  const where = at === null ? shown : `${shown}:${at.line}:${at.column}`;
  return new UserError(`${where}: ${key}: ${detail}`, {
    file: shown,
    key,
    ...(at ? { line: at.line, column: at.column } : {}),
  });
}

/**
 * What the config could not settle before the data were read: the metric and recall floors,
 * which depend on the task and the class labels found.
 */
export function settleTarget(config: Config, task: Task, classes: string[] | null): Config {
  const settled = settleMetric(config, task, classes);
  return { ...settled, target: { ...settled.target, recallFloors: recallFloors(settled, task, classes) } };
}

/** target.min-recall as one floor per class index; each named class must be one the data have. */
function recallFloors(config: Config, task: Task, classes: string[] | null): number[] | null {
  const rule = config.target.minRecall ?? null;
  if (rule === null) return null;
  if (task !== 'classification' || classes === null) {
    throw configKeyError(
      config,
      'target.min-recall',
      `the target column ${quote(config.data.target)} was read as regression; recall floors need classes (remove target.min-recall)`,
    );
  }
  if ('every' in rule) return classes.map(() => rule.every);
  const floors = classes.map(() => 0);
  for (const { label, min } of rule.classes) {
    const i = classes.indexOf(label);
    if (i < 0) {
      throw configKeyError(
        config,
        'target.min-recall',
        `names the class ${quote(label)}, which the target column ${quote(config.data.target)} does not have${didYouMean(label, classes)}; its classes are ${classes.map((c) => quote(c)).join(', ')}`,
      );
    }
    floors[i] = min;
  }
  return floors;
}

/**
 * With data.task auto the task is only known after reading: the metric follows it unless the
 * config names one, and a named metric must suit it. A threshold or tolerance that cannot be an
 * accuracy is refused here, once the task is known, saying what to write either way.
 */
function settleMetric(config: Config, task: Task, classes: string[] | null): Config {
  const target = config.target;
  if (!config.metricGiven) {
    const metric = defaultMetric(task);
    if (metric === 'accuracy' && target.threshold > 1) {
      throw configKeyError(
        config,
        'target.threshold',
        `${readAsClassification(config, classes)}, so the threshold is an accuracy: expected above 0 and at most 1, found ${target.threshold}; ${whatToWrite(config, classes, 'write the accuracy as a fraction (95% as 0.95)')}`,
      );
    }
    if (metric === 'accuracy' && config.gate.metricTolerance >= 1) {
      throw configKeyError(
        config,
        'gate.metric-tolerance',
        `${readAsClassification(config, classes)}, so the tolerance is an accuracy difference: expected below 1, found ${config.gate.metricTolerance}; ${whatToWrite(config, classes, 'write the tolerance as a fraction (2 points as 0.02)')}`,
      );
    }
    return { ...config, target: { ...target, metric } };
  }
  if (metricFitsTask(target.metric, task)) return config;
  const hint =
    task === 'classification'
      ? 'set target.metric to accuracy, or data.task to regression'
      : "set target.metric to rmse, mae or max-abs-error (with a threshold in the target's units), or data.task to classification";
  throw configKeyError(
    config,
    'target.metric',
    `the target column ${quote(config.data.target)} was read as ${task}, which cannot be judged by ${target.metric}; ${hint}`,
  );
}

/** Whether a class target's labels are all numbers (data.task auto read a numeric column with few values as classes). */
function numericLabels(classes: string[] | null): boolean {
  return classes !== null && classes.every((c) => c.trim() !== '' && Number.isFinite(Number(c)));
}

/** "the target column "x" was read as classification (…why…)". */
function readAsClassification(config: Config, classes: string[] | null): string {
  const why = numericLabels(classes)
    ? `it holds only ${classes!.length} distinct numbers, and data.task auto reads at most ${AUTO_MAX_CLASSES} as class labels`
    : 'it holds text';
  return `the target column ${quote(config.data.target)} was read as classification (${why})`;
}

/** What to write: a few distinct numbers may be a measurement (then regression, and rmse follows); text is classes. */
function whatToWrite(config: Config, classes: string[] | null, asAccuracy: string): string {
  if (!numericLabels(classes)) return asAccuracy;
  return `if ${quote(config.data.target)} is a measurement, write "task: regression" under data (the metric is then rmse, in the column's units); if it holds classes, ${asAccuracy}`;
}
