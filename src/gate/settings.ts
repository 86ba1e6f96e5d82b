/**
 * The config settings that change the search's answer, and their fingerprint. Two runs
 * with different settings answer different questions, so the gate says so rather than
 * comparing their widths silently. Worker count and time budget are left out: they
 * change how long the search takes, not what it finds. The data file's path is left out
 * too: the data are compared by content (fingerprint and profile, see data-changes.ts),
 * so a renamed file with the same rows is the same question, and a file with other rows
 * shows up as a data change, which is what the gate exists to measure.
 */
import { createHash } from 'node:crypto';
import { clip } from '../common/escape.js';
import type { Config } from '../config/types.js';
import { CONFIG_SPEC } from '../config/spec.js';
import { fieldName } from '../config/keys.js';
import type { ResultSettings } from './types.js';

export function resultSettings(config: Config): ResultSettings {
  const out: ResultSettings = {};
  for (const section of CONFIG_SPEC) {
    const values = config[section.name] as unknown as Record<string, ResultSettings[string]>;
    for (const key of section.keys) {
      if (!key.changesResult) continue;
      out[`${section.name}.${key.name}`] = settingValue(values[fieldName(key.name)]);
    }
  }
  // The order of ignored columns does not matter; the order of features does (input order).
  const ignore = out['data.ignore'];
  if (Array.isArray(ignore)) ignore.sort();
  return out;
}

/** A setting as the baseline records it: a plain value, a list of texts, or a structured value as its canonical text. */
function settingValue(value: unknown): ResultSettings[string] {
  if (value === undefined || value === null) return null;
  if (Array.isArray(value) && value.every((v) => typeof v === 'string')) return [...value];
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') return value;
  // target.min-recall: {every} or {classes: [...]}, written the way the config states it.
  const rule = value as { every?: number; classes?: { label: string; min: number }[] };
  if (typeof rule.every === 'number') return rule.every;
  return JSON.stringify(Object.fromEntries((rule.classes ?? []).map((c) => [c.label, c.min])));
}

/** sha256 hex of the settings in canonical form (keys sorted). */
export function settingsFingerprint(settings: ResultSettings): string {
  const keys = Object.keys(settings).sort();
  const canonical = JSON.stringify(keys.map((k) => [k, settings[k]]));
  return createHash('sha256').update(canonical, 'utf8').digest('hex');
}

/** Settings that differ, as "key: before → after", in key order. */
export function settingsDifferences(before: ResultSettings, after: ResultSettings): string[] {
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
  const out: string[] = [];
  for (const k of keys) {
    const a = show(before[k]);
    const b = show(after[k]);
    if (a !== b) out.push(`${k}: ${a} → ${b}`);
  }
  return out;
}

function show(v: ResultSettings[string] | undefined): string {
  if (v === undefined) return '(not set)';
  if (v === null) return '(default)';
  // Column names are the repository's strings: each is clipped, and long lists would drown the
  // sentence they appear in. Escaping is the renderer's (text, Markdown), as for every reason.
  const s = Array.isArray(v) ? `[${v.map((name) => clip(name, 40)).join(', ')}]` : clip(String(v), 120);
  return clip(s, 120);
}
