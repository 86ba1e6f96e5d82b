/**
 * The `neuron-budget` command line: parses argv, runs the main job, prints to stderr,
 * and turns the outcome into an exit code (0 pass/improved/new, 1 fail/inconclusive,
 * 2 bad input or usage, 3 internal error). stdout carries only what was asked for
 * (--help, --version, `baseline`'s one line saying whether the file was written, `predict`'s
 * rows), so it stays clean for scripts.
 *
 * The workspace root is the current working directory: paths inside the config file
 * must stay inside it. Paths given as flags are the user's own choice and resolve
 * against the current directory.
 */
import { isMainThread } from 'node:worker_threads';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { escapeLines, quote } from './common/escape.js';
import { isUserError } from './common/errors.js';
import { EXIT } from './common/exit-codes.js';
import { DEFAULT_CONFIG, parseInvocation, UsageError } from './cli/args.js';
import { runExport, runPredict } from './cli/model-commands.js';
import { progressPrinter } from './cli/progress.js';
import { usage } from './cli/usage.js';
import { baselineRecordLine } from './report/index.js';
import { runMergeStage, runPlanStage, runShardStage } from './job/stages.js';
import { runJob, type JobResult } from './run.js';
import { runSearchWorker } from './search/index.js';
import { TOOL_NAME, TOOL_VERSION } from './version.js';

async function main(argv: readonly string[]): Promise<number> {
  const err = process.stderr;
  try {
    const invocation = parseInvocation(argv);
    if (invocation.kind === 'help') {
      process.stdout.write(`${usage(invocation.command)}\n`);
      return EXIT.ok;
    }
    if (invocation.kind === 'version') {
      process.stdout.write(`${TOOL_VERSION}\n`);
      return EXIT.ok;
    }
    const root = process.cwd();
    const { flags } = invocation;
    if (invocation.command === 'export') {
      err.write(`${await runExport(root, invocation.args, flags)}\n`);
      return EXIT.ok;
    }
    if (invocation.command === 'predict') {
      const said = await runPredict(root, invocation.args, flags, (text) => process.stdout.write(text));
      err.write(`${said}\n`);
      return EXIT.ok;
    }
    const fromCwd = (p: string | undefined): string | null => (p === undefined ? null : resolve(root, p));
    const progress = progressPrinter(err);
    const log = (line: string): void => {
      progress.done();
      err.write(`${escapeLines(line)}\n`);
    };
    const base = {
      configPath: resolve(root, flags.config ?? DEFAULT_CONFIG),
      root,
      baselinePath: fromCwd(flags.baseline),
      log,
    };
    const running = {
      workers: invocation.workers,
      workerEntry: fileURLToPath(import.meta.url),
      ...(progress.onProgress ? { onProgress: progress.onProgress } : {}),
    };
    if (invocation.command === 'plan') {
      const shards = wholeNumber('plan', 'shards', flags.shards);
      const planned = await runPlanStage({ ...base, shards, planPath: resolve(root, flags.out!) });
      err.write(`${escapeLines(planned.text)}\n`);
      // What plan was asked for: the shard indexes, on stdout for a script to fan out.
      process.stdout.write(`${JSON.stringify(planned.indexes)}\n`);
      return EXIT.ok;
    }
    if (invocation.command === 'shard') {
      const index = wholeNumber('shard', 'index', flags.index);
      let said;
      try {
        said = await runShardStage({
          ...base,
          ...running,
          planPath: resolve(root, flags.plan!),
          index,
          partPath: resolve(root, flags.out!),
        });
      } finally {
        progress.done();
      }
      err.write(`${escapeLines(said.text)}\n`);
      return EXIT.ok;
    }
    const finish = {
      reportPath: fromCwd(flags.report),
      modelPath: fromCwd(flags.model),
      surface: 'cli' as const,
      configShown: flags.config ?? null,
    };
    let result: JobResult;
    try {
      result =
        invocation.command === 'merge'
          ? await runMergeStage({
              ...base,
              ...running,
              ...finish,
              mode: 'check',
              partPaths: invocation.args.map((a) => resolve(root, a)),
            })
          : await runJob({
              ...base,
              ...running,
              ...finish,
              mode: invocation.command === 'baseline' ? 'baseline' : 'check',
            });
    } finally {
      progress.done();
    }
    err.write(`${escapeLines(result.text)}\n`);
    // What `baseline` was asked for: whether the file was written, on stdout for scripts.
    if (result.baselineRecord) process.stdout.write(`${escapeLines(baselineRecordLine(result.baselineRecord))}\n`);
    return result.exitCode;
  } catch (error) {
    if (isUserError(error)) {
      const pointer =
        error instanceof UsageError && !error.message.includes('--help') ? `; see ${TOOL_NAME} --help` : '';
      err.write(`error: ${error.message}${pointer}\n`);
      return EXIT.badInput;
    }
    const stack = error instanceof Error ? (error.stack ?? error.message) : String(error);
    err.write(
      `internal error in ${TOOL_NAME} ${TOOL_VERSION} (a bug, not a problem with your files; please report it):\n${escapeLines(stack)}\n`,
    );
    return EXIT.internal;
  }
}

/** A flag that must be a whole number ≥ 0 (a shard count or index). */
function wholeNumber(command: string, flag: string, value: string | undefined): number {
  const n = value !== undefined && /^\d{1,6}$/.test(value) ? Number(value) : Number.NaN;
  if (!Number.isInteger(n))
    throw new UsageError(`${command}: --${flag}: expected a whole number, found ${quote(value ?? '')}`);
  return n;
}

// This file is an entry point only (it runs on import); nothing should import it.
if (!isMainThread) {
  runSearchWorker();
} else {
  void main(process.argv.slice(2)).then((code) => {
    process.exitCode = code;
  });
}
