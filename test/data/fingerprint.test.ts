import { describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { loadData } from '../../src/data/index.js';
import { tempDir, withFile } from './make-config.js';

const BASE = [
  ['reading_id', 'pump_model', 'rms', 'kurtosis', 'condition'],
  ['1', 'P-100', '2.5', '3.1', 'normal'],
  ['2', 'P-200', '4.25', '2.9', 'imbalance'],
  ['3', 'P-100', '1.75', '6.0', 'bearing_wear'],
  ['4', 'P-200', '2.0', '3.0', 'normal'],
  ['5', 'P-100', '5.5', '3.3', 'imbalance'],
  ['6', 'P-200', '1.5', '7.25', 'bearing_wear'],
];

function csv(rows: string[][], eol = '\n'): string {
  return rows.map((r) => r.join(',')).join(eol) + eol;
}

async function print(content: string, extra: Record<string, unknown> = {}): Promise<string> {
  const config = withFile(tempDir(), 'd.csv', content, {
    target: 'condition',
    validation: 0,
    ignore: ['reading_id'],
    ...extra,
  });
  return (await loadData(config)).fingerprint;
}

describe('fingerprint', () => {
  it('is a sha256 hex digest (checked against node:crypto on a known input)', async () => {
    const f = await print(csv(BASE));
    expect(f).toMatch(/^[0-9a-f]{64}$/);
    // The hash itself is node:crypto's; the FIPS 180-2 test vector "abc" confirms it is sha256.
    expect(createHash('sha256').update('abc').digest('hex')).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
  });

  it('does not change with CRLF line endings, a BOM, quoting or number spelling', async () => {
    const f = await print(csv(BASE));
    expect(await print(csv(BASE, '\r\n'))).toBe(f);
    expect(await print('\uFEFF' + csv(BASE))).toBe(f);
    expect(await print(csv(BASE.map((r) => r.map((v) => `"${v}"`))))).toBe(f);
    const respelt = BASE.map((r, i) => (i === 0 ? r : r.map((v, j) => (j === 2 ? `${v}0` : v))));
    expect(await print(csv(respelt))).toBe(f);
    expect(await print(csv(BASE) + '\n\n')).toBe(f);
  });

  it('does not change with column order', async () => {
    const f = await print(csv(BASE));
    const order = [4, 2, 0, 3, 1];
    expect(await print(csv(BASE.map((r) => order.map((j) => r[j]))))).toBe(f);
  });

  it('changes when any one value changes', async () => {
    const f = await print(csv(BASE));
    for (const [row, col, value] of [
      [3, 2, '1.76'],
      [5, 3, '3.30001'],
      [2, 1, 'P-300'],
      [6, 4, 'normal'],
    ] as const) {
      const changed = BASE.map((r) => [...r]);
      changed[row][col] = value;
      expect(await print(csv(changed))).not.toBe(f);
    }
  });

  it('changes when rows are reordered or a column is left out', async () => {
    const f = await print(csv(BASE));
    expect(await print(csv([BASE[0], BASE[2], BASE[1], ...BASE.slice(3)]))).not.toBe(f);
    expect(await print(csv(BASE), { ignore: ['reading_id', 'kurtosis'] })).not.toBe(f);
  });

  it('covers the data as used: an ignored column does not count', async () => {
    const f = await print(csv(BASE));
    const changed = BASE.map((r, i) => (i === 0 ? r : [String(100 + i), ...r.slice(1)]));
    expect(await print(csv(changed))).toBe(f);
  });
});
