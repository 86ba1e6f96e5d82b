/**
 * The loopback API stand-in as the action tests use it: a fresh one per test, stopped after it,
 * and every request it saw checked against GitHub's REST schemas. A missing Node runtime fails
 * the test rather than skipping it.
 */
import { afterEach, beforeEach, expect } from 'vitest';
import { OWNER, REPO, type Runtime } from './harness.js';
import { StandIn } from './stand-in.js';

/** Call inside a describe block; the returned function gives the current test's stand-in. */
export function standInPerTest(runtime: Runtime, node24Problem: string | null): () => StandIn {
  let api: StandIn | undefined;
  beforeEach(async () => {
    if (!runtime.bin || (runtime.label.startsWith('node 24') && node24Problem))
      throw new Error(node24Problem ?? 'no binary');
    api = new StandIn({ owner: OWNER, repo: REPO });
    await api.start();
  });
  afterEach(async () => {
    await api?.stop();
    expect(api?.schemaFailures ?? []).toEqual([]);
  });
  return () => {
    if (api === undefined) throw new Error('the stand-in starts before each test');
    return api;
  };
}
