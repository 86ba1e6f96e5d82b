/** What the key list (spec.ts) implies: how a rule reads in a message, field names, defaults. */
import { CONFIG_SPEC, DERIVED, REQUIRED, type SectionSpec, type ValueRule } from './spec.js';

/** "an integer from 1 to 1000", "one of tanh, logistic, relu", … for messages. */
export function describeRule(rule: ValueRule): string {
  const orNull = 'nullable' in rule && rule.nullable ? ', or null' : '';
  switch (rule.kind) {
    case 'integer':
      return `an integer from ${rule.min} to ${rule.max}${orNull}`;
    case 'number': {
      const low = rule.exclusiveMin ? `above ${rule.min}` : `of ${rule.min} or more`;
      if (rule.max === Number.MAX_VALUE) return `a number ${low}${orNull}`;
      if (rule.exclusiveMax)
        return `a number ${rule.exclusiveMin ? low : `from ${rule.min}`} and below ${rule.max}${orNull}`;
      return `a number ${rule.exclusiveMin ? low : `from ${rule.min}`} and at most ${rule.max}${orNull}`;
    }
    case 'enum':
      return `one of ${rule.values.join(', ')}${orNull}`;
    case 'boolean':
      return 'true or false';
    case 'text':
      return 'a column name (text)';
    case 'character':
      return 'a single character other than a quote or a line break';
    case 'path':
      return 'a path relative to the config file';
    case 'text-list':
      return `a list of column names${rule.minItems > 0 ? ` (at least ${rule.minItems})` : ''}${orNull}`;
    case 'recall':
      return `a recall above 0 and at most 1, or a mapping of class labels to such recalls${orNull}`;
  }
}

/** `min-width` → `minWidth`: how the typed config names a key. */
export function fieldName(key: string): string {
  return key.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
}

/**
 * A section's documented defaults by typed field name (required and derived keys left out), for
 * code that builds a config without a file (tests, benchmarks).
 * @testOnly
 */
export function sectionDefaults(section: SectionSpec['name']): Record<string, unknown> {
  const spec = CONFIG_SPEC.find((s) => s.name === section);
  const out: Record<string, unknown> = {};
  for (const key of spec?.keys ?? []) {
    if (key.default === REQUIRED || key.default === DERIVED) continue;
    out[fieldName(key.name)] = Array.isArray(key.default) ? [...key.default] : key.default;
  }
  return out;
}

/** The judging fraction when validation rows are held out (common practice for a hold-out test set; no single source). */
const DEFAULT_JUDGING = 0.2;

/** data.judging when the config does not give it: 0.2, or less when the validation rows leave too little to train on. */
export function derivedJudging(validation: number): number {
  return validation > 0 ? Math.min(DEFAULT_JUDGING, (1 - validation) / 2) : 0;
}
