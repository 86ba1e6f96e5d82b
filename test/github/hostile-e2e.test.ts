/**
 * End to end: hostile strings (test/helpers/hostile.ts) in class labels, column names,
 * categories, the data file's name and the config file's name, through the built
 * dist/index.js run as a runner runs it (INPUT_* variables, GITHUB_OUTPUT, GITHUB_STEP_SUMMARY,
 * the loopback API stand-in), under the Node running the tests and under Node 24.
 *
 * What the runner would act on is checked line by line: the only stdout lines that start with
 * `::` are the action's own commands (stop-commands/resume pairs with a fresh token each,
 * groups, the annotations it issues on purpose, whose text is escaped); no line of stdout or
 * stderr holds a raw control or invisible character; the job summary and the pull-request
 * comment hold every string as inert Markdown.
 *
 * The data are invented for the test, not measurements.
 */
import { describe, expect, it } from 'vitest';
import { escapeMarkdown, escapeText, isPrintable } from '../../src/common/escape.js';
import { expectInertMarkdown } from '../helpers/markdown.js';
import {
  commandLines,
  CORPUS,
  HOSTILE_FILE_NAMES,
  HOSTILE_MESSAGES,
  hostileConfig,
  hostileTable,
  rawControlLines,
  yamlString,
} from '../helpers/hostile.js';
import {
  PR_NUMBER,
  makeWorkspace,
  pullRequestEvent,
  pushEvent,
  runAction,
  runtimes,
  type RunOptions,
  type RunResult,
  type Runtime,
} from './harness.js';
import { standInPerTest } from './stand-in-per-test.js';

const STOP = /^::stop-commands::(neuron-budget-[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})$/;
const GROUP = /^::group::neuron-budget: [a-z ]+$/;
const ANNOTATION =
  /^::(error|warning|notice)(?: ((?:title|file|line|col|endLine|endColumn)=[^,:]*(?:,(?:title|file|line|col|endLine|endColumn)=[^,:]*)*))?::(.*)$/;

/** Every stdout line the runner would read as a command is one the action means; returns the annotations. */
function checkCommands(r: RunResult): string[] {
  const open: string[] = [];
  const seen = new Set<string>();
  const messages: string[] = [];
  for (const line of commandLines(r.stdout)) {
    const stop = STOP.exec(line);
    if (stop) {
      expect(seen.has(stop[1]), `token used twice: ${line}`).toBe(false);
      seen.add(stop[1]);
      open.push(stop[1]);
      continue;
    }
    if (open.length > 0 && line === `::${open[open.length - 1]}::`) {
      open.pop();
      continue;
    }
    if (GROUP.test(line) || line === '::endgroup::') continue;
    const a = ANNOTATION.exec(line);
    expect(
      a,
      `a line the runner would run that the action did not mean: ${JSON.stringify(line.slice(0, 200))}`,
    ).not.toBe(null);
    // The annotation's text is the sanitiser's: no "::" survives in it, nothing raw.
    expect(a![3], line).not.toContain('::');
    messages.push(a![3]);
  }
  expect(open, 'every stop-commands block is resumed').toEqual([]);
  for (const token of seen) for (const s of CORPUS) expect(s).not.toContain(token);
  return messages;
}

/**
 * The summary or the comment: no raw control character (the zero-width spaces the escaper puts
 * after "@", "#" and ":" and before "www." aside), no corpus string whole, and nothing from the
 * data live as a CommonMark renderer reads it. ("::" may stay: neither file is a log line.)
 */
