/**
 * The data stage: CSV file → typed columns → split → encoded dataset, fingerprint and
 * profile. See read-csv.ts, columns.ts, target.ts, split.ts, encode.ts, fingerprint.ts
 * and profile.ts for each step.
 */
import { stat } from 'node:fs/promises';
import { displayPath } from '../common/paths.js';
import { configKeyError } from '../config/index.js';
import type { Config } from '../config/types.js';
import { chooseColumns, featureColumn } from './columns.js';
import { encodeDataset } from './encode.js';
import { fingerprint } from './fingerprint.js';
import { profileData, targetSpread } from './profile.js';
import { readCsvColumns } from './read-csv.js';
import { splitRows } from './split.js';
import { targetColumn } from './target.js';
import type { LoadedData } from './types.js';
import { ConfigKeyProblem, type DataFile } from './where.js';

export type { LoadedData, EncodedDataset, DataProfile } from './types.js';

export async function loadData(config: Config): Promise<LoadedData> {
  try {
    return await load(config);
  } catch (error) {
    if (error instanceof ConfigKeyProblem) throw configKeyError(config, error.key, error.detail);
    throw error;
  }
}

async function load(config: Config): Promise<LoadedData> {
  const file: DataFile = { path: config.data.path, shown: displayPath(config.root, config.data.path) };
  await checkExists(file);
  let features: number[] = [];
  const table = await readCsvColumns(file, {
    delimiter: config.data.delimiter,
    missing: config.data.missing,
    plan: (header) => {
      const chosen = chooseColumns(header, config, file);
      features = chosen.features;
      return chosen.plan;
    },
  });
  const stores = table.columns.slice(0, features.length);
  const typed = stores.map((store) => featureColumn(store, file, config.data.maxCategories));
  const target = targetColumn(table.target, config, file);
  const split = splitRows(
    {
      classIndex: target.task === 'classification' ? target.indices : null,
      classes: target.task === 'classification' ? target.classes : null,
      rows: table.rows,
      name: target.name,
      column: target.column,
    },
    { validation: config.data.validation, judging: config.data.judging },
    config.search.seed,
    file,
  );
  return {
    dataset: encodeDataset(typed, target, split),
    rows: table.rows,
    droppedRows: table.droppedRows,
    fingerprint: fingerprint(typed, target, table.rows),
    profile: profileData(typed, target, table.columns, table.rows),
    targetSpread: targetSpread(target),
    splitRows: split,
    judgingFolded: split.judgingFolded,
  };
}

async function checkExists(file: DataFile): Promise<void> {
  let isFile: boolean;
  try {
    isFile = (await stat(file.path)).isFile();
  } catch {
    throw new ConfigKeyProblem('data.path', `expected a CSV file, found nothing at ${file.shown}`);
  }
  if (!isFile) throw new ConfigKeyProblem('data.path', `expected a CSV file, found a folder at ${file.shown}`);
}
