/**
 * The REST client: `@actions/github` with our own request policy in place of generic retry
 * plugins, because the policy must know things they do not:
 *
 * - every attempt has its own timeout, and the whole comment step a budget (one AbortSignal);
 * - a create (POST) is never repeated here: it may have happened although its answer was an
 *   error, so only the caller, after listing again, may send it again;
 * - a rate limit waits as long as GitHub asks (`Retry-After` on 429 as on 403), within limits;
 * - every failure leaves as an ApiFailure naming its real cause.
 */
import { getOctokit } from '@actions/github';
import { ApiFailure, type FailureKind } from './api-failure.js';

export type Octokit = ReturnType<typeof getOctokit>;

export interface Budget {
  /** Aborts every request and every wait when the comment step's time is up. */
  signal: AbortSignal;
  /** When that happens (ms since the epoch), to refuse waits that would pass it. */
  endsAt: number;
}

export interface ClientOptions {
  token: string;
  baseUrl: string;
  /**
   * Unit of every back-off delay and of GitHub's Retry-After seconds, in milliseconds (1000
   * in production). Only tests lower it.
   */
  retryBaseMs: number;
  /** Longest wait for one answer. */
  requestTimeoutMs: number;
  budget: Budget;
  /** Progress notes (retries); failures are thrown, not logged. */
  log: (message: string) => void;
}

/** Attempts for a request that may be repeated (GET, PATCH) after a server error, timeout or lost connection. */
const MAX_ATTEMPTS = 4;
/** Retries after a rate limit; a CI step should not wait longer than this for one comment. */
const MAX_LIMIT_RETRIES = 2;
const MAX_WAIT_SECONDS = 120;
/** GitHub's documented advice when a secondary limit comes without Retry-After: wait at least a minute. */
const SECONDARY_FALLBACK_SECONDS = 60;
/** Methods whose repetition cannot do more than the first try (PATCH here always sends the same body). */
const REPEATABLE = new Set(['GET', 'HEAD', 'PATCH', 'PUT', 'DELETE']);

export function makeClient(o: ClientOptions): Octokit {
  const octokit = getOctokit(o.token, { baseUrl: o.baseUrl });
  octokit.hook.wrap('request', async (request, options) => {
    const parsed = octokit.request.endpoint.parse(options);
    const what = `${parsed.method} ${new URL(parsed.url).pathname}`;
    let attempts = 0;
    let limitRetries = 0;
    for (;;) {
      if (o.budget.signal.aborted) throw new ApiFailure('budget', what, null, 'waiting to send a request', attempts);
      attempts++;
      const timeout = AbortSignal.timeout(o.requestTimeoutMs);
      const signal = AbortSignal.any([timeout, o.budget.signal]);
      let why: Classified;
      // In place, not a copy: the layers below were bound to this very object, and a request
      // called with a new one would silently drop it (before-after-hook binds the options).
      options.request = { ...options.request, signal };
      try {
        return await request(options);
      } catch (e) {
        why = classify(e, o, timeout);
      }
      const fail = (gaveUp = ''): ApiFailure =>
        new ApiFailure(why.kind, what, why.status, why.detail, attempts, why.note, gaveUp);
      if (why.kind === 'rate-limit') {
        const seconds = why.waitSeconds;
        const ms = seconds * o.retryBaseMs;
        if (limitRetries >= MAX_LIMIT_RETRIES) throw fail(`still limited after ${attempts} attempts`);
        if (seconds > MAX_WAIT_SECONDS) throw fail(`GitHub asked to wait ${seconds} s, too long for a CI step`);
        if (Date.now() + ms >= o.budget.endsAt)
          throw fail(`GitHub asked to wait ${seconds} s, more than the comment step has left`);
        limitRetries++;
        o.log(`GitHub ${why.note} on ${what}; waiting ${seconds} s as GitHub asked, then attempt ${attempts + 1}`);
        await pause(ms, o.budget.signal, what, attempts, `waiting ${seconds} s as GitHub asked`);
        continue;
      }
      const transient = why.kind === 'server-error' || why.kind === 'timeout' || why.kind === 'no-response';
      if (!transient || why.permanent || !REPEATABLE.has(parsed.method) || attempts >= MAX_ATTEMPTS) throw fail();
      const delay = attempts * attempts;
      o.log(`${describeBriefly(why)} on ${what}; retrying in ${delay} s (attempt ${attempts + 1} of ${MAX_ATTEMPTS})`);
      await pause(delay * o.retryBaseMs, o.budget.signal, what, attempts, 'waiting to retry');
    }
  });
  return octokit;
}

/** What fetch's "bad port" means, for a warning a user can act on. */
const BAD_PORT =
  'fetch refuses to connect to this port at all (a "bad port" in the Fetch standard; check GITHUB_API_URL), so nothing was sent';

interface Classified {
  /** A failure no retry can change (it happened before anything was sent). */
  permanent?: boolean;
  kind: FailureKind;
  status: number | null;
  detail: string;
  note: string;
  /** Rate limits: the wait GitHub asked for, in seconds. */
  waitSeconds: number;
}

interface ErrorLike {
  status?: unknown;
  message?: unknown;
  response?: { headers?: Record<string, string | undefined>; data?: unknown };
}

