/**
 * A stand-in for the four GitHub REST operations the action calls (who the token is; list,
 * create and update issue comments), on 127.0.0.1, with the failures a real network shows:
 * canned error answers, a create that happens but answers an error, and an API that accepts
 * connections and never answers. Every request body and every response body it sends is
 * validated against the schemas extracted from GitHub's official REST API description
 * (test/fixtures/github/rest-schemas.json, written by scripts/extract-rest-schemas.mjs), so a
 * request the real API would reject, or a stand-in that drifts from the real shapes, shows up
 * as a schema failure.
 */
import { Ajv, type ValidateFunction } from 'ajv';
import { readFileSync } from 'node:fs';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';

interface OperationSpec {
  method: string;
  path: string;
  parameters: { name: string; in: string; required: boolean; schema: unknown }[];
  requestBody: unknown;
  responses: Record<string, unknown>;
}
interface Fixture {
  source: { package: string; version: string };
  operations: Record<string, OperationSpec>;
  components: { schemas: Record<string, unknown> };
  examples: Record<string, Record<string, unknown>>;
}

export const fixture: Fixture = JSON.parse(
  readFileSync(new URL('../fixtures/github/rest-schemas.json', import.meta.url), 'utf8'),
);

/** Points the fixture's `#/components/...` references at the registered components document. */
function rebase(node: unknown): unknown {
  if (Array.isArray(node)) return node.map(rebase);
  if (!node || typeof node !== 'object') return node;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(node)) {
    out[k] = k === '$ref' && typeof v === 'string' && v.startsWith('#/components/') ? `rest${v}` : rebase(v);
  }
  return out;
}

function makeAjv(): Ajv {
  // OpenAPI 3.0 schemas carry keywords (nullable, example, x-*) outside JSON Schema, hence strict: false.
  const ajv = new Ajv({ strict: false, allErrors: true });
  // Format checks written here rather than adding a dependency; deliberately plain.
  ajv.addFormat('date-time', (s: string) => /^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d(\.\d+)?(Z|[+-]\d\d:\d\d)$/.test(s));
  ajv.addFormat('uri', (s: string) => URL.canParse(s));
  ajv.addFormat('email', (s: string) => /^[^@\s]+@[^@\s]+$/.test(s));
  // OpenAPI's int64: a whole number (JSON numbers beyond 2^53 would not survive parsing anyway).
  ajv.addFormat('int64', { type: 'number', validate: (n: number) => Number.isInteger(n) });
  ajv.addSchema({ $id: 'rest', components: rebase(fixture.components) as object });
  return ajv;
}

const ajv = makeAjv();
const compiled = new Map<string, ValidateFunction>();
function validator(op: string, part: string): ValidateFunction {
  const key = `${op} ${part}`;
  let v = compiled.get(key);
  if (!v) {
    const spec = fixture.operations[op];
    const schema = part === 'request' ? spec.requestBody : spec.responses[part];
    if (!schema) throw new Error(`no schema for ${key} in the fixture`);
    v = ajv.compile(rebase(schema) as object);
    compiled.set(key, v);
  }
  return v;
}

export interface Comment extends Record<string, unknown> {
  id: number;
  body: string;
  user: Record<string, unknown>;
}

export interface LoggedRequest {
  method: string;
  path: string;
  query: Record<string, string>;
  body: unknown;
  authorization: string | undefined;
  /** 0 while unanswered; stays 0 when the stand-in never answers. */
  status: number;
  /** When the request arrived (Date.now()), to measure the waits between attempts. */
  at: number;
}

/**
 * A canned failure on the comment operations, `times` times: answered instead of the real
 * operation, or (`performed`) after carrying the operation out, as when a server does the
 * work and a proxy in front of it then answers with an error.
 */
export interface Fault {
  method: string;
  status: number;
  times: number;
  message: string;
  headers?: Record<string, string>;
  performed?: boolean;
}

export interface StandInOptions {
  owner: string;
  repo: string;
  /** Largest page the stand-in serves whatever per_page asks, to force several pages. */
  pageCap?: number;
  /**
   * The account behind the token, as GET /user reports it (a personal access token); its
   * comments are authored by it. Unset: the job's token, which GET /user refuses with 403.
   */
  tokenUser?: { login: string; id: number };
}

const BOT_USER = {
  login: 'github-actions[bot]',
  id: 41898282, // from memory: the id of github-actions[bot]; only the login and type matter here
  node_id: 'MDM6Qm90NDE4OTgyODI=',
  avatar_url: 'https://avatars.githubusercontent.com/in/15368?v=4',
  gravatar_id: '',
  url: 'https://api.github.com/users/github-actions%5Bbot%5D',
  html_url: 'https://github.com/apps/github-actions',
  followers_url: 'https://api.github.com/users/github-actions%5Bbot%5D/followers',
  following_url: 'https://api.github.com/users/github-actions%5Bbot%5D/following{/other_user}',
  gists_url: 'https://api.github.com/users/github-actions%5Bbot%5D/gists{/gist_id}',
  starred_url: 'https://api.github.com/users/github-actions%5Bbot%5D/starred{/owner}{/repo}',
  subscriptions_url: 'https://api.github.com/users/github-actions%5Bbot%5D/subscriptions',
  organizations_url: 'https://api.github.com/users/github-actions%5Bbot%5D/orgs',
  repos_url: 'https://api.github.com/users/github-actions%5Bbot%5D/repos',
  events_url: 'https://api.github.com/users/github-actions%5Bbot%5D/events{/privacy}',
  received_events_url: 'https://api.github.com/users/github-actions%5Bbot%5D/received_events',
  type: 'Bot',
  site_admin: false,
};

