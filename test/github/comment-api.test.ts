/**
 * The comment logic from source against the stand-in REST server (schemas from GitHub's REST
 * API description), without the bundle: duplicates, paging and the limit, in-process.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { commentBody, commentMarker, upsertComment } from '../../src/github/comment.js';
import { makeClient } from '../../src/github/octokit.js';
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
  const client = () => makeClient({ token: 't', baseUrl: api.url, retryBaseMs: 1, warn: (m) => warned.push(m) });

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
    await expect(upsertComment(client(), where, marker, 'x')).rejects.toMatchObject({ status: 404 });
    expect(api.requests).toHaveLength(1);
  });
});
