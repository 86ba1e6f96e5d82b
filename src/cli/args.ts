/**
 * The command line's grammar: commands, their options and positional arguments, parsed with
 * Node's util.parseArgs and checked with messages that say what was expected and what was found.
 */
import { parseArgs } from 'node:util';
import { quote } from '../common/escape.js';
import { DEFAULT_CONFIG } from '../common/paths.js';
import { UserError } from '../common/errors.js';
import { didYouMean } from '../common/suggest.js';
import { MAX_WORKERS, parseWorkerCount } from '../common/workers.js';
import { TOOL_NAME } from '../version.js';

export { DEFAULT_CONFIG };

export type Command = 'check' | 'baseline' | 'plan' | 'shard' | 'merge' | 'export' | 'predict';
export type FlagName =
  'config' | 'report' | 'model' | 'baseline' | 'workers' | 'shards' | 'plan' | 'index' | 'format' | 'out' | 'name';

export interface FlagSpec {
  value: string;
  help: string;
}

export const FLAGS: Record<FlagName, FlagSpec> = {
  config: { value: 'FILE', help: `config file (default: ${DEFAULT_CONFIG} in the current folder)` },
  report: { value: 'FILE', help: 'also write the full result as JSON to FILE' },
  model: { value: 'FILE', help: 'write the smallest network found (weights and encoding) to FILE' },
  baseline: { value: 'FILE', help: 'baseline file to use instead of the one named in the config' },
  workers: { value: 'N', help: `worker threads, 1 to ${MAX_WORKERS} (default: config, else one per core)` },
  shards: { value: 'N', help: 'shards to split the trainings into, 1 to 256 (a matrix job each)' },
  plan: { value: 'FILE', help: 'the plan written by `plan`' },
  index: { value: 'I', help: 'which shard of the plan to run, from 0' },
  format: { value: 'FORMAT', help: 'what to write: c (C99 source, a float32 and an int8 path)' },
  out: {
    value: 'PATH',
    help: 'where to write (plan: the plan; shard: the part; export: a folder; predict: a CSV file, default stdout)',
  },
  name: { value: 'NAME', help: 'C name of the model: its files and the prefix of its functions (default nb_model)' },
};

export interface CommandSpec {
  summary: string;
  flags: FlagName[];
  /** Arguments given by position, in order (all required). */
  positionals?: string[];
  /** Flags that must be given. */
  required?: FlagName[];
  /** After the positionals: one or more further arguments of this kind (merge's part files). */
  rest?: string;
}

export const COMMANDS: Record<Command, CommandSpec> = {
  check: {
    summary: 'search the smallest adequate width and compare it with the baseline',
    flags: ['config', 'report', 'model', 'baseline', 'workers'],
  },
  baseline: {
    summary: 'search the smallest adequate width and write it as the new baseline',
    flags: ['config', 'baseline', 'workers'],
  },
  plan: {
    summary: 'split the search into shards for a job matrix and write the plan',
    flags: ['config', 'baseline', 'shards', 'out'],
    required: ['shards', 'out'],
  },
  shard: {
    summary: "run one shard of a plan and write its part (the trainings' outcomes)",
    flags: ['config', 'baseline', 'plan', 'index', 'out', 'workers'],
    required: ['plan', 'index', 'out'],
  },
  merge: {
    summary: 'merge the parts of every shard and finish as check does',
    flags: ['config', 'report', 'model', 'baseline', 'workers'],
    rest: 'PART.json',
  },
  export: {
    summary: 'write firmware source for a model file (written by check --model)',
    flags: ['format', 'out', 'name'],
    positionals: ['MODEL.json'],
    required: ['format', 'out'],
  },
  predict: {
    summary: 'score the rows of a CSV file with a model file, as CSV',
    flags: ['out'],
    positionals: ['MODEL.json', 'DATA.csv'],
  },
};

/** A mistake on the command line: exit 2, one line, with a pointer to --help. */
export class UsageError extends UserError {}

export type Invocation =
  | { kind: 'help'; command: Command | null }
  | { kind: 'version' }
  | {
      kind: 'run';
      command: Command;
      flags: Partial<Record<FlagName, string>>;
      workers: number | null;
      /** The positional arguments, in the order the command names them. */
      args: string[];
    };

