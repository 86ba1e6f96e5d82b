/**
 * The step log. Text that quotes repository strings is already escaped (src/common/escape.ts);
 * as a second wall it is printed between `::stop-commands::TOKEN` and `::TOKEN::` with a fresh
 * random token, the platform's documented way to turn command processing off, so nothing in it
 * is read as a workflow command even if an escape were missed.
 */
import { randomUUID } from 'node:crypto';
import * as core from '@actions/core';
import { escapeLines } from '../common/escape.js';

/** Logs `text` (any number of lines) with workflow commands turned off around it. */
export function logUntrusted(text: string): void {
  const token = `neuron-budget-${randomUUID()}`;
  core.info(`::stop-commands::${token}`);
  core.info(escapeLines(text));
  core.info(`::${token}::`);
}
