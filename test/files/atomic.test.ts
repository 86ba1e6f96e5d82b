// writeFileAtomic: the whole new content or the old, never a half-written file or a leftover.
import { chmodSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { writeFileAtomic } from '../../src/files/atomic.js';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'neuron-budget-atomic-'));
});
afterEach(() => {
  chmodSync(dir, 0o755);
  rmSync(dir, { recursive: true, force: true });
});

describe('writeFileAtomic', () => {
  test('writes a new file and leaves nothing else', async () => {
    await writeFileAtomic(join(dir, 'report.json'), '{"a":1}\n');
    expect(readFileSync(join(dir, 'report.json'), 'utf8')).toBe('{"a":1}\n');
    expect(readdirSync(dir)).toEqual(['report.json']);
  });

  test('replaces an existing file whole', async () => {
    writeFileSync(join(dir, 'base.json'), 'old content that is longer than the new one');
    await writeFileAtomic(join(dir, 'base.json'), 'new');
    expect(readFileSync(join(dir, 'base.json'), 'utf8')).toBe('new');
    expect(readdirSync(dir)).toEqual(['base.json']);
  });

  test('keeps UTF-8 text intact', async () => {
    const text = 'Pumpe Nr. 3 · ≤ 0.02 · 泵\n';
    await writeFileAtomic(join(dir, 't.txt'), text);
    expect(readFileSync(join(dir, 't.txt'), 'utf8')).toBe(text);
  });

  test('a failed rename removes the temp file and leaves the target as it was', async () => {
    mkdirSync(join(dir, 'taken'));
    writeFileSync(join(dir, 'taken', 'inside.txt'), 'x');
    await expect(writeFileAtomic(join(dir, 'taken'), 'text')).rejects.toThrow();
    expect(readdirSync(dir)).toEqual(['taken']);
    expect(readdirSync(join(dir, 'taken'))).toEqual(['inside.txt']);
  });

  test('a missing folder rejects and creates nothing', async () => {
    await expect(writeFileAtomic(join(dir, 'no', 'such', 'file.json'), 'x')).rejects.toMatchObject({ code: 'ENOENT' });
    expect(readdirSync(dir)).toEqual([]);
  });
});