function isCommand(s: string): s is Command {
  return Object.hasOwn(COMMANDS, s);
}

const commandList = (sep: string): string => Object.keys(COMMANDS).join(sep);

/** Parses argv (without node and script) into what to do. Throws UsageError. */
export function parseInvocation(argv: readonly string[]): Invocation {
  if (argv.includes('--help') || argv.includes('-h')) return { kind: 'help', command: argv.find(isCommand) ?? null };
  if (argv.includes('--version') || argv.includes('-V')) return { kind: 'version' };
  const [first, ...rest] = argv;
  if (first === undefined) throw new UsageError(`a command is needed: ${commandList(' or ')}`);
  if (first === 'help') {
    const topic = rest[0];
    if (topic !== undefined && !isCommand(topic)) {
      throw new UsageError(
        `no help for ${quote(topic)}${didYouMean(topic, Object.keys(COMMANDS))}; commands: ${commandList(', ')}`,
      );
    }
    return { kind: 'help', command: topic ?? null };
  }
  if (first.startsWith('-'))
    throw new UsageError(`expected a command (${commandList(' or ')}) before options, found ${quote(first)}`);
  if (!isCommand(first)) {
    throw new UsageError(
      `unknown command ${quote(first)}${didYouMean(first, Object.keys(COMMANDS))}; commands: ${commandList(', ')}`,
    );
  }
  const command = first;
  const { flags, args } = readFlags(command, rest);
  let workers: number | null = null;
  if (flags.workers !== undefined) {
    workers = parseWorkerCount(flags.workers);
    if (workers === null) {
      throw new UsageError(
        `${command}: --workers: expected an integer from 1 to ${MAX_WORKERS}, found ${quote(flags.workers)}`,
      );
    }
  }
  return { kind: 'run', command, flags, workers, args };
}

function readFlags(command: Command, args: string[]): { flags: Partial<Record<FlagName, string>>; args: string[] } {
  const spec = COMMANDS[command];
  const allowed = spec.flags;
  const wanted = spec.positionals ?? [];
  const positional: string[] = [];
  const options = Object.fromEntries(Object.keys(FLAGS).map((f) => [f, { type: 'string' as const }]));
  // Not strict: unknown options and missing values get our own messages below.
  const { tokens } = parseArgs({ args, options, strict: false, allowPositionals: true, tokens: true });
  const flags: Partial<Record<FlagName, string>> = {};
  for (const token of tokens) {
    if (token.kind === 'positional') {
      if (positional.length < wanted.length || spec.rest !== undefined) {
        positional.push(token.value);
        continue;
      }
      throw new UsageError(`${command}: unexpected argument ${quote(token.value)}; options are written --name VALUE`);
    }
    if (token.kind !== 'option') continue;
    const name = token.name;
    if (!(allowed as string[]).includes(name)) {
      const elsewhere = Object.hasOwn(FLAGS, name) ? ` (${command} has no --${name})` : '';
      const suggestion = didYouMean(name, allowed).replace(/"([^"]+)"/, '"--$1"');
      throw new UsageError(
        `${command}: unknown option ${quote(`--${name}`)}${elsewhere}${suggestion}; see ${TOOL_NAME} ${command} --help`,
      );
    }
    const flag = name as FlagName;
    // `--config --report x`: the next option is not this one's value.
    const value = !token.inlineValue && token.value?.startsWith('--') ? undefined : token.value;
    if (value === undefined || value === '')
      throw new UsageError(`${command}: --${flag} needs a value (${FLAGS[flag].value})`);
    if (flags[flag] !== undefined) throw new UsageError(`${command}: --${flag} is given twice`);
    flags[flag] = value;
  }
  if (positional.length < wanted.length) {
    throw new UsageError(
      `${command}: expected ${wanted.join(' ')}, found ${positional.length === 0 ? 'nothing' : positional.map((p) => quote(p)).join(' ')}`,
    );
  }
  if (spec.rest !== undefined && positional.length === wanted.length)
    throw new UsageError(`${command}: expected one or more ${spec.rest} files, found none`);
  for (const flag of spec.required ?? []) {
    if (flags[flag] === undefined) throw new UsageError(`${command}: --${flag} ${FLAGS[flag].value} is required`);
  }
  return { flags, args: positional };
}
