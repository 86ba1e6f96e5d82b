/**
 * Who the token posts as, so the action recognises its own comment under any token: the
 * authenticated user where GitHub tells it (GET /user, personal access tokens), else the
 * Actions bot (the job's GITHUB_TOKEN cannot call GET /user and gets a 403).
 */
import { ApiFailure, isApiFailure } from './api-failure.js';
import type { Octokit } from './octokit.js';

export interface Identity {
  login: string;
  /** "Bot" or "User", as GitHub writes a comment's `user.type`. */
  type: string;
  /** How it was found, for the log. */
  how: string;
}

/** The login the default `github.token` posts as. */
export const ACTIONS_BOT: Identity = {
  login: 'github-actions[bot]',
  type: 'Bot',
  how: "the job's token, which cannot read GET /user",
};

/** GitHub logins: letters, digits and single hyphens, at most 39 characters; apps add "[bot]". */
const LOGIN = /^[A-Za-z0-9](?:[A-Za-z0-9]|-(?=[A-Za-z0-9])){0,38}(?:\[bot\])?$/;

export async function tokenIdentity(octokit: Octokit): Promise<Identity> {
  let data: { login?: unknown; type?: unknown };
  try {
    ({ data } = await octokit.rest.users.getAuthenticated());
  } catch (e) {
    // Only a plain refusal means "an integration token"; a timeout or a server error says nothing about who we are.
    if (isApiFailure(e) && e.kind === 'permission') return ACTIONS_BOT;
    throw e;
  }
  const login = typeof data.login === 'string' ? data.login : '';
  const type = typeof data.type === 'string' ? data.type : '';
  if (!LOGIN.test(login) || (type !== 'User' && type !== 'Bot')) {
    // The answer goes into log lines and comparisons; refuse anything that is not a GitHub login.
    throw new ApiFailure('refused', 'GET /user', 200, 'the answer does not name a GitHub account', 1);
  }
  return { login, type, how: "the token's own account, from GET /user" };
}
