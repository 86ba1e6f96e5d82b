/**
 * The commands that work on a model file (written by `check --model` or the action's `model`
 * output): `export` writes firmware source, `predict` scores the rows of a CSV file.
 */
import { mkdir, readFile, stat } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { escapeText, quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';
import { formatMetric } from '../common/format.js';
import { displayPath } from '../common/paths.js';
import { DEFAULT_C_NAME, exportC } from '../device/index.js';
import { writeOutput } from '../files/output.js';
import { parseModel, type ModelDocument } from '../model/index.js';
import { scoreCsv } from '../model/score-csv.js';
import { TOOL_VERSION } from '../version.js';
import { UsageError } from './args.js';

async function readModel(root: string, path: string): Promise<ModelDocument> {
  const file = resolve(root, path);
  const shown = displayPath(root, file);
  let text: string;
  try {
    text = await readFile(file, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw new UserError(`${shown}: model file not found`, { file: shown });
    if (code === 'EISDIR') throw new UserError(`${shown}: expected a model file, found a folder`, { file: shown });
    throw new UserError(`${shown}: the model file cannot be read (${code ?? 'unknown error'})`, { file: shown });
  }
  return parseModel(text, shown);
}

/** `export MODEL.json --format c --out DIR [--name NAME]`: NAME.h and NAME.c in DIR. */
export async function runExport(
  root: string,
  args: string[],
  flags: { format?: string; out?: string; name?: string },
): Promise<string> {
  if (flags.format !== 'c') throw new UsageError(`export: --format: expected c, found ${quote(flags.format ?? '')}`);
  const model = await readModel(root, args[0]);
  if (model.int8 === null) {
    throw new UserError(
      `${args[0]}: the model has no int8 form (it was written by an older neuron-budget); run check --model again to write one with it`,
    );
  }
  const name = flags.name ?? DEFAULT_C_NAME;
  const dir = resolve(root, flags.out ?? '.');
  const info = await stat(dir).catch(() => null);
  if (info !== null && !info.isDirectory())
    throw new UserError(`export: --out ${escapeText(displayPath(root, dir))} is not a folder`);
  if (info === null) await mkdir(dir, { recursive: true });
  const files = exportC(
    { task: model.task, encoding: model.encoding, network: model.network, int8: model.int8 },
    name,
    {
      toolVersion: model.provenance?.tool.version ?? TOOL_VERSION,
      dataFingerprint: model.provenance?.data ?? 'unknown (a model of version 1)',
      config: model.provenance?.config ?? 'unknown (a model of version 1)',
    },
  );
  await writeOutput(join(dir, files.headerFile), files.header, 'header', root);
  await writeOutput(join(dir, files.sourceFile), files.source, 'source', root);
  return `wrote ${escapeText(displayPath(root, join(dir, files.headerFile)))} and ${escapeText(displayPath(root, join(dir, files.sourceFile)))}`;
}

/** A CSV field: quoted when it holds a delimiter, a quote or a line break. */
function csvField(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/**
 * `predict MODEL.json DATA.csv [--out FILE]`: one CSV row per data row, the prediction and then
 * one probability column per class (regression: the predicted value). With the target column in
 * the data, the model's metric on those rows goes to stderr.
 */
export async function runPredict(
  root: string,
  args: string[],
  flags: { out?: string },
  write: (text: string) => void,
): Promise<string> {
  const model = await readModel(root, args[0]);
  const dataPath = resolve(root, args[1]);
  const file = { path: dataPath, shown: displayPath(root, dataPath) };
  const labels = model.encoding.target.classes ?? [];
  const K = model.network.outputs;
  const header = model.task === 'regression' ? ['prediction'] : ['prediction', ...labels.map((l) => `p(${l})`)];
  const lines: string[] = [header.map(csvField).join(',')];
  const outPath = flags.out === undefined ? null : resolve(root, flags.out);
  const emit = (line: string): void => {
    if (outPath === null) write(`${line}\n`);
    else lines.push(line);
  };
  if (outPath === null) write(`${lines[0]}\n`);
  const scored = await scoreCsv(model, file, (batch) => {
    for (let p = 0; p < batch.rows; p++) {
      if (model.task === 'regression') {
        emit(String(batch.outputs[p]));
        continue;
      }
      const probs =
        K === 1 ? [1 - batch.outputs[p], batch.outputs[p]] : Array.from(batch.outputs.subarray(p * K, p * K + K));
      emit([csvField(labels[batch.classes[p]]), ...probs.map(String)].join(','));
    }
  });
  if (outPath !== null) await writeOutput(outPath, `${lines.join('\n')}\n`, 'predictions', root);
  const where = outPath === null ? '' : ` to ${escapeText(displayPath(root, outPath))}`;
  const metric = scored.metric === null ? '' : `; ${model.target.metric} ${formatMetric(scored.metric)} on these rows`;
  return `scored ${scored.rows} rows${where}${metric}`;
}
