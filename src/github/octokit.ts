/**
 * The REST client: `@actions/github` with the retry plugin (5xx and other transient failures,
 * growing delays) and the throttling plugin (primary and secondary rate limits).
 */
import { getOctokit } from '@actions/github';
import { retry } from '@octokit/plugin-retry';
import { throttling } from '@octokit/plugin-throttling';

export type Octokit = ReturnType<typeof getOctokit>;

export interface ClientOptions {
  token: string;
  baseUrl: string;
  /**
   * Unit of every back-off delay, in milliseconds (the plugins' `retryAfterBaseValue`;
   * their default is 1000). Only tests lower it.
   */
  retryBaseMs: number;
  warn: (message: string) => void;
}

/** Status codes a retry cannot fix. 403 is left to the throttling plugin, which retries only rate limits. */
const DO_NOT_RETRY = [400, 401, 403, 404, 410, 422, 451];
/** Retries after a rate limit; a CI step should not wait longer than this for one comment. */
const MAX_LIMIT_RETRIES = 2;
const MAX_WAIT_SECONDS = 120;

export function makeClient(o: ClientOptions): Octokit {
  const onLimit =
    (kind: string) =>
    (
      retryAfter: number,
      options: { method?: string; url?: string },
      _octokit: unknown,
      retryCount: number,
    ): boolean => {
      const what = `${options.method ?? ''} ${options.url ?? ''}`.trim();
      if (retryCount < MAX_LIMIT_RETRIES && retryAfter <= MAX_WAIT_SECONDS) {
        o.warn(`GitHub ${kind} rate limit on ${what}; retrying in ${retryAfter} s (attempt ${retryCount + 2})`);
        return true;
      }
      o.warn(`GitHub ${kind} rate limit on ${what}; giving up after ${retryCount + 1} attempts`);
      return false;
    };
  return getOctokit(
    o.token,
    {
      baseUrl: o.baseUrl,
      retry: { doNotRetry: DO_NOT_RETRY, retries: 3, retryAfterBaseValue: o.retryBaseMs },
      throttle: {
        retryAfterBaseValue: o.retryBaseMs,
        onRateLimit: onLimit('primary'),
        onSecondaryRateLimit: onLimit('secondary'),
      },
    },
    retry,
    throttling,
  );
}

/** Reads the test-only delay unit; anything unusable falls back to the plugins' default. */
export function retryBaseFromEnv(env: NodeJS.ProcessEnv): number {
  const v = Number(env['NEURON_BUDGET_RETRY_BASE_MS']);
  return Number.isFinite(v) && v >= 0 && v <= 60_000 ? v : 1000;
}
