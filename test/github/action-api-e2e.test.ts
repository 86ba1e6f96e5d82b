/**
 * End to end: the committed dist/index.js, run as a runner runs it, against a GitHub API that
 * misbehaves the way real networks do: it accepts connections and never answers, it creates
 * a comment and then answers 502, it asks for a pause with 429 and Retry-After, its
 * secondary rate limit never clears, nothing listens at all, or the token is a personal one.
 * Each case must leave the verdict, the job summary and the outputs alone, and end with the
 * verdict's exit code and a warning that names the real cause.
 */
import { createServer } from 'node:net';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  OWNER,
  PR_NUMBER,
  REPO,
  pullRequestEvent,
  runAction,
  runtimes,
  type RunOptions,
  type RunResult,
  type Runtime,
} from './harness.js';
import { StandIn, type StandInOptions } from './stand-in.js';
import { failingWorkspace, passingWorkspace } from './workspaces.js';

const MARKER = '<!-- neuron-budget comment; config: neuron-budget.yml -->';
const UNAFFECTED = 'The verdict, job summary and outputs are unaffected.';
const COMMENTS_PATH = `/repos/${OWNER}/${REPO}/issues/${PR_NUMBER}/comments`;
const SECONDARY =
  'You have exceeded a secondary rate limit. Please wait a few minutes before you try again. If you reach out to GitHub Support for help, please include the request ID.';

function warnings(r: RunResult): string[] {
  return r.annotations.filter((a) => a.level === 'warning').map((a) => a.message);
}
function explain(r: RunResult): string {
  return `exit ${r.code} (signal ${r.signal}) after ${r.ms} ms\n--- stdout\n${r.stdout.slice(-4000)}\n--- stderr\n${r.stderr.slice(-4000)}`;
}
/** The one comment warning of a run (a second one would be a duplicate report). */
function commentWarning(r: RunResult): string {
  const w = warnings(r).filter((m) => m.startsWith('Could not post the pull-request comment'));
  expect(w, explain(r)).toHaveLength(1);
  expect(w[0]).toContain(UNAFFECTED);
  return w[0];
}
/** Summary and outputs written, whatever the API did. */
function expectResultsKept(r: RunResult, verdict: string): void {
  expect(r.signal, explain(r)).toBe(null);
  expect(r.outputs['verdict'], explain(r)).toBe(verdict);
  expect(r.outputs['report']).toMatch(/report\.json$/);
  expect(r.summary.length).toBeGreaterThan(0);
}

/** A port on 127.0.0.1 that nothing listens on. */
async function closedPort(): Promise<number> {
  const s = createServer();
  await new Promise<void>((ok) => s.listen(0, '127.0.0.1', ok));
  const { port } = s.address() as { port: number };
  await new Promise<void>((ok) => s.close(() => ok()));
  return port;
}

const { list, node24Problem } = runtimes();