export class StandIn {
  /** Accept every connection and never answer (the requests are still logged). */
  hang = false;
  readonly requests: LoggedRequest[] = [];
  readonly schemaFailures: string[] = [];
  readonly comments = new Map<number, Comment[]>();
  readonly faults: Fault[] = [];
  private nextId = 9_100;
  private server: Server | null = null;
  /** A performed fault in progress: send() answers it instead of the real result. */
  private override: Fault | null = null;
  url = '';

  constructor(private readonly opts: StandInOptions) {}

  /** Seeds a comment as if someone had posted it earlier; `user` overrides the example's author. */
  seed(issue: number, body: string, user: Record<string, unknown> | 'bot'): Comment {
    const c = this.record(
      issue,
      body,
      user === 'bot' ? BOT_USER : { ...(fixture.examples['issue-comment']['user'] as object), ...user },
    );
    return c;
  }

  all(issue: number): Comment[] {
    return this.comments.get(issue) ?? [];
  }

  async start(): Promise<void> {
    this.server = createServer((req, res) => {
      let raw = '';
      req.setEncoding('utf8');
      req.on('data', (d: string) => (raw += d));
      req.on('end', () => this.handle(req, res, raw));
    });
    await new Promise<void>((ok) => this.server!.listen(0, '127.0.0.1', ok));
    const { port } = this.server.address() as AddressInfo;
    this.url = `http://127.0.0.1:${port}`;
  }

  async stop(): Promise<void> {
    if (!this.server) return;
    const closed = new Promise<void>((ok) => this.server!.close(() => ok()));
    this.server.closeAllConnections(); // held requests of a hanging stand-in
    await closed;
  }

  /** Requests to the comment operations only (not GET /user), as "METHOD status". */
  commentTraffic(): string[] {
    return this.requests.filter((q) => q.path !== '/user').map((q) => `${q.method} ${q.status}`);
  }

  /** The author of comments the action creates: the token's user, or the Actions bot. */
  private author(): Record<string, unknown> {
    const u = this.opts.tokenUser;
    if (!u) return BOT_USER;
    return {
      ...(fixture.examples['issue-comment']['user'] as object),
      login: u.login,
      id: u.id,
      url: `https://api.github.com/users/${u.login}`,
      html_url: `https://github.com/${u.login}`,
      type: 'User',
    };
  }

  private record(issue: number, body: string, user: Record<string, unknown>): Comment {
    const id = this.nextId++;
    const example = fixture.examples['issue-comment'];
    const { owner, repo } = this.opts;
    const when = new Date(Date.UTC(2026, 10, 2, 8, 0, id % 60)).toISOString().replace('.000', '');
    const c: Comment = {
      ...example,
      id,
      node_id: `IC_standin${id}`,
      url: `https://api.github.com/repos/${owner}/${repo}/issues/comments/${id}`,
      html_url: `https://github.com/${owner}/${repo}/pull/${issue}#issuecomment-${id}`,
      issue_url: `https://api.github.com/repos/${owner}/${repo}/issues/${issue}`,
      body,
      user,
      created_at: when,
      updated_at: when,
      author_association: user['type'] === 'Bot' ? 'NONE' : 'MEMBER',
    };
    const list = this.comments.get(issue) ?? [];
    list.push(c);
    this.comments.set(issue, list);
    return c;
  }

  private check(op: string, part: string, value: unknown, what: string): void {
    const v = validator(op, part);
    if (!v(value)) this.schemaFailures.push(`${what}: ${ajv.errorsText(v.errors)}`);
  }

  private send(
    res: ServerResponse,
    log: LoggedRequest,
    status: number,
    body: unknown,
    headers: Record<string, string> = {},
  ): void {
    const f = this.override;
    if (f) {
      this.override = null;
      status = f.status;
      body = { message: f.message, documentation_url: 'https://docs.github.com/rest', status: String(f.status) };
      headers = f.headers ?? {};
    }
    log.status = status;
    res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', ...headers });
    res.end(body === undefined ? '' : JSON.stringify(body));
  }