function classify(e: unknown, o: ClientOptions, timeout: AbortSignal): Classified {
  const base = { note: '', waitSeconds: 0 };
  if (o.budget.signal.aborted) return { ...base, kind: 'budget', status: null, detail: 'waiting for an answer' };
  if (timeout.aborted)
    return { ...base, kind: 'timeout', status: null, detail: `${seconds(o.requestTimeoutMs)} s per request` };
  const err = (typeof e === 'object' && e !== null ? e : {}) as ErrorLike;
  if (typeof err.status !== 'number') throw e; // not an HTTP failure: a bug, not GitHub's doing
  const response = err.response;
  const detail = clip(messageOf(response?.data) ?? (typeof err.message === 'string' ? err.message : 'no message'));
  // A RequestError without a response: the request never got an answer (the library files it as 500).
  if (!response) {
    // fetch itself refuses the ports the Fetch standard lists as "bad ports": no retry can help.
    if (detail === 'bad port') return { ...base, kind: 'no-response', status: null, detail: BAD_PORT, permanent: true };
    return { ...base, kind: 'no-response', status: null, detail };
  }
  const status = err.status;
  const headers = response.headers ?? {};
  if (status === 429) {
    return { kind: 'rate-limit', status, detail, note: 'rate limit (429)', waitSeconds: waitFrom(headers, 60) };
  }
  if (status === 403 && /\bsecondary rate limit/i.test(detail)) {
    return {
      kind: 'rate-limit',
      status,
      detail,
      note: 'secondary rate limit',
      waitSeconds: waitFrom(headers, SECONDARY_FALLBACK_SECONDS),
    };
  }
  if (status === 403 && headers['x-ratelimit-remaining'] === '0') {
    return { kind: 'rate-limit', status, detail, note: 'primary rate limit', waitSeconds: waitFrom(headers, 60) };
  }
  if (status === 403) return { ...base, kind: 'permission', status, detail };
  if (status === 401) return { ...base, kind: 'auth', status, detail };
  if (status >= 500) return { ...base, kind: 'server-error', status, detail };
  return { ...base, kind: 'refused', status, detail };
}

/** Seconds to wait: Retry-After (seconds or an HTTP date), else the limit's reset time, else `fallback`. */
function waitFrom(headers: Record<string, string | undefined>, fallback: number): number {
  const after = headers['retry-after']?.trim();
  if (after) {
    if (/^\d+$/.test(after)) return Number(after);
    const at = Date.parse(after);
    if (!Number.isNaN(at)) return Math.max(0, Math.ceil((at - Date.now()) / 1000));
  }
  const reset = Number(headers['x-ratelimit-reset']);
  // One second past the reset, so the retry lands after it.
  if (Number.isFinite(reset) && reset > 0) return Math.max(0, Math.ceil(reset - Date.now() / 1000) + 1);
  return fallback;
}

function messageOf(data: unknown): string | null {
  if (typeof data === 'object' && data !== null && typeof (data as { message?: unknown }).message === 'string')
    return (data as { message: string }).message;
  return typeof data === 'string' && data.trim() !== '' ? data : null;
}

/** GitHub's texts end up in warnings; a long HTML error page must not. */
function clip(s: string, max = 200): string {
  const one = s.replace(/\s+/g, ' ').trim();
  return one.length > max ? `${one.slice(0, max - 1)}…` : one;
}

function seconds(ms: number): string {
  return String(Math.round(ms / 100) / 10);
}

function describeBriefly(c: Classified): string {
  if (c.kind === 'server-error') return `GitHub answered ${c.status}`;
  if (c.kind === 'timeout') return `No answer within ${c.detail}`;
  return `No response (${c.detail})`;
}

/** Sleeps `ms`; the budget's end cuts it short with a budget failure. */
function pause(ms: number, signal: AbortSignal, what: string, attempts: number, doing: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const stop = (): void => {
      clearTimeout(timer);
      reject(new ApiFailure('budget', what, null, doing, attempts));
    };
    const timer = setTimeout(() => {
      signal.removeEventListener('abort', stop);
      resolve();
    }, ms);
    if (signal.aborted) stop();
    else signal.addEventListener('abort', stop, { once: true });
  });
}

/** Reads a test-only number of milliseconds from the environment; anything unusable gives `fallback`. */
function msFromEnv(env: NodeJS.ProcessEnv, name: string, fallback: number, max: number): number {
  const raw = env[name];
  const v = raw === undefined || raw.trim() === '' ? NaN : Number(raw);
  return Number.isFinite(v) && v >= 0 && v <= max ? v : fallback;
}

/** Unit of the back-off delays (NEURON_BUDGET_RETRY_BASE_MS, tests only); default 1000. */
export function retryBaseFromEnv(env: NodeJS.ProcessEnv): number {
  return msFromEnv(env, 'NEURON_BUDGET_RETRY_BASE_MS', 1000, 60_000);
}

/** Per-request timeout (NEURON_BUDGET_REQUEST_TIMEOUT_MS, tests only); default 30 s. */
export function requestTimeoutFromEnv(env: NodeJS.ProcessEnv): number {
  return Math.max(1, msFromEnv(env, 'NEURON_BUDGET_REQUEST_TIMEOUT_MS', 30_000, 600_000));
}

/** The comment step's whole budget (NEURON_BUDGET_COMMENT_BUDGET_MS, tests only); default 2 minutes. */
export function commentBudgetFromEnv(env: NodeJS.ProcessEnv): number {
  return Math.max(1, msFromEnv(env, 'NEURON_BUDGET_COMMENT_BUDGET_MS', 120_000, 3_600_000));
}