describe.each(list)('action bundle under $label, against a misbehaving API', (runtime: Runtime) => {
  let api: StandIn;
  const start = async (opts: Partial<StandInOptions> = {}): Promise<void> => {
    await api?.stop();
    api = new StandIn({ owner: OWNER, repo: REPO, ...opts });
    await api.start();
  };
  beforeEach(async () => {
    if (!runtime.bin || (runtime.label.startsWith('node 24') && node24Problem))
      throw new Error(node24Problem ?? 'no binary');
    await start();
  });
  afterEach(async () => {
    await api?.stop();
    expect(api?.schemaFailures ?? []).toEqual([]);
  });
  const onPr = (workspace: string, extra: Partial<RunOptions> = {}): Promise<RunResult> =>
    runAction({ runtime, apiUrl: api.url, workspace, eventName: 'pull_request', event: pullRequestEvent(), ...extra });

  it('an API that accepts and never answers: every request times out, the step keeps its budget and its verdict', async () => {
    api.hang = true;
    // Each request is cut by its own timeout: 4 attempts of 0.5 s, then a warning that says so.
    const perRequest = await onPr(failingWorkspace(), {
      env: { NEURON_BUDGET_REQUEST_TIMEOUT_MS: '500', NEURON_BUDGET_COMMENT_BUDGET_MS: '60000' },
      timeoutMs: 45_000,
    });
    expectResultsKept(perRequest, 'fail');
    expect(perRequest.code, explain(perRequest)).toBe(1);
    expect(commentWarning(perRequest)).toContain(
      'GitHub did not answer GET /user within 0.5 s per request (4 attempts).',
    );
    expect(api.requests.map((q) => `${q.method} ${q.path} ${q.status}`)).toEqual(Array(4).fill('GET /user 0'));

    // Requests that could wait a minute each are cut by the step's budget of 2 s.
    api.requests.length = 0;
    const started = Date.now();
    const budget = await onPr(failingWorkspace(), {
      env: { NEURON_BUDGET_REQUEST_TIMEOUT_MS: '60000', NEURON_BUDGET_COMMENT_BUDGET_MS: '2000' },
      timeoutMs: 45_000,
    });
    const ended = started + budget.ms;
    expectResultsKept(budget, 'fail');
    expect(budget.code, explain(budget)).toBe(1);
    expect(commentWarning(budget)).toContain(
      'The comment step used up its 2 s budget while waiting for an answer (GET /user).',
    );
    expect(api.requests).toHaveLength(1);
    // From the first request to the process's end: the budget, plus the exit.
    expect(ended - api.requests[0].at).toBeLessThan(2000 + 3000);
  });

  it('a create that happens on the server but answers 502 leaves one comment; the next run updates it', async () => {
    api.faults.push({ method: 'POST', status: 502, times: 99, message: 'Server Error', performed: true });
    const first = await onPr(passingWorkspace());
    expect(first.code, explain(first)).toBe(0);
    expectResultsKept(first, 'new');
    expect(api.all(PR_NUMBER)).toHaveLength(1);
    expect(api.commentTraffic()).toEqual(['GET 200', 'POST 502', 'GET 200']);
    expect(first.stdout).toContain('so the comments are listed again before another try');
    expect(first.stdout).toMatch(/Pull-request comment created \(id \d+\)/);
    expect(warnings(first)).toEqual([]);

    api.requests.length = 0;
    const second = await onPr(passingWorkspace());
    expect(second.code, explain(second)).toBe(0);
    expect(api.commentTraffic()).toEqual(['GET 200', 'PATCH 200']);
    expect(api.all(PR_NUMBER)).toHaveLength(1);
  });

  it('a 429 with Retry-After: 2 is retried after the 2 s GitHub asked for', async () => {
    api.faults.push({
      method: 'GET',
      status: 429,
      times: 1,
      message: 'API rate limit exceeded',
      headers: { 'retry-after': '2' },
    });
    // Real seconds for this one: the delay unit is 1000 ms, as in production.
    const r = await onPr(passingWorkspace(), { env: { NEURON_BUDGET_RETRY_BASE_MS: '1000' } });
    expect(r.code, explain(r)).toBe(0);
    const gets = api.requests.filter((q) => q.method === 'GET' && q.path === COMMENTS_PATH);
    expect(gets.map((q) => q.status)).toEqual([429, 200]);
    // The clocks of the two requests' arrival, on the stand-in; a few ms of slack for the timer.
    expect(gets[1].at - gets[0].at).toBeGreaterThanOrEqual(1990);
    expect(r.stdout).toContain(`GitHub rate limit (429) on GET ${COMMENTS_PATH}; waiting 2 s as GitHub asked`);
    expect(api.all(PR_NUMBER)).toHaveLength(1);
    expect(warnings(r)).toEqual([]);
  });

  it('a secondary rate limit that never clears, a server that keeps failing: each warning names its cause', async () => {
    api.faults.push({
      method: 'POST',
      status: 403,
      times: 99,
      message: SECONDARY,
      headers: { 'retry-after': '1' },
    });
    const limited = await onPr(passingWorkspace());
    expect(limited.code, explain(limited)).toBe(0);
    expectResultsKept(limited, 'new');
    const w = commentWarning(limited);
    expect(w).toContain(
      `GitHub's secondary rate limit on POST ${COMMENTS_PATH} did not clear: still limited after 3 attempts (403: ${SECONDARY})`,
    );
    expect(w).not.toMatch(/write|permission/i);
    expect(api.requests.filter((q) => q.method === 'POST')).toHaveLength(3);
    expect(api.all(PR_NUMBER)).toHaveLength(0);

    api.faults.length = 0;
    api.faults.push({ method: 'GET', status: 502, times: 99, message: 'Server Error' });
    const failing = await onPr(passingWorkspace());
    expect(failing.code, explain(failing)).toBe(0);
    expect(commentWarning(failing)).toContain(
      `GitHub answered GET ${COMMENTS_PATH} with the server error 502 (Server Error; 4 attempts).`,
    );
  });

  it('nothing listens at all: the warning says no response came, not that GitHub answered', async () => {
    const port = await closedPort();
    const r = await onPr(passingWorkspace(), { apiUrl: `http://127.0.0.1:${port}` });
    expect(r.code, explain(r)).toBe(0);
    expectResultsKept(r, 'new');
    const w = commentWarning(r);
    expect(w).toContain(
      `No response came from GitHub for GET /user: connect ECONNREFUSED 127.0.0.1:${port} (4 attempts).`,
    );
    expect(w).not.toContain('answered');
  });

  it('a port fetch will not use ("bad port"): no response, said in words, and not retried', async () => {
    // 6000 is on the Fetch standard's list of bad ports; fetch refuses it before connecting.
    const r = await onPr(passingWorkspace(), { apiUrl: 'http://127.0.0.1:6000' });
    expect(r.code, explain(r)).toBe(0);
    expectResultsKept(r, 'new');
    const w = commentWarning(r);
    expect(w).toContain(
      'No response came from GitHub for GET /user: fetch refuses to connect to this port at all (a "bad port" in the Fetch standard; check GITHUB_API_URL), so nothing was sent (1 attempt).',
    );
    expect(w).not.toMatch(/answered|500/);
    expect(r.stdout).not.toContain('retrying');
  });

  it("a personal access token: the comment is recognised by the token's account; others' comments are untouched", async () => {
    await start({ tokenUser: { login: 'pump-ci', id: 5150 } });
    const token = { 'github-token': 'ghp_standin_personal_token' };
    // Marked comments that are not this run's: a quote by the token's own account, a person
    // who pasted the marker, and a comment the Actions bot left under the job's token.
    const seeded = [
      api.seed(PR_NUMBER, `> ${MARKER}\n> why is the width 3 here?`, { login: 'pump-ci', id: 5150, type: 'User' }),
      api.seed(PR_NUMBER, `${MARKER}\npasted on purpose`, { login: 'reviewer', type: 'User' }),
      api.seed(PR_NUMBER, `${MARKER}\nfrom the job token`, 'bot'),
    ];
    const untouched = JSON.stringify(seeded);

    const first = await onPr(passingWorkspace(), { inputs: token });
    expect(first.code, explain(first)).toBe(0);
    expect(api.requests.filter((q) => q.method === 'POST')).toHaveLength(1);
    const ours = api.all(PR_NUMBER)[3];
    expect(ours.user['login']).toBe('pump-ci');

    api.requests.length = 0;
    const second = await onPr(passingWorkspace(), { inputs: token });
    expect(second.code, explain(second)).toBe(0);
    expect(api.requests.filter((q) => q.method === 'POST')).toHaveLength(0);
    expect(api.requests.filter((q) => q.method === 'PATCH').map((q) => q.path)).toEqual([
      `/repos/${OWNER}/${REPO}/issues/comments/${ours.id}`,
    ]);
    expect(api.all(PR_NUMBER)).toHaveLength(4);
    expect(JSON.stringify(api.all(PR_NUMBER).slice(0, 3))).toBe(untouched);
    // The log says whom the action looked for, and how it knew.
    for (const r of [first, second]) {
      expect(r.stdout).toContain(
        "Looking for an earlier neuron-budget comment by pump-ci (the token's own account, from GET /user).",
      );
    }
    expect(api.requests[0]).toMatchObject({ method: 'GET', path: '/user', status: 200 });
  });
});
