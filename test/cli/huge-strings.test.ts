// End-to-end: huge strings through the BUILT command line. A class label, a category or a
// used column name longer than 256 characters is refused at its line and column (the README's
// limits); any long value quoted in a message is clipped; a config file over 256 KiB is
// refused before it is parsed. The rows are invented for the test, not measurements.
import { afterAll, describe, expect, test } from 'vitest';
import { expectOneUserError, removeCliTempDirs, runCli } from '../helpers/cli.js';

afterAll(removeCliTempDirs);

const CONFIG = [
  'data:',
  '  path: readings.csv',
  '  target: condition',
  '  validation: 0',
  'target:',
  '  threshold: 0.9',
  'search:',
  '  max-width: 2',
  '  restarts: 1',
  '  required: 1',
  '  max-epochs: 100',
  '  workers: 1',
  '',
].join('\n');

/** 12 rows: rms, site, condition; `over` replaces cells (1-based data row → [site, condition]). */
function readings(over: Record<number, [string?, string?]> = {}, header = 'rms,site,condition'): string {
  const lines = [header];
  for (let i = 1; i <= 12; i++) {
    const worn = i % 2 === 0;
    const site = over[i]?.[0] ?? (i % 3 === 0 ? 'north' : 'south');
    const label = over[i]?.[1] ?? (worn ? 'worn' : 'healthy');
    lines.push(`${worn ? 4 : 1}.${i % 10},${site},${label}`);
  }
  return `${lines.join('\n')}\n`;
}

const files = (csv: string, config = CONFIG) => ({ 'neuron-budget.yml': config, 'readings.csv': csv });

describe('huge strings', () => {
  test('two long class labels: refused at the first, in one short line; nothing written', async () => {
    const run = await runCli(['check', '--model', 'model.json', '--report', 'report.json'], {
      files: files(readings({ 3: [undefined, 'w'.repeat(300)], 5: [undefined, 'x'.repeat(5_000_000)] })),
    });
    expectOneUserError(run, 'readings.csv:4:3:', [
      'column 3 "condition"',
      'a class label may have at most 256 characters',
      'found one of 300 characters',
      `"${'w'.repeat(39)}…"`,
    ]);
    expect(run.stderr.length).toBeLessThan(1000);
    expect(run.created).toEqual([]);
  });

  test('a 1 MB category is refused at its line and column; no model is written', async () => {
    const run = await runCli(['check', '--model', 'model.json'], {
      files: files(readings({ 7: [`P-${'9'.repeat(1_000_000)}`] })),
    });
    expectOneUserError(run, 'readings.csv:8:2:', [
      'column 2 "site"',
      'a category may have at most 256 characters',
      'found one of 1,000,002 characters',
    ]);
    expect(run.stderr.length).toBeLessThan(1000);
    expect(run.created).toEqual([]);
  });

  test('256 characters (counted as characters, not bytes or UTF-16 units) are accepted; 257 are not', async () => {
    const ok = await runCli(['check'], { files: files(readings({ 2: [undefined, '\u{1F600}'.repeat(256)] })) });
    expect(ok.stderr).not.toContain('error:');
    expect([0, 1]).toContain(ok.code);
    const tooLong = await runCli(['check'], { files: files(readings({ 2: [undefined, 'é'.repeat(257)] })) });
    expectOneUserError(tooLong, 'readings.csv:3:3:', ['found one of 257 characters']);
  });

  test('a used column name over 256 characters is refused at line 1 and its column', async () => {
    const name = `rms_${'v'.repeat(2000)}`;
    const run = await runCli(['check'], { files: files(readings({}, `${name},site,condition`)) });
    expectOneUserError(run, 'readings.csv:1:1:', [
      'column 1: a column name may have at most 256 characters',
      'found one of 2,004 characters',
    ]);
    expect(run.stderr.length).toBeLessThan(1000);
  });

  test('a 200 KB data.target is quoted clipped in its message', async () => {
    const run = await runCli(['check'], {
      files: files(readings(), CONFIG.replace('target: condition', `target: ${'t'.repeat(200_000)}`)),
    });
    expectOneUserError(run, 'neuron-budget.yml:3:3:', ['data.target', `found "${'t'.repeat(79)}…"`]);
    expect(run.stderr.length).toBeLessThan(1000);
  });

  test('a 12.7 MB config with an 800,000-item list is refused by its size, before it is parsed', async () => {
    const items = Array.from({ length: 800_000 }, (_, i) => `    - c${String(i).padStart(9, '0')}`).join('\n');
    const config = CONFIG.replace('  validation: 0\n', `  validation: 0\n  ignore:\n${items}\n`);
    expect(config.length).toBeGreaterThan(12_700_000);
    const run = await runCli(['check'], { files: files(readings(), config) });
    expectOneUserError(run, 'neuron-budget.yml:', [
      `the config file has ${config.length.toLocaleString('en-US')} bytes`,
      'a config may have at most 262,144',
    ]);
  });
});
