/**
 * Why a GitHub request failed, in the terms a warning must use: the real cause, not the
 * status a library happens to put on it (a refused connection is not "GitHub answered 500").
 */

export type FailureKind =
  /** 403 that is not a rate limit: the token may not do this. */
  | 'permission'
  /** 401: the token itself was refused. */
  | 'auth'
  /** 429, or 403 with a rate-limit sign, that did not clear within our limits. */
  | 'rate-limit'
  /** A request got no answer within its own timeout. */
  | 'timeout'
  /** No HTTP response at all (connection refused or reset, DNS, TLS). */
  | 'no-response'
  /** A 5xx answer. */
  | 'server-error'
  /** Any other 4xx answer (404 pull request gone, 422 refused body, ...). */
  | 'refused'
  /** The comment step's whole time budget ran out. */
  | 'budget';

export class ApiFailure extends Error {
  constructor(
    readonly kind: FailureKind,
    /** "GET /repos/o/r/issues/1/comments": what was being asked. */
    readonly what: string,
    /** The HTTP status when one came, else null. */
    readonly status: number | null,
    /** GitHub's own message, or the network error's. */
    readonly detail: string,
    /** Requests sent for this operation, the failed one included. */
    readonly attempts: number,
    /** Rate limits: which limit ("secondary rate limit"). */
    readonly limit: string = '',
    /** Rate limits: why we stopped waiting for it. */
    readonly gaveUp: string = '',
  ) {
    super(`${what}: ${brief(kind, status, detail)}`);
    this.name = 'ApiFailure';
  }
}

function brief(kind: FailureKind, status: number | null, detail: string): string {
  if (kind === 'timeout') return `no answer within ${detail}`;
  if (kind === 'no-response') return `no response (${detail})`;
  if (kind === 'budget') return `out of time while ${detail}`;
  return `GitHub answered ${status} (${detail})`;
}

export function isApiFailure(e: unknown): e is ApiFailure {
  return e instanceof ApiFailure;
}

/**
 * A failure after which a create may still have happened on the server: the request got
 * there but its answer was lost or was an error. A rate limit or a refusal means it did not.
 */
export function createMayHaveHappened(e: unknown): boolean {
  return isApiFailure(e) && (e.kind === 'server-error' || e.kind === 'timeout' || e.kind === 'no-response');
}

const plural = (n: number, one: string, many = `${one}s`): string => `${n} ${n === 1 ? one : many}`;

/**
 * One sentence per cause. `permissionAdvice` explains a 403 (fork pull request or missing
 * `pull-requests: write`); the shell knows which.
 */
export function describeFailure(f: ApiFailure, permissionAdvice: string, budgetSeconds: number): string {
  const tries = plural(f.attempts, 'attempt');
  switch (f.kind) {
    case 'permission':
      return `GitHub refused ${f.what} with 403 (${f.detail}). ${permissionAdvice}`;
    case 'auth':
      return `GitHub did not accept the token for ${f.what} (401: ${f.detail}). Check the github-token input.`;
    case 'rate-limit':
      return `GitHub's ${f.limit || 'rate limit'} on ${f.what} did not clear: ${f.gaveUp || tries} (${f.status}: ${f.detail}).`;
    case 'timeout':
      return `GitHub did not answer ${f.what} within ${f.detail} (${tries}).`;
    case 'no-response':
      return `No response came from GitHub for ${f.what}: ${f.detail} (${tries}).`;
    case 'server-error':
      return `GitHub answered ${f.what} with the server error ${f.status} (${f.detail}; ${tries}).`;
    case 'refused':
      return `GitHub answered ${f.what} with ${f.status} (${f.detail}).`;
    case 'budget':
      return `The comment step used up its ${budgetSeconds} s budget while ${f.detail}${f.what ? ` (${f.what})` : ''}.`;
  }
}