  /** GET /user: the token's user, or the 403 GitHub gives the job's token (an integration). */
  private whoAmI(res: ServerResponse, log: LoggedRequest): void {
    const u = this.opts.tokenUser;
    if (!u) {
      const body = {
        message: 'Resource not accessible by integration',
        documentation_url: 'https://docs.github.com/rest/users/users#get-the-authenticated-user',
        status: '403',
      };
      this.check('users/get-authenticated', '403', body, 'GET /user 403 response');
      return this.send(res, log, 403, body);
    }
    const body = { ...fixture.examples['private-user'], login: u.login, id: u.id, type: 'User' };
    this.check('users/get-authenticated', '200', body, 'GET /user response');
    return this.send(res, log, 200, body);
  }

  private handle(req: IncomingMessage, res: ServerResponse, raw: string): void {
    const u = new URL(req.url ?? '/', this.url);
    const method = req.method ?? 'GET';
    let body: unknown = undefined;
    if (raw) {
      try {
        body = JSON.parse(raw);
      } catch {
        body = raw;
      }
    }
    const log: LoggedRequest = {
      method,
      path: u.pathname,
      query: Object.fromEntries(u.searchParams),
      body,
      authorization: req.headers.authorization,
      status: 0,
      at: Date.now(),
    };
    this.requests.push(log);
    if (this.hang) return; // the socket stays open and silent until stop()
    if (u.pathname === '/user' && method === 'GET') return this.whoAmI(res, log);
    const { owner, repo } = this.opts;
    const base = `/repos/${owner}/${repo}`;
    const list = new RegExp(`^${base.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}/issues/(\\d+)/comments$`).exec(u.pathname);
    const one = new RegExp(`^${base.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}/issues/comments/(\\d+)$`).exec(u.pathname);

    const fault = this.faults.find((f) => f.method === method && f.times > 0);
    if (fault?.performed && (list || one)) {
      fault.times--;
      this.override = fault;
    } else if (fault && (list || one)) {
      fault.times--;
      const errBody = {
        message: fault.message,
        documentation_url: 'https://docs.github.com/rest',
        status: String(fault.status),
      };
      if (fault.status === 403 || fault.status === 404) {
        const op =
          method === 'POST'
            ? 'issues/create-comment'
            : method === 'GET'
              ? 'issues/list-comments'
              : 'issues/update-comment';
        if (fixture.operations[op].responses[String(fault.status)])
          this.check(op, String(fault.status), errBody, `${method} ${fault.status} response`);
      }
      return this.send(res, log, fault.status, errBody, fault.headers);
    }

    if (list && method === 'GET') {
      const issue = Number(list[1]);
      const perPage = Math.min(Number(u.searchParams.get('per_page') ?? 30), 100, this.opts.pageCap ?? 100);
      const page = Math.max(1, Number(u.searchParams.get('page') ?? 1));
      const all = this.all(issue);
      const items = all.slice((page - 1) * perPage, page * perPage);
      const last = Math.max(1, Math.ceil(all.length / perPage));
      const link = (p: number, rel: string): string => {
        const q = new URLSearchParams(u.searchParams);
        q.set('page', String(p));
        return `<${this.url}${u.pathname}?${q.toString()}>; rel="${rel}"`;
      };
      const links: string[] = [];
      if (page < last) links.push(link(page + 1, 'next'), link(last, 'last'));
      if (page > 1) links.push(link(1, 'first'), link(page - 1, 'prev'));
      this.check('issues/list-comments', '200', items, 'GET comments response');
      return this.send(res, log, 200, items, links.length ? { link: links.join(', ') } : {});
    }
    if (list && method === 'POST') {
      this.check('issues/create-comment', 'request', body, 'POST comment request body');
      if (typeof (body as { body?: unknown })?.body !== 'string') {
        return this.send(res, log, 422, {
          message: 'Validation Failed',
          documentation_url: 'https://docs.github.com/rest',
        });
      }
      if ((body as { body: string }).body.length > 65_536) {
        return this.send(res, log, 422, {
          message: 'Body is too long (maximum is 65536 characters)',
          documentation_url: 'https://docs.github.com/rest',
        });
      }
      const c = this.record(Number(list[1]), (body as { body: string }).body, this.author());
      this.check('issues/create-comment', '201', c, 'POST comment response');
      return this.send(res, log, 201, c, { location: c['url'] as string });
    }
    if (one && method === 'PATCH') {
      this.check('issues/update-comment', 'request', body, 'PATCH comment request body');
      const id = Number(one[1]);
      const c = [...this.comments.values()].flat().find((x) => x.id === id);
      if (!c)
        return this.send(res, log, 404, { message: 'Not Found', documentation_url: 'https://docs.github.com/rest' });
      if ((body as { body: string }).body.length > 65_536) {
        return this.send(res, log, 422, {
          message: 'Body is too long (maximum is 65536 characters)',
          documentation_url: 'https://docs.github.com/rest',
        });
      }
      c.body = (body as { body: string }).body;
      c['updated_at'] = new Date(Date.UTC(2026, 10, 3, 9, 0, 0)).toISOString().replace('.000', '');
      this.check('issues/update-comment', '200', c, 'PATCH comment response');
      return this.send(res, log, 200, c);
    }
    return this.send(res, log, 404, { message: 'Not Found', documentation_url: 'https://docs.github.com/rest' });
  }
}
