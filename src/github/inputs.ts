/**
 * The action's inputs: read, validated and turned into absolute paths inside the workspace.
 * Only `stat`/`realpath` touch the disk here (no file is opened), so a refused path means
 * nothing was read.
 */
import { realpathSync, statSync } from 'node:fs';
import { isAbsolute, join, relative, resolve, sep } from 'node:path';
import { DEFAULT_CONFIG, resolveInside } from '../common/paths.js';
import { quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';
import { MAX_WORKERS, parseWorkerCount } from '../common/workers.js';

/** Reads one input as the runner passes it (`INPUT_<NAME>`, hyphens kept), trimmed. */
export type InputReader = (name: string) => string;

export interface ActionInputs {
  /** Real path of GITHUB_WORKSPACE: no path may leave it. */
  workspace: string;
  /** Absolute working directory (inside the workspace). */
  workingDirectory: string;
  /** Absolute config path (inside the workspace). */
  configPath: string;
  /** Config path relative to the workspace, with forward slashes (names the comment and the output folder). */
  configKey: string;
  token: string;
  comment: boolean;
  updateBaseline: boolean;
  /** null: every core. */
  workers: number | null;
  /** Which stage runs: the whole check (default), or one stage of a job matrix. */
  stage: Stage;
}

export type Stage =
  | { kind: 'check' }
  | { kind: 'plan'; shards: number }
  | { kind: 'shard'; planPath: string; index: number }
  | { kind: 'merge'; partsDir: string };

const STAGES = ['check', 'plan', 'shard', 'merge'];

/** A whole number input in a range, with a message that names the input. */
function wholeNumberInput(name: string, value: string, min: number, max: number): number {
  const n = /^\d{1,6}$/.test(value) ? Number(value) : Number.NaN;
  if (!(n >= min && n <= max))
    throw new UserError(`input ${name}: expected a whole number from ${min} to ${max}, found ${quote(value)}`, {
      key: name,
    });
  return n;
}

/** The stage and its inputs; a path input is confined to the workspace like config. */
function readStage(get: InputReader, workspace: string, workingDirectory: string): Stage {
  const kind = get('stage') || 'check';
  if (!STAGES.includes(kind))
    throw new UserError(`input stage: expected one of ${STAGES.join(', ')}, found ${quote(kind)}`, { key: 'stage' });
  const needed = (name: string, v: string): string => {
    if (v === '') throw new UserError(`input ${name}: stage ${kind} needs it`, { key: name });
    return v;
  };
  if (kind === 'plan') return { kind, shards: wholeNumberInput('shards', get('shards') || '4', 1, 256) };
  if (kind === 'shard')
    return {
      kind,
      planPath: resolveInput(workspace, workingDirectory, 'plan', needed('plan', get('plan'))),
      index: wholeNumberInput('shard-index', needed('shard-index', get('shard-index')), 0, 255),
    };
  if (kind === 'merge')
    return { kind, partsDir: resolveInput(workspace, workingDirectory, 'parts', needed('parts', get('parts'))) };
  return { kind: 'check' };
}

const TRUE = ['true', 'True', 'TRUE'];
const FALSE = ['false', 'False', 'FALSE'];

/** The same spellings `core.getBooleanInput` accepts, with a message that names the input and the value. @testOnly */
export function parseBooleanInput(name: string, value: string): boolean {
  if (TRUE.includes(value)) return true;
  if (FALSE.includes(value)) return false;
  throw new UserError(`input ${name}: expected true or false, found ${quote(value)}`, { key: name });
}

/** '' means every core; otherwise a whole number from 1 to MAX_WORKERS. @testOnly */
export function parseWorkersInput(value: string): number | null {
  if (value === '') return null;
  const n = parseWorkerCount(value);
  if (n === null) {
    throw new UserError(
      `input workers: expected a whole number from 1 to ${MAX_WORKERS}, or empty for every core, found ${quote(value)}`,
      { key: 'workers' },
    );
  }
  return n;
}

function workspaceRoot(env: NodeJS.ProcessEnv): string {
  const ws = env['GITHUB_WORKSPACE'];
  if (!ws) {
    throw new UserError(
      'GITHUB_WORKSPACE is not set: run neuron-budget as a step of a GitHub Actions job, after actions/checkout',
    );
  }
  if (!isAbsolute(ws)) {
    throw new UserError(`GITHUB_WORKSPACE must be an absolute path, found ${quote(ws)}`);
  }
  try {
    return realpathSync(ws);
  } catch {
    throw new UserError(`GITHUB_WORKSPACE ${ws} does not exist: check out the repository first (actions/checkout)`);
  }
}

/** Lexical and symbolic-link confinement, through the shared config helper. */
function resolveInput(workspace: string, baseDir: string, input: string, written: string): string {
  return resolveInside(workspace, baseDir, written, `input ${input}`);
}

export function readInputs(get: InputReader, env: NodeJS.ProcessEnv = process.env): ActionInputs {
  // Validate the cheap scalar inputs first so a typo is reported before any path is touched.
  const comment = parseBooleanInput('comment', get('comment') || 'true');
  const updateBaseline = parseBooleanInput('update-baseline', get('update-baseline') || 'false');
  const workers = parseWorkersInput(get('workers'));
  const token = get('github-token');

  const workspace = workspaceRoot(env);
  const wdWritten = get('working-directory') || '.';
  const workingDirectory = resolveInput(workspace, workspace, 'working-directory', wdWritten);
  let st;
  try {
    st = statSync(workingDirectory);
  } catch {
    throw new UserError(
      `input working-directory: ${quote(wdWritten)} does not exist in the workspace (looked for ${workingDirectory})`,
      { key: 'working-directory' },
    );
  }
  if (!st.isDirectory()) {
    throw new UserError(`input working-directory: ${quote(wdWritten)} is not a directory (${workingDirectory})`, {
      key: 'working-directory',
    });
  }

  const configWritten = get('config') || DEFAULT_CONFIG;
  const configPath = resolveInput(workspace, workingDirectory, 'config', configWritten);
  const configKey = relative(workspace, configPath).split(sep).join('/');

  const stage = readStage(get, workspace, workingDirectory);
  if (updateBaseline && (stage.kind === 'plan' || stage.kind === 'shard'))
    throw new UserError(`input update-baseline: only the check and merge stages write a baseline, not ${stage.kind}`, {
      key: 'update-baseline',
    });
  return { workspace, workingDirectory, configPath, configKey, token, comment, updateBaseline, workers, stage };
}

/**
 * A file-system-safe folder name for one config, so two steps with different configs never share
 * files: the config's path without its YAML extension (a folder named `neuron-budget.yml` reads as
 * a file), each run of other characters (the path's slashes too) as one underscore. @testOnly
 */
export function configSlug(configKey: string): string {
  const stem = configKey.replace(/\.ya?ml$/i, '');
  return stem.replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^\.+/, '_') || 'config';
}

/** Where the report and the witness go: under RUNNER_TEMP on a runner, else in the workspace. */
export function outputFolder(inputs: ActionInputs, env: NodeJS.ProcessEnv = process.env): string {
  const temp = env['RUNNER_TEMP'];
  const base = temp && isAbsolute(temp) ? join(temp, 'neuron-budget') : join(inputs.workspace, '.neuron-budget');
  return resolve(base, configSlug(inputs.configKey));
}
