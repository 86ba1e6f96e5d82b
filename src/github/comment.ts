/**
 * The one sticky pull-request comment: found by a hidden marker on its first line and by its
 * author (the token's own identity), then updated, or created when there is none.
 */
import { createMayHaveHappened } from './api-failure.js';
import { ACTIONS_BOT, type Identity } from './identity.js';
import type { Octokit } from './octokit.js';

/** GitHub rejects longer comment bodies with 422. @testOnly */
export const COMMENT_LIMIT = 65_536;

/** Creates sent at most: each one after the last failed in a way that may have created the comment. */
const MAX_CREATES = 3;

/**
 * One marker per config, so two steps checking two configs keep two comments. `--` cannot
 * appear inside an HTML comment, hence the rewrite.
 */
export function commentMarker(configKey: string): string {
  const key = configKey
    .replace(/[^A-Za-z0-9._/-]/g, (c) =>
      encodeURIComponent(c).replace(/[!'()*]/g, (x) => '%' + x.charCodeAt(0).toString(16).toUpperCase()),
    )
    .replace(/-(?=-)/g, '%2D');
  return `<!-- neuron-budget comment; config: ${key} -->`;
}

export interface CommentRecord {
  id: number;
  body?: string | null;
  user?: { login?: string | null; type?: string | null } | null;
}

/**
 * Ours when the marker is the body's first line (a quote starts with "> ") AND the author is
 * the token's identity: the same login (compared without regard to case) and the same account
 * type, so a person cannot pass for the bot nor the bot for a person. A deleted author
 * (`user: null`) is never ours.
 * @testOnly
 */
export function isOurComment(c: CommentRecord, marker: string, identity: Identity = ACTIONS_BOT): boolean {
  const user = c.user;
  if (!user || typeof user.login !== 'string') return false;
  if ((user.type ?? '').toLowerCase() !== identity.type.toLowerCase()) return false;
  if (user.login.toLowerCase() !== identity.login.toLowerCase()) return false;
  const firstLine = (c.body ?? '')
    .replace(/^\uFEFF/, '')
    .split(/\r?\n/, 1)[0]
    .trim();
  return firstLine === marker;
}

/**
 * Marker + markdown, cut at a line boundary when it would pass the limit, with a pointer to
 * the job summary, which holds everything (1 MiB).
 */
export function commentBody(marker: string, markdown: string, runUrl: string | null, limit = COMMENT_LIMIT): string {
  const full = `${marker}\n${markdown.trimEnd()}\n`;
  if (full.length <= limit) return full;
  const where = runUrl ? `the [job summary of this run](${runUrl})` : 'the job summary of this run';
  const note = `\n\n_This comment was cut to fit GitHub's limit of ${limit} characters; the full report is in ${where}._\n`;
  let cut = full.slice(0, limit - note.length);
  const nl = cut.lastIndexOf('\n');
  if (nl > marker.length) cut = cut.slice(0, nl);
  // Close an open fenced block (a chart) so the note renders as text.
  if ((cut.match(/^```/gm) ?? []).length % 2 === 1) cut += '\n```';
  const body = cut + note;
  return body.length <= limit ? body : body.slice(0, limit);
}

export interface UpsertResult {
  action: 'created' | 'updated';
  id: number;
  url: string | null;
}

export interface Where {
  owner: string;
  repo: string;
  issueNumber: number;
}

/**
 * Updates our comment, or creates it. A create is not idempotent: when one fails in a way
 * that may still have created the comment (a 5xx, a timeout, a lost connection), the
 * comments are listed again and ours, if it is there now, is the one kept.
 */
export async function upsertComment(
  octokit: Octokit,
  where: Where,
  marker: string,
  body: string,
  identity: Identity = ACTIONS_BOT,
  log: (line: string) => void = () => undefined,
): Promise<UpsertResult> {
  const { owner, repo, issueNumber } = where;
  for (let creates = 0; ;) {
    const ours = await findOurs(octokit, where, marker, identity);
    if (ours) {
      if (creates > 0 && ours.body === body) return { action: 'created', id: ours.id, url: ours.html_url ?? null };
      const res = await octokit.rest.issues.updateComment({ owner, repo, comment_id: ours.id, body });
      return { action: creates > 0 ? 'created' : 'updated', id: res.data.id, url: res.data.html_url ?? null };
    }
    try {
      creates++;
      const res = await octokit.rest.issues.createComment({ owner, repo, issue_number: issueNumber, body });
      return { action: 'created', id: res.data.id, url: res.data.html_url ?? null };
    } catch (e) {
      if (!createMayHaveHappened(e) || creates >= MAX_CREATES) throw e;
      log(
        `Creating the comment failed (${(e as Error).message}); it may have been created all the same, ` +
          'so the comments are listed again before another try.',
      );
    }
  }
}

/** The oldest of ours, so a stray duplicate (two runs racing without a concurrency group) never wins. */
async function findOurs(
  octokit: Octokit,
  { owner, repo, issueNumber }: Where,
  marker: string,
  identity: Identity,
): Promise<(CommentRecord & { html_url?: string }) | undefined> {
  const comments = await octokit.paginate(octokit.rest.issues.listComments, {
    owner,
    repo,
    issue_number: issueNumber,
    per_page: 100,
  });
  return comments.find((c) => isOurComment(c, marker, identity));
}
