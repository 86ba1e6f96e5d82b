import { mkdirSync, mkdtempSync, realpathSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { UserError } from '../../src/common/errors.js';
import { configSlug, outputFolder, parseBooleanInput, parseWorkersInput, readInputs } from '../../src/github/inputs.js';

function workspace(): string {
  const parent = realpathSync(mkdtempSync(join(tmpdir(), 'nb-inputs-')));
  const ws = join(parent, 'ws');
  mkdirSync(join(ws, 'models', 'pump-a'), { recursive: true });
  writeFileSync(join(ws, 'models', 'pump-a', 'neuron-budget.yml'), 'data: {}\n');
  mkdirSync(join(parent, 'elsewhere'));
  symlinkSync(join(parent, 'elsewhere'), join(ws, 'out'));
  return ws;
}

const reader = (values: Record<string, string>) => (name: string) => values[name] ?? '';

function thrown(f: () => unknown): UserError {
  try {
    f();
  } catch (e) {
    if (e instanceof UserError) return e;
    throw e;
  }
  throw new Error('expected a UserError');
}

describe('scalar inputs', () => {
  it("accepts the runner's boolean spellings and names the input otherwise", () => {
    for (const t of ['true', 'True', 'TRUE']) expect(parseBooleanInput('comment', t)).toBe(true);
    for (const f of ['false', 'False', 'FALSE']) expect(parseBooleanInput('comment', f)).toBe(false);
    expect(thrown(() => parseBooleanInput('update-baseline', 'yes')).message).toBe(
      'input update-baseline: expected true or false, found "yes"',
    );
  });
  it('workers: empty is every core; otherwise 1 to 256', () => {
    expect(parseWorkersInput('')).toBe(null);
    expect(parseWorkersInput('1')).toBe(1);
    expect(parseWorkersInput('256')).toBe(256);
    for (const bad of ['0', '257', '2.5', '-1', 'four', '1e2']) {
      expect(thrown(() => parseWorkersInput(bad)).message).toContain(`found "${bad}"`);
    }
  });
});

describe('readInputs', () => {
  it('resolves config against working-directory inside the workspace and applies defaults', () => {
    const ws = workspace();
    const i = readInputs(reader({ 'working-directory': 'models/pump-a', 'github-token': 't' }), {
      GITHUB_WORKSPACE: ws,
    });
    expect(i.configPath).toBe(join(ws, 'models', 'pump-a', 'neuron-budget.yml'));
    expect(i.configKey).toBe('models/pump-a/neuron-budget.yml');
    expect(i).toMatchObject({ comment: true, updateBaseline: false, workers: null, token: 't', workspace: ws });
  });
  it('refuses escapes: ../, absolute paths elsewhere, and links that lead out', () => {
    const ws = workspace();
    const env = { GITHUB_WORKSPACE: ws };
    expect(thrown(() => readInputs(reader({ config: '../x.yml' }), env)).message).toMatch(
      /^input config: .*outside the workspace/,
    );
    expect(thrown(() => readInputs(reader({ config: '/etc/passwd' }), env)).message).toMatch(
      /^input config: .*absolute path outside/,
    );
    expect(thrown(() => readInputs(reader({ 'working-directory': '..' }), env)).message).toMatch(
      /^input working-directory: /,
    );
    expect(thrown(() => readInputs(reader({ config: 'out/neuron-budget.yml' }), env)).message).toMatch(/symbolic link/);
  });
  it('a missing working directory or workspace is a clear error', () => {
    const ws = workspace();
    expect(thrown(() => readInputs(reader({ 'working-directory': 'nope' }), { GITHUB_WORKSPACE: ws })).message).toMatch(
      /^input working-directory: "nope" does not exist/,
    );
    expect(thrown(() => readInputs(reader({}), {})).message).toMatch(/^GITHUB_WORKSPACE is not set/);
  });
  it('checks the scalar inputs before touching any path', () => {
    expect(thrown(() => readInputs(reader({ comment: 'maybe', config: '../x' }), {})).message).toMatch(
      /^input comment:/,
    );
  });
});

describe('output folder', () => {
  it('is per config under RUNNER_TEMP, else in the workspace', () => {
    const ws = workspace();
    const i = readInputs(reader({ 'working-directory': 'models/pump-a' }), { GITHUB_WORKSPACE: ws });
    expect(outputFolder(i, { RUNNER_TEMP: '/runner/tmp' })).toBe(
      '/runner/tmp/neuron-budget/models_pump-a_neuron-budget',
    );
    expect(outputFolder(i, {})).toBe(join(ws, '.neuron-budget', 'models_pump-a_neuron-budget'));
    expect(configSlug('../..')).not.toMatch(/^\./);
  });
  it('is named after the config without its YAML extension, never like a file', () => {
    expect(configSlug('neuron-budget.yml')).toBe('neuron-budget');
    expect(configSlug('ci/gate.pr.YAML')).toBe('ci_gate.pr');
    expect(configSlug('.neuron-budget.yml')).toBe('_neuron-budget');
    expect(configSlug('settings.json')).toBe('settings.json');
  });
});
