/**
 * Runs the BUILT command line (dist/cli/index.js) the way a user would: `node` in a
 * fresh temp folder that is also the workspace, with the files a test puts there.
 * Shared by every end-to-end test of the command line.
 */
import { expect } from 'vitest';
import { execFile } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const REPO_ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
/** The bundle under test: dist/cli/index.js (NEURON_BUDGET_TEST_BUNDLE may point at another build while developing). */
export const CLI_BUNDLE = process.env.NEURON_BUDGET_TEST_BUNDLE
  ? resolve(process.env.NEURON_BUDGET_TEST_BUNDLE)
  : join(REPO_ROOT, 'dist', 'cli', 'index.js');

export interface CliRunOptions {
  /** Files to create in the temp folder before the run: relative path → content. */
  files?: Record<string, string | Uint8Array>;
  /** Extra environment variables (the rest of the environment is inherited). */
  env?: Record<string, string>;
  /** Folder inside the temp folder to run in (created if missing); default the temp folder itself. */
  cwd?: string;
  /** Runs after the files are written, before the command (symbolic links, permissions). */
  setup?: (dir: string) => void;
  /** Node binary to run the bundle with; default the one running the tests. */
  node?: string;
  timeoutMs?: number;
}

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
  /** The temp folder (the workspace). Removed by removeCliTempDirs() or at process exit. */
  dir: string;
  /** Every file present in the temp folder after the run, relative, `/`-separated, sorted. */
  filesAfter: string[];
  /** Files present after the run that were not there before it (not given in `files` nor made by `setup`). */
  created: string[];
  /** Reads a file of the temp folder as UTF-8. */
  read(path: string): string;
}

const tempDirs: string[] = [];
process.once('exit', removeCliTempDirs);

export function removeCliTempDirs(): void {
  for (const dir of tempDirs.splice(0)) rmSync(dir, { recursive: true, force: true });
}

/** Every file below `dir`, relative, `/`-separated, sorted. */
export function listFiles(dir: string): string[] {
  const out: string[] = [];
  const walk = (rel: string): void => {
    for (const entry of readdirSync(join(dir, rel), { withFileTypes: true })) {
      const path = rel === '' ? entry.name : `${rel}/${entry.name}`;
      if (entry.isDirectory()) walk(path);
      else out.push(path);
    }
  };
  walk('');
  return out.sort();
}

export function makeTempDir(prefix = 'neuron-budget-test-'): string {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  tempDirs.push(dir);
  return dir;
}

export function writeFiles(dir: string, files: Record<string, string | Uint8Array>): void {
  for (const [path, content] of Object.entries(files)) {
    const target = join(dir, path);
    mkdirSync(dirname(target), { recursive: true });
    writeFileSync(target, content);
  }
}

/** Runs `node dist/cli/index.js ...args` in a new temp folder holding `options.files`. */
export async function runCli(args: readonly string[], options: CliRunOptions = {}): Promise<CliRun> {
  if (!existsSync(CLI_BUNDLE)) {
    throw new Error(`${CLI_BUNDLE} is missing: build it first with "node scripts/build.mjs" (or npm run build)`);
  }
  const dir = makeTempDir();
  const files = options.files ?? {};
  writeFiles(dir, files);
  options.setup?.(dir);
  const before = new Set(listFiles(dir));
  const cwd = options.cwd ? join(dir, options.cwd) : dir;
  mkdirSync(cwd, { recursive: true });
  const env: NodeJS.ProcessEnv = { ...process.env, ...options.env };
  // The tests read plain text; a colour or CI setting of the developer's shell must not leak in.
  delete env.FORCE_COLOR;
  delete env.NODE_OPTIONS;
  const { code, stdout, stderr } = await new Promise<{ code: number; stdout: string; stderr: string }>((done, fail) => {
    execFile(
      options.node ?? process.execPath,
      [CLI_BUNDLE, ...args],
      { cwd, env, timeout: options.timeoutMs ?? 60_000, maxBuffer: 64 * 1024 * 1024, encoding: 'utf8' },
      (error, out, err) => {
        if (error && typeof error.code !== 'number') {
          fail(new Error(`could not run the command line: ${error.message}\n${err}`));
          return;
        }
        done({ code: error ? Number(error.code) : 0, stdout: out, stderr: err });
      },
    );
  });
  const filesAfter = listFiles(dir);
  return {
    code,
    stdout,
    stderr,
    dir,
    filesAfter,
    created: filesAfter.filter((p) => !before.has(p)),
    read: (path: string) => readFileSync(join(dir, path), 'utf8'),
  };
}

/** The marks of a stack trace; a user error must show none of them. */
export function hasStackTrace(text: string): boolean {
  return /\n\s+at /.test(text) || /^\s+at .+:\d+:\d+\)?$/m.test(text);
}

/**
 * A user error as the command line must report it: exit 2, nothing on stdout, no stack
 * trace, exactly one line `error: <at>…` that contains every fragment of `says`.
 */
export function expectOneUserError(run: CliRun, at: string | null, says: readonly string[]): void {
  expect(run.code, run.stderr).toBe(2);
  expect(run.stdout).toBe('');
  expect(hasStackTrace(run.stderr), run.stderr).toBe(false);
  expect(run.stderr).not.toContain('    at ');
  const lines = run.stderr.trimEnd().split('\n');
  expect(lines, run.stderr).toHaveLength(1);
  expect(lines[0].startsWith(`error: ${at ?? ''}`), run.stderr).toBe(true);
  for (const fragment of says) expect(lines[0], run.stderr).toContain(fragment);
}
