/**
 * The `neuron-budget` command line: parses argv, runs the main job, prints to stderr,
 * and turns the outcome into an exit code (0 pass/improved/new, 1 fail/inconclusive,
 * 2 bad input or usage, 3 internal error). stdout carries only what was asked for
 * (--help, --version), so it stays clean for scripts.
 *
 * The workspace root is the current working directory: paths inside the config file
 * must stay inside it. Paths given as flags are the user's own choice and resolve
 * against the current directory.
 */
import { isMainThread } from 'node:worker_threads';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { didYouMean } from './config/suggest.js';
import { isUserError, UserError } from './errors.js';
import { runJob, type JobOptions } from './run.js';
import { runSearchWorker } from './search/index.js';
import type { ProgressEvent } from './search/types.js';
import { TOOL_NAME, TOOL_VERSION } from './version.js';

const EXIT_USAGE = 2;
const EXIT_INTERNAL = 3;
const DEFAULT_CONFIG = 'neuron-budget.yml';

type Command = 'check' | 'baseline';
type FlagName = 'config' | 'report' | 'model' | 'baseline' | 'workers';

interface FlagSpec {
  name: FlagName;
  value: string;
  help: string;
}

const FLAGS: Record<FlagName, FlagSpec> = {
  config: { name: 'config', value: 'FILE', help: `config file (default: ${DEFAULT_CONFIG} in the current folder)` },
  report: { name: 'report', value: 'FILE', help: 'also write the full result as JSON to FILE' },
  model: { name: 'model', value: 'FILE', help: 'write the smallest network found (weights and encoding) to FILE' },
  baseline: { name: 'baseline', value: 'FILE', help: 'baseline file to use instead of the one named in the config' },
  workers: { name: 'workers', value: 'N', help: 'worker threads, 1 to 256 (default: config, else one per core)' },
};

const COMMANDS: Record<Command, { summary: string; flags: FlagName[] }> = {
  check: {
    summary: 'search the smallest adequate width and compare it with the baseline',
    flags: ['config', 'report', 'model', 'baseline', 'workers'],
  },
  baseline: {
    summary: 'search the smallest adequate width and write it as the new baseline',
    flags: ['config', 'baseline'],
  },
};

/** A mistake on the command line: exit 2, one line, with a pointer to --help. */
class UsageError extends UserError {}

type Invocation =
  | { kind: 'help'; command: Command | null }
  | { kind: 'version' }
  | { kind: 'run'; command: Command; flags: Partial<Record<FlagName, string>>; workers: number | null };

function isCommand(s: string): s is Command {
  return Object.hasOwn(COMMANDS, s);
}

/** Parses argv (without node and script) into what to do. Throws UsageError. */
function parseArgs(argv: readonly string[]): Invocation {
  if (argv.includes('--help') || argv.includes('-h')) {
    const command = argv.find(isCommand) ?? null;
    return { kind: 'help', command };
  }
  if (argv.includes('--version') || argv.includes('-V')) return { kind: 'version' };
  const [first, ...rest] = argv;
  if (first === undefined) throw new UsageError(`a command is needed: ${Object.keys(COMMANDS).join(' or ')}`);
  if (first === 'help') {
    const topic = rest[0];
    if (topic !== undefined && !isCommand(topic)) {
      throw new UsageError(
        `no help for "${topic}"${didYouMean(topic, Object.keys(COMMANDS))}; commands: ${Object.keys(COMMANDS).join(', ')}`,
      );
    }
    return { kind: 'help', command: topic ?? null };
  }
  if (first.startsWith('-')) {
    throw new UsageError(`expected a command (${Object.keys(COMMANDS).join(' or ')}) before options, found "${first}"`);
  }
  if (!isCommand(first)) {
    throw new UsageError(
      `unknown command "${first}"${didYouMean(first, Object.keys(COMMANDS))}; commands: ${Object.keys(COMMANDS).join(', ')}`,
    );
  }
  const command = first;
  const allowed = COMMANDS[command].flags;
  const flags: Partial<Record<FlagName, string>> = {};
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i];
    if (!arg.startsWith('--') || arg === '--') {
      throw new UsageError(`${command}: unexpected argument "${arg}"; options are written --name VALUE`);
    }
    const eq = arg.indexOf('=');
    const name = arg.slice(2, eq === -1 ? undefined : eq);
    if (!(allowed as string[]).includes(name)) {
      const elsewhere = Object.hasOwn(FLAGS, name) ? ` (${command} has no --${name})` : '';
      const suggestion = didYouMean(name, allowed).replace(/"([^"]+)"/, '"--$1"');
      throw new UsageError(
        `${command}: unknown option --${name}${elsewhere}${suggestion}; see ${TOOL_NAME} ${command} --help`,
      );
    }
    const flag = name as FlagName;
    let value: string | undefined;
    if (eq !== -1) value = arg.slice(eq + 1);
    else {
      value = rest[i + 1];
      if (value !== undefined && value.startsWith('--')) value = undefined;
      else i++;
    }
    if (value === undefined || value === '') {
      throw new UsageError(`${command}: --${flag} needs a value (${FLAGS[flag].value})`);
    }
    if (flags[flag] !== undefined) throw new UsageError(`${command}: --${flag} is given twice`);
    flags[flag] = value;
  }
  let workers: number | null = null;
  if (flags.workers !== undefined) {
    const text = flags.workers;
    const n = /^[0-9]+$/.test(text) ? Number(text) : NaN;
    if (!Number.isInteger(n) || n < 1 || n > 256) {
      throw new UsageError(`${command}: --workers: expected an integer from 1 to 256, found "${text}"`);
    }
    workers = n;
  }
  return { kind: 'run', command, flags, workers };
}

