/** The help text of the command line. */
import { TOOL_NAME, TOOL_VERSION } from '../version.js';
import { COMMANDS, FLAGS, type Command, type CommandSpec } from './args.js';

export function usage(command: Command | null): string {
  if (command !== null) {
    const spec = COMMANDS[command];
    const lines = [
      `${TOOL_NAME} ${command}: ${spec.summary}`,
      '',
      `usage: ${TOOL_NAME} ${command}${argsText(spec)} [options]`,
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
    ...Object.entries(COMMANDS).map(([c, s]) => `  ${TOOL_NAME} ${c.padEnd(9)}${argsText(s)} [options]`),
    `  ${TOOL_NAME} COMMAND --help   options of one command`,
    `  ${TOOL_NAME} --version`,
    '',
    'commands:',
    ...Object.entries(COMMANDS).map(([c, s]) => `  ${c.padEnd(10)}${s.summary}`),
    '',
    'The current folder is the workspace. Paths in the config file resolve against',
    "the config file's folder and must stay inside the workspace.",
    'Messages go to stderr; stdout carries only what was asked for',
    "(--help, --version, baseline's one line, plan's shard list, predict's CSV).",
    '',
    exitCodesText(),
  ].join('\n');
}

function argsText(spec: CommandSpec): string {
  const rest = spec.rest === undefined ? '' : ` ${spec.rest}...`;
  return `${(spec.positionals ?? []).map((a) => ` ${a}`).join('')}${rest}`;
}

function exitCodesText(): string {
  return 'exit codes: 0 pass, improved or new; 1 fail or inconclusive; 2 bad input';
}
