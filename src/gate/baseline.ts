/**
 * The baseline file: build it from a run, carry its history forward, read it back with
 * clear errors, and write it atomically. Everything here is pure except readBaseline
 * and writeBaseline; dates are passed in, never read from a clock.
 */
import { readFile } from 'node:fs/promises';
import type { Config } from '../config/types.js';
import type { LoadedData } from '../data/types.js';
import { quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';
import { writeFileAtomic } from '../files/atomic.js';
import type { SearchResult } from '../search/types.js';
import baselineSchema from '../../schema/baseline.schema.json' with { type: 'json' };
import { schemaValidator, SchemaProblem, type JsonSchema } from '../common/json-schema.js';
import { findJsonSyntaxProblem } from '../common/json-position.js';
import { resultSettings, settingsFingerprint } from './settings.js';
import {
  BASELINE_SCHEMA,
  BASELINE_VERSION,
  HISTORY_CAP,
  type Baseline,
  type BaselineWidth,
  type HistoryEntry,
} from './types.js';

/** The facts of one run that a baseline records. */
export interface RunFacts {
  result: SearchResult;
  loaded: Pick<LoadedData, 'fingerprint' | 'profile'>;
  config: Config;
}

export interface BaselineMeta {
  /** When the baseline is written; the shell passes new Date(). */
  date: Date;
  /** Commit the data came from, when known. */
  commit: string | null;
  toolVersion: string;
}

/**
 * Why this run cannot become a baseline, or null when it can. A baseline only ever
 * records a width that was found: a failed or unfinished search leaves the file as it was.
 */
export function whyNotRecordable(result: SearchResult): string | null {
  if (result.outcome === 'inconclusive') {
    return 'the search did not finish, so there is no result to record; the baseline file was left unchanged';
  }
  if (result.outcome !== 'found' || result.width === null || result.metric === null) {
    return 'no width reached the target, so there is no result to record; the baseline file was left unchanged';
  }
  return null;
}

/**
 * The baseline that accepting `current` produces: its headline and curve, with the
 * previous baseline's history carried forward and this result appended (newest last,
 * oldest dropped beyond HISTORY_CAP). Throws if the run is not recordable; check
 * whyNotRecordable first.
 */
export function nextBaseline(previous: Baseline | null, current: RunFacts, meta: BaselineMeta): Baseline {
  const { result, loaded, config } = current;
  const problem = whyNotRecordable(result);
  if (problem !== null || result.width === null || result.metric === null) {
    throw new Error(`nextBaseline called with an unrecordable result: ${problem ?? 'no width'}`);
  }
  const width = result.width;
  const atWidth = result.widths.find((w) => w.width === width) ?? null;
  const settings = resultSettings(config);
  const entry: HistoryEntry = {
    width,
    metric: result.metric,
    rows: loaded.profile.rows,
    data: loaded.fingerprint,
    commit: commitHash(meta.commit),
    date: meta.date.toISOString(),
  };
  const history = [...(previous?.history ?? []), entry].slice(-HISTORY_CAP);
  return {
    schema: BASELINE_SCHEMA,
    tool: { name: 'neuron-budget', version: meta.toolVersion },
    result: {
      width,
      metric: { name: config.target.metric, value: result.metric, threshold: config.target.threshold },
      grownWidth: result.grownWidth,
      met: atWidth ? atWidth.met : 0,
      restarts: atWidth ? atWidth.restarts : 0,
      searchSeconds: result.timing.searchSeconds,
    },
    widths: result.widths.map((w): BaselineWidth => ({
      width: w.width,
      restarts: w.restarts,
      met: w.met,
      adequate: w.adequate,
      best: w.best,
      decisive: w.decisive,
    })),
    data: {
      file: config.data.pathAsWritten.replace(/\\/g, '/'),
      rows: loaded.profile.rows,
      fingerprint: loaded.fingerprint,
      profile: loaded.profile,
    },
    config: { fingerprint: settingsFingerprint(settings), settings },
    history,
  };
}

/** A commit id as the history stores it (lower-case hex), or null when it is not one. */
function commitHash(commit: string | null): string | null {
  if (commit === null) return null;
  const c = commit.trim().toLowerCase();
  return /^[0-9a-f]{4,64}$/.test(c) ? c : null;
}

export function serializeBaseline(baseline: Baseline): string {
  return `${JSON.stringify(baseline, null, 2)}\n`;
}

/**
 * Writes the baseline atomically (temp file beside it, then rename). The text is first
 * read back through the same validation a later run will use, so a value JSON cannot
 * hold (NaN becomes null) can never produce a baseline that the next run rejects.
 */
export async function writeBaseline(path: string, baseline: Baseline): Promise<void> {
  const text = serializeBaseline(baseline);
  try {
    parseBaseline(text, path);
  } catch (e) {
    throw new Error(`refusing to write a baseline that would not read back: ${(e as Error).message}`, { cause: e });
  }
  await writeFileAtomic(path, text);
}

/**
 * Reads a baseline. Missing file → null (the verdict is then `new`). A file that is not
 * valid JSON, of another schema version, or of the wrong shape → UserError naming the
 * file (`shown`, the path as the user wrote it), and the line/column or key.
 */
export async function readBaseline(path: string, shown: string = path): Promise<Baseline | null> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') return null;
    if (code === 'EISDIR') throw new UserError(`${shown}: expected a baseline file, found a folder`, { file: shown });
    throw new UserError(`${shown}: cannot read the baseline file (${code ?? 'unknown error'})`, { file: shown });
  }
  return parseBaseline(text, shown);
}

