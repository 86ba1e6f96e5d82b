/**
 * The one sticky pull-request comment: found by a hidden marker on its first line and by its
 * author (the Actions bot), then updated, or created when there is none.
 */
import type { getOctokit } from '@actions/github';

export type Octokit = ReturnType<typeof getOctokit>;

/** GitHub rejects longer comment bodies with 422. @testOnly */
export const COMMENT_LIMIT = 65_536;

/** The login the default `github.token` posts as. */
const ACTIONS_BOT_LOGIN = 'github-actions[bot]';

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
 * the Actions bot account (a bot type cannot be taken by a person; the login is compared
 * without regard to case). A deleted author (`user: null`) is never ours.
 * @testOnly
 */
export function isOurComment(c: CommentRecord, marker: string, botLogin: string = ACTIONS_BOT_LOGIN): boolean {
  const user = c.user;
  if (!user || typeof user.login !== 'string') return false;
  if ((user.type ?? '').toLowerCase() !== 'bot') return false;
  if (user.login.toLowerCase() !== botLogin.toLowerCase()) return false;
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

export async function upsertComment(
  octokit: Octokit,
  where: { owner: string; repo: string; issueNumber: number },
  marker: string,
  body: string,
): Promise<UpsertResult> {
  const { owner, repo, issueNumber } = where;
  const comments = await octokit.paginate(octokit.rest.issues.listComments, {
    owner,
    repo,
    issue_number: issueNumber,
    per_page: 100,
  });
  // The oldest of ours, so a stray duplicate (two runs racing without a concurrency group) never wins.
  const ours = comments.find((c) => isOurComment(c, marker));
  if (ours) {
    const res = await octokit.rest.issues.updateComment({ owner, repo, comment_id: ours.id, body });
    return { action: 'updated', id: res.data.id, url: res.data.html_url ?? null };
  }
  const res = await octokit.rest.issues.createComment({ owner, repo, issue_number: issueNumber, body });
  return { action: 'created', id: res.data.id, url: res.data.html_url ?? null };
}
