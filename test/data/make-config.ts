/** A validated Config for data tests, built directly (the config loader has its own tests). */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Config, DataConfig } from '../../src/config/types.js';
import { testConfig } from '../helpers/config.js';

export function tempDir(): string {
  return mkdtempSync(join(tmpdir(), 'nb-data-'));
}

export function makeConfig(
  root: string,
  data: Partial<DataConfig> & { path: string; target: string },
  seed = 1,
): Config {
  return testConfig(root, { data, search: { seed } });
}

/** Writes `text` (or bytes) as `name` in `root` and returns a config that loads it. */
export function withFile(
  root: string,
  name: string,
  content: string | Uint8Array,
  data: Partial<DataConfig> & { target: string },
  seed = 1,
): Config {
  writeFileSync(join(root, name), content);
  return makeConfig(root, { ...data, path: name }, seed);
}