function usage(command: Command | null): string {
  if (command !== null) {
    const spec = COMMANDS[command];
    const lines = [
      `${TOOL_NAME} ${command}: ${spec.summary}`,
      '',
      `usage: ${TOOL_NAME} ${command} [options]`,
      '',
      'options:',
      ...spec.flags.map((f) => `  --${`${f} ${FLAGS[f].value}`.padEnd(16)}${FLAGS[f].help}`),
      '',
      exitCodesText(),
    ];
    return lines.join('\n');
  }
  return [
    `${TOOL_NAME} ${TOOL_VERSION}: finds the smallest hidden-layer width that reaches`,
    'your target, and checks it against a committed baseline and a device budget.',
    '',
    'usage:',
    ...Object.keys(COMMANDS).map((c) => `  ${TOOL_NAME} ${c.padEnd(9)} [options]`),
    `  ${TOOL_NAME} COMMAND --help   options of one command`,
    `  ${TOOL_NAME} --version`,
    '',
    'commands:',
    ...Object.entries(COMMANDS).map(([c, s]) => `  ${c.padEnd(10)}${s.summary}`),
    '',
    'The current folder is the workspace. Paths in the config file resolve against',
    "the config file's folder and must stay inside the workspace.",
    'Messages go to stderr; stdout carries only --help and --version.',
    '',
    exitCodesText(),
  ].join('\n');
}

/** Plain progress lines (logs, CI) are worth one every few seconds, not a flood. */
const PLAIN_PROGRESS_MS = 5000;

function exitCodesText(): string {
  return 'exit codes: 0 pass, improved or new; 1 fail or inconclusive; 2 bad input';
}

/** A one-line progress display, redrawn in place on a terminal; elsewhere a plain line every few seconds. */
function progressPrinter(stream: NodeJS.WriteStream): { onProgress?: (e: ProgressEvent) => void; done: () => void } {
  if (!stream.isTTY) {
    let lastLine = performance.now();
    return {
      onProgress: (e) => {
        const now = performance.now();
        if (now - lastLine < PLAIN_PROGRESS_MS) return;
        lastLine = now;
        const best = e.best === null ? '' : `, best so far ${e.best.toFixed(4)}`;
        stream.write(`progress: ${e.phase}, width ${e.width}, restart ${e.restart + 1}, epoch ${e.epoch}${best}\n`);
      },
      done: () => undefined,
    };
  }
  let last = 0;
  let drawn = false;
  return {
    onProgress: (e) => {
      const now = performance.now();
      if (now - last < 100) return; // display only: at most ten redraws a second
      last = now;
      const best = e.best === null ? '' : ` · best ${e.best.toFixed(4)}`;
      stream.write(`\r\x1b[2K${e.phase} · width ${e.width} · restart ${e.restart + 1} · epoch ${e.epoch}${best}`);
      drawn = true;
    },
    done: () => {
      if (drawn) stream.write('\r\x1b[2K');
    },
  };
}

async function main(argv: readonly string[]): Promise<number> {
  const err = process.stderr;
  try {
    const invocation = parseArgs(argv);
    if (invocation.kind === 'help') {
      process.stdout.write(`${usage(invocation.command)}\n`);
      return 0;
    }
    if (invocation.kind === 'version') {
      process.stdout.write(`${TOOL_VERSION}\n`);
      return 0;
    }
    const root = process.cwd();
    const { flags } = invocation;
    const fromCwd = (p: string | undefined): string | null => (p === undefined ? null : resolve(root, p));
    const progress = progressPrinter(err);
    const options: JobOptions = {
      configPath: resolve(root, flags.config ?? DEFAULT_CONFIG),
      root,
      mode: invocation.command,
      baselinePath: fromCwd(flags.baseline),
      reportPath: fromCwd(flags.report),
      modelPath: fromCwd(flags.model),
      workers: invocation.workers,
      workerEntry: fileURLToPath(import.meta.url),
      log: (line) => {
        progress.done();
        err.write(`${line}\n`);
      },
      ...(progress.onProgress ? { onProgress: progress.onProgress } : {}),
    };
    let result;
    try {
      result = await runJob(options);
    } finally {
      progress.done();
    }
    err.write(`${result.text}\n`);
    return result.exitCode;
  } catch (error) {
    if (isUserError(error)) {
      const pointer =
        error instanceof UsageError && !error.message.includes('--help') ? `; see ${TOOL_NAME} --help` : '';
      err.write(`error: ${error.message}${pointer}\n`);
      return EXIT_USAGE;
    }
    const stack = error instanceof Error ? (error.stack ?? error.message) : String(error);
    err.write(
      `internal error in ${TOOL_NAME} ${TOOL_VERSION} (a bug, not a problem with your files; please report it):\n${stack}\n`,
    );
    return EXIT_INTERNAL;
  }
}

// This file is an entry point only (it runs on import); nothing should import it.
if (!isMainThread) {
  runSearchWorker();
} else {
  void main(process.argv.slice(2)).then((code) => {
    process.exitCode = code;
  });
}