function checkMarkdown(md: string, what: string): void {
  const ours = md.replace(/([@#:\uff20\ufe6b])\u200b/g, '$1').replace(/\u200b\./g, '.');
  expect(rawControlLines(ours, what)).toEqual([]);
  for (const s of CORPUS) expect(md.includes(s), `${what} holds ${JSON.stringify(s.slice(0, 40))} raw`).toBe(false);
  expect(md, what).not.toContain('\x1b');
  const html = expectInertMarkdown(md, what);
  expect(html, what).not.toMatch(/<(a|img|script)\b/);
}

function checkStreams(r: RunResult): string[] {
  expect(rawControlLines(r.stdout, 'stdout')).toEqual([]);
  expect(rawControlLines(r.stderr, 'stderr')).toEqual([]);
  expect(commandLines(r.stderr)).toEqual([]);
  expect(r.stdout + r.stderr).not.toMatch(/\n\s+at /);
  for (const [name, value] of Object.entries(r.outputs)) expect(rawControlLines(value, `output ${name}`)).toEqual([]);
  return checkCommands(r);
}

function explain(r: RunResult): string {
  return `exit ${r.code} (signal ${r.signal}) after ${r.ms} ms\n--- stdout\n${r.stdout.slice(-4000)}\n--- stderr\n${r.stderr.slice(-4000)}`;
}

const DATA_BEFORE = `data/${HOSTILE_FILE_NAMES[0]}.csv`;
const DATA_AFTER = `data/${HOSTILE_FILE_NAMES[4]}.csv`;
/** One name with control characters (its annotations go without a location) and one without. */
const CONFIG_AFTER = `${HOSTILE_FILE_NAMES[15]}.yml`;
const CONFIG_PLAIN = `${HOSTILE_FILE_NAMES.find((n) => isPrintable(n) && n.includes('::') && !/\s/.test(n))}.yml`;

const { list, node24Problem } = runtimes();

describe.each(list)('hostile strings through the action bundle under $label', (runtime: Runtime) => {
  const standIn = standInPerTest(runtime, node24Problem);
  const run = (o: Omit<RunOptions, 'runtime' | 'apiUrl'>): Promise<RunResult> =>
    runAction({ ...o, runtime, apiUrl: standIn().url });

  it('baseline, then a pull request: the log, outputs, summary and comment hold every string inert', async () => {
    const before = hostileTable(0);
    const after = hostileTable(1);
    const ws = makeWorkspace({
      'neuron-budget.yml': hostileConfig(DATA_BEFORE, before),
      [DATA_BEFORE]: before.csv,
      [CONFIG_AFTER]: hostileConfig(DATA_AFTER, after, { listFeatures: true }),
      [DATA_AFTER]: after.csv,
    });
    const first = await run({
      workspace: ws,
      eventName: 'push',
      event: pushEvent(),
      inputs: { 'update-baseline': 'true' },
    });
    expect(first.code, explain(first)).toBe(0);
    expect(first.outputs['baseline']).toMatch(/neuron-budget\.baseline\.json$/);
    checkStreams(first);
    checkMarkdown(first.summary, 'summary');
    // The data summary reached the log, escaped, inside a stop-commands block.
    expect(first.stdout).toContain(`${before.labels.length} classes`);
    expect(first.stdout).toContain(escapeText(DATA_BEFORE));

    const second = await run({
      workspace: ws,
      eventName: 'pull_request',
      event: pullRequestEvent(),
      inputs: { config: CONFIG_AFTER },
    });
    expect([0, 1], explain(second)).toContain(second.code);
    checkStreams(second);
    checkMarkdown(second.summary, 'summary');
    const comments = standIn().all(PR_NUMBER);
    expect(comments).toHaveLength(1);
    checkMarkdown(comments[0].body, 'comment');
    // The strings are there, escaped: the data changes name every new class and the new data file.
    for (const label of after.labels.filter((l) => !before.labels.includes(l)))
      expect(second.summary).toContain(`New class ${escapeMarkdown(label)}.`);
    expect(second.summary).toContain(`Data file ${escapeMarkdown(DATA_BEFORE)} → ${escapeMarkdown(DATA_AFTER)}.`);
    expect(second.stdout).toContain(escapeText(CONFIG_AFTER));
  });

  it.each([
    ['a config name with control characters', CONFIG_AFTER],
    ['a config name without them', CONFIG_PLAIN],
  ])('bad input with %s: one escaped error annotation; summary and comment inert', async (_what, configName) => {
    const table = hostileTable(0);
    const config = hostileConfig(DATA_BEFORE, table).replace(
      `  target: ${yamlString(table.target)}`,
      `  target: ${yamlString(HOSTILE_MESSAGES.join(''))}`,
    );
    const ws = makeWorkspace({ [configName]: config, [DATA_BEFORE]: table.csv });
    const r = await run({
      workspace: ws,
      eventName: 'pull_request',
      event: pullRequestEvent(),
      inputs: { config: configName },
    });
    expect(r.code, explain(r)).toBe(2);
    const messages = checkStreams(r);
    expect(messages).toHaveLength(1);
    expect(messages[0]).toContain('data.target: expected a column of');
    expect(messages[0].length).toBeLessThan(3000);
    const errors = r.annotations.filter((a) => a.level === 'error');
    // A file name the log cannot show raw is left off the annotation; a plain one keeps it, with line and column.
    if (configName === CONFIG_PLAIN) expect(errors[0].props).toMatchObject({ file: configName, line: '3', col: '3' });
    else expect(errors[0].props['file']).toBeUndefined();
    checkMarkdown(r.summary, 'summary');
    expect(r.summary).toContain('could not run');
    checkMarkdown(standIn().all(PR_NUMBER)[0].body, 'comment');
  });
});
