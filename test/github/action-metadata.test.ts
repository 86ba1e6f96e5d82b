import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
import { actionMetadata, repoRoot } from './harness.js';

describe('action.yml', () => {
  const meta = actionMetadata();

  it('runs the committed bundle on node24', () => {
    expect(meta.runs).toEqual({ using: 'node24', main: 'dist/index.js' });
    expect(meta.name).toBe('neuron-budget');
    expect(meta.description.length).toBeGreaterThan(20);
    // The colours GitHub's metadata syntax allows for branding.
    expect(['white', 'black', 'yellow', 'blue', 'green', 'orange', 'red', 'purple', 'gray-dark']).toContain(
      meta.branding?.color,
    );
    expect(meta.branding?.icon).toMatch(/^[a-z0-9-]+$/);
  });

  it('declares the inputs with their defaults, each documented', () => {
    const defaults = Object.fromEntries(Object.entries(meta.inputs).map(([k, v]) => [k, v.default]));
    expect(defaults).toEqual({
      config: 'neuron-budget.yml',
      'github-token': '${{ github.token }}',
      comment: 'true',
      'update-baseline': 'false',
      'working-directory': '.',
      workers: '',
      stage: 'check',
      shards: '4',
      plan: '',
      'shard-index': '',
      parts: '',
    });
    for (const [name, spec] of Object.entries(meta.inputs)) {
      // Input ids: a letter or _ first, then alphanumerics, - or _ (GitHub's metadata syntax).
      expect(name).toMatch(/^[A-Za-z_][A-Za-z0-9_-]*$/);
      expect(spec.description?.length ?? 0, name).toBeGreaterThan(20);
    }
  });

  it('declares every output the shell sets, each documented', () => {
    const source = readFileSync(join(repoRoot, 'src', 'github', 'main.ts'), 'utf8');
    const set = [...source.matchAll(/core\.setOutput\('([^']+)'/g)].map((m) => m[1]).sort();
    expect(Object.keys(meta.outputs).sort()).toEqual(set);
    for (const [name, spec] of Object.entries(meta.outputs))
      expect(spec.description?.length ?? 0, name).toBeGreaterThan(10);
  });

  it('every input is read by the shell under its exact name', () => {
    const source = readFileSync(join(repoRoot, 'src', 'github', 'inputs.ts'), 'utf8');
    const read = new Set([...source.matchAll(/get\('([^']+)'\)/g)].map((m) => m[1]));
    expect([...read].sort()).toEqual(Object.keys(meta.inputs).sort());
  });
});

describe('workflows', () => {
  const wf = (name: string) =>
    parseYaml(readFileSync(join(repoRoot, '.github', 'workflows', name), 'utf8')) as {
      permissions: Record<string, string>;
      jobs: Record<string, { strategy?: { matrix?: { node?: number[] } }; steps: Record<string, unknown>[] }>;
    };

  it('ci tests on Node 20 and 24 and builds', () => {
    const ci = wf('ci.yml');
    const job = Object.values(ci.jobs)[0];
    expect(job.strategy?.matrix?.node).toEqual([20, 24]);
    const runs = job.steps.map((s) => (typeof s['run'] === 'string' ? s['run'] : ''));
    expect(runs.some((r) => r.includes('npm ci'))).toBe(true);
    expect(runs.some((r) => r.includes('npm test'))).toBe(true);
    expect(runs.some((r) => r.includes('npm run build'))).toBe(true);
    expect(ci.permissions).toEqual({ contents: 'read' });
  });

  it('self-test runs the action itself on the base demo and, expecting failure, on the variant', () => {
    const st = wf('self-test.yml');
    const steps = Object.values(st.jobs)[0].steps;
    const uses = steps.filter((s) => s['uses'] === './');
    expect(uses).toHaveLength(2);
    const variant = uses.find((s) =>
      String((s['with'] as Record<string, string>)['config']).endsWith('neuron-budget.pr.yml'),
    )!;
    expect(variant['continue-on-error']).toBe(true);
    const checks = steps.map((s) => JSON.stringify(s)).join('\n');
    expect(checks).toContain('steps.variant.outputs.verdict');
    expect(checks).toContain('steps.variant.outcome');
    expect(st.permissions).toEqual({ contents: 'read', 'pull-requests': 'write' });
  });
});