/** Parses and validates baseline text; `shown` names the file in messages. */
export function parseBaseline(text: string, shown: string): Baseline {
  if (text.trim() === '') {
    throw new UserError(
      `${shown}: the baseline file is empty; delete it or run \`neuron-budget baseline\` to write it`,
      {
        file: shown,
      },
    );
  }
  const syntax = findJsonSyntaxProblem(text);
  if (syntax) {
    throw new UserError(`${shown}:${syntax.line}:${syntax.column}: the baseline is not valid JSON: ${syntax.detail}`, {
      file: shown,
      line: syntax.line,
      column: syntax.column,
    });
  }
  const value: unknown = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  checkSchemaVersion(value, shown);
  validateBaselineShape(value, shown);
  return value;
}

function checkSchemaVersion(value: unknown, shown: string): void {
  if (!isObject(value)) {
    throw new UserError(`${shown}: expected a neuron-budget baseline (a JSON object), found ${describe(value)}`, {
      file: shown,
    });
  }
  const schema = 'schema' in value ? value['schema'] : MISSING;
  const match = typeof schema === 'string' ? /^neuron-budget\/baseline@(\d+)$/.exec(schema) : null;
  if (!match) {
    throw new UserError(
      `${shown}: schema: expected "${BASELINE_SCHEMA}", found ${describe(schema)}; this file is not a neuron-budget baseline`,
      { file: shown, key: 'schema' },
    );
  }
  const version = Number(match[1]);
  if (version > BASELINE_VERSION) {
    throw new UserError(
      `${shown}: schema: this baseline was written by a newer neuron-budget (baseline@${version}); this version reads baseline@${BASELINE_VERSION}. Upgrade neuron-budget to compare against it`,
      { file: shown, key: 'schema' },
    );
  }
  if (version < BASELINE_VERSION) {
    throw new UserError(
      `${shown}: schema: this baseline (baseline@${version}) was written by an older neuron-budget, which judged networks on the rows that also steered their training; its widths do not compare with this version's. Delete the file and run \`neuron-budget baseline\` to record a new one`,
      { file: shown, key: 'schema' },
    );
  }
  if (version !== BASELINE_VERSION) {
    throw new UserError(`${shown}: schema: expected "${BASELINE_SCHEMA}", found ${describe(schema)}`, {
      file: shown,
      key: 'schema',
    });
  }
}

// ---- shape: schema/baseline.schema.json is the one definition ----

const checkShape = schemaValidator(baselineSchema as unknown as JsonSchema);

function validateBaselineShape(value: unknown, shown: string): asserts value is Baseline {
  try {
    checkShape(value);
  } catch (e) {
    if (!(e instanceof SchemaProblem)) throw e;
    throw new UserError(`${shown}: ${e.key}: expected ${e.expected}, found ${e.found}`, { file: shown, key: e.key });
  }
}

const MISSING = Symbol('missing');

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function describe(v: unknown): string {
  if (v === MISSING) return 'nothing';
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object') return 'an object';
  if (typeof v === 'string') return quote(v, 60);
  return typeof v === 'number' || typeof v === 'boolean' ? String(v) : typeof v;
}
