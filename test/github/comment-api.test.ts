/**
 * The comment logic from source against the stand-in REST server (schemas from GitHub's REST
 * API description), without the bundle: duplicates, paging, the limit, the request policy
 * (which failures are retried, how long it waits, what a create may do) and the token's
 * identity, in-process.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiFailure } from '../../src/github/api-failure.js';
import { commentBody, commentMarker, upsertComment } from '../../src/github/comment.js';
import { ACTIONS_BOT, tokenIdentity } from '../../src/github/identity.js';
import { makeClient, type ClientOptions } from '../../src/github/octokit.js';
import { StandIn } from './stand-in.js';

const where = { owner: 'pump-works', repo: 'vibration-models', issueNumber: 7 };
const marker = commentMarker('neuron-budget.yml');

describe('upsertComment against the stand-in API', () => {
  let api: StandIn;
  const warned: string[] = [];
  beforeEach(async () => {
    api = new StandIn({ owner: where.owner, repo: where.repo, pageCap: 3 });
    await api.start();
    warned.length = 0;
  });
  afterEach(async () => {
    await api.stop();
    expect(api.schemaFailures).toEqual([]);
  });
  const client = (o: Partial<ClientOptions> = {}): ReturnType<typeof makeClient> =>
    makeClient({
      token: 't',
      baseUrl: api.url,
      retryBaseMs: 1,
      requestTimeoutMs: 10_000,
      budget: { signal: new AbortController().signal, endsAt: Infinity },
      log: (m) => warned.push(m),
      ...o,
    });
  const traffic = (): string[] => api.requests.map((q) => `${q.method} ${q.status}`);
  const failure = (p: Promise<unknown>): Promise<ApiFailure> =>
    p.then(
      () => {
        throw new Error('expected a failure');
      },
      (e: unknown) => {
        expect(e).toBeInstanceOf(ApiFailure);
        return e as ApiFailure;
      },
    );

  it('updates the oldest of two of our comments (left by a race) and leaves the newer one alone', async () => {
    for (let i = 0; i < 7; i++) api.seed(where.issueNumber, `note ${i}`, { login: 'pump-engineer', type: 'User' });
    const older = api.seed(where.issueNumber, `${marker}\nold`, 'bot');
    const newer = api.seed(where.issueNumber, `${marker}\nnewer`, 'bot');
    const res = await upsertComment(client(), where, marker, commentBody(marker, 'fresh', null));
    expect(res).toMatchObject({ action: 'updated', id: older.id });
    expect(api.all(where.issueNumber).find((c) => c.id === older.id)!.body).toBe(`${marker}\nfresh\n`);
    expect(api.all(where.issueNumber).find((c) => c.id === newer.id)!.body).toBe(`${marker}\nnewer`);
    expect(api.requests.filter((q) => q.method === 'GET').map((q) => q.query['page'] ?? '1')).toEqual(['1', '2', '3']);
  });

  it('a body the API would refuse is never sent: a huge report is cut to the limit first', async () => {
    const huge = Array.from({ length: 9000 }, (_, i) => `| ${i} | ${'x'.repeat(10)} |`).join('\n');
    const res = await upsertComment(client(), where, marker, commentBody(marker, huge, null));
    expect(res.action).toBe('created');
    const posted = api.all(where.issueNumber)[0].body;
    expect(posted.length).toBeLessThanOrEqual(65_536);
    expect(api.requests.map((q) => q.status)).toEqual([200, 201]);
  });

  it('a 404 (pull request gone) surfaces as an error with its status for the shell to warn about', async () => {
    api.faults.push({ method: 'GET', status: 404, times: 1, message: 'Not Found' });
    await expect(upsertComment(client(), where, marker, 'x')).rejects.toMatchObject({ status: 404, kind: 'refused' });
    expect(api.requests).toHaveLength(1);
  });

  it('a create that happened but answered 502 is not sent again: listing again finds it', async () => {
    api.faults.push({ method: 'POST', status: 502, times: 99, message: 'Bad Gateway', performed: true });
    const body = commentBody(marker, 'fresh', null);
    const res = await upsertComment(client(), where, marker, body);
    expect(traffic()).toEqual(['GET 200', 'POST 502', 'GET 200']);
    expect(api.all(where.issueNumber)).toHaveLength(1);
    expect(res).toMatchObject({ action: 'created', id: api.all(where.issueNumber)[0].id });
  });

  it('a create that answered 502 and did not happen is sent again, after listing again', async () => {
    api.faults.push({ method: 'POST', status: 502, times: 1, message: 'Bad Gateway' });
    await upsertComment(client(), where, marker, commentBody(marker, 'fresh', null));
    expect(traffic()).toEqual(['GET 200', 'POST 502', 'GET 200', 'POST 201']);
    expect(api.all(where.issueNumber)).toHaveLength(1);
  });

  it('a create that keeps failing is sent at most 3 times; a refused one (422) only once', async () => {
    api.faults.push({ method: 'POST', status: 500, times: 99, message: 'Server Error' });
    const f = await failure(upsertComment(client(), where, marker, 'x'));
    expect(f).toMatchObject({ kind: 'server-error', status: 500, attempts: 1 });
    expect(api.requests.filter((q) => q.method === 'POST')).toHaveLength(3);

    api.requests.length = 0;
    api.faults.length = 0;
    api.faults.push({ method: 'POST', status: 422, times: 99, message: 'Validation Failed' });
    expect(await failure(upsertComment(client(), where, marker, 'x'))).toMatchObject({ kind: 'refused', status: 422 });
    expect(traffic()).toEqual(['GET 200', 'POST 422']);
  });

  it('a listing (GET) is retried on 5xx, 4 attempts in all, with growing pauses', async () => {
    api.faults.push({ method: 'GET', status: 503, times: 99, message: 'Service Unavailable' });
    const f = await failure(upsertComment(client({ retryBaseMs: 20 }), where, marker, 'x'));
    expect(f).toMatchObject({ kind: 'server-error', status: 503, attempts: 4 });
    const at = api.requests.map((q) => q.at);
    expect(at).toHaveLength(4);
    // Pauses of 1, 4 and 9 units of 20 ms (lower bounds; a timer never fires early).
    [20, 80, 180].forEach((ms, i) => expect(at[i + 1] - at[i]).toBeGreaterThanOrEqual(ms - 2));
  });

  it('a 429 waits the seconds of Retry-After (in delay units); a plain 403 is a permission failure, not retried', async () => {
    api.faults.push({ method: 'GET', status: 429, times: 1, message: 'Too Many', headers: { 'retry-after': '3' } });
    await upsertComment(client({ retryBaseMs: 30 }), where, marker, commentBody(marker, 'x', null));
    const [a, b] = api.requests.map((q) => q.at);
    expect(b - a).toBeGreaterThanOrEqual(3 * 30 - 2);
    expect(warned.join('\n')).toContain('rate limit (429) on GET /repos/pump-works/vibration-models/issues/7/comments');

    api.requests.length = 0;
    api.faults.push({ method: 'PATCH', status: 403, times: 99, message: 'Resource not accessible by integration' });
    expect(await failure(upsertComment(client(), where, marker, 'y'))).toMatchObject({
      kind: 'permission',
      attempts: 1,
    });
    expect(traffic()).toEqual(['GET 200', 'PATCH 403']);
  });

  it('a rate limit asking for more time than the budget has left gives up at once', async () => {
    api.faults.push({
      method: 'GET',
      status: 403,
      times: 99,
      message: 'You have exceeded a secondary rate limit.',
      headers: { 'retry-after': '100' },
    });
    const budget = { signal: new AbortController().signal, endsAt: Date.now() + 5_000 };
    const f = await failure(upsertComment(client({ retryBaseMs: 1000, budget }), where, marker, 'x'));
    expect(f).toMatchObject({ kind: 'rate-limit', limit: 'secondary rate limit', attempts: 1 });
    expect(f.gaveUp).toBe('GitHub asked to wait 100 s, more than the comment step has left');
    expect(api.requests).toHaveLength(1);
  });

  it('an API that never answers: each attempt ends at its timeout; the budget ends everything', async () => {
    api.hang = true;
    const t0 = Date.now();
    const f = await failure(upsertComment(client({ requestTimeoutMs: 100 }), where, marker, 'x'));
    expect(f).toMatchObject({ kind: 'timeout', attempts: 4 });
    expect(Date.now() - t0).toBeGreaterThanOrEqual(4 * 100 - 5);

    api.requests.length = 0;
    const t1 = Date.now();
    const budget = { signal: AbortSignal.timeout(300), endsAt: Date.now() + 300 };
    const g = await failure(upsertComment(client({ requestTimeoutMs: 60_000, budget }), where, marker, 'x'));
    expect(g).toMatchObject({ kind: 'budget', attempts: 1 });
    expect(Date.now() - t1).toBeLessThan(5_000);
    expect(api.requests).toHaveLength(1);
  });
});

describe('tokenIdentity against the stand-in API', () => {
  const cases: [string, ConstructorParameters<typeof StandIn>[0], object][] = [
    ["the job's token (GET /user refused with 403)", { owner: 'o', repo: 'r' }, ACTIONS_BOT],
    [
      'a personal token (GET /user names the account)',
      { owner: 'o', repo: 'r', tokenUser: { login: 'pump-ci', id: 5150 } },
      { login: 'pump-ci', type: 'User' },
    ],
  ];
  it.each(cases)('%s', async (_name, opts, expected) => {
    const api = new StandIn(opts);
    await api.start();
    try {
      const octokit = makeClient({
        token: 't',
        baseUrl: api.url,
        retryBaseMs: 1,
        requestTimeoutMs: 10_000,
        budget: { signal: new AbortController().signal, endsAt: Infinity },
        log: () => undefined,
      });
      expect(await tokenIdentity(octokit)).toMatchObject(expected);
      expect(api.requests.map((q) => `${q.method} ${q.path}`)).toEqual(['GET /user']);
      expect(api.schemaFailures).toEqual([]);
    } finally {
      await api.stop();
    }
  });
});
