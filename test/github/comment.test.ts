import { describe, expect, it } from 'vitest';
import { COMMENT_LIMIT, commentBody, commentMarker, isOurComment } from '../../src/github/comment.js';

const bot = { login: 'github-actions[bot]', type: 'Bot' };

describe('commentMarker', () => {
  it('is one HTML comment line per config, never containing "--" inside or a ">"', () => {
    const m = commentMarker('models/pump--a/neuron budget>.yml');
    expect(m.startsWith('<!-- ') && m.endsWith(' -->')).toBe(true);
    const inner = m.slice(4, -3);
    expect(inner).not.toContain('--');
    expect(inner).not.toContain('>');
    expect(m).not.toContain('\n');
    expect(commentMarker('a.yml')).not.toBe(commentMarker('b.yml'));
  });
});

describe('isOurComment', () => {
  const marker = commentMarker('neuron-budget.yml');
  it('needs the marker as the first line and the Actions bot as author', () => {
    expect(isOurComment({ id: 1, body: `${marker}\nreport`, user: bot }, marker)).toBe(true);
    expect(
      isOurComment({ id: 1, body: `${marker}\r\nreport`, user: { login: 'GitHub-Actions[bot]', type: 'Bot' } }, marker),
    ).toBe(true);
  });
  it("never takes a person's comment, a quote, another bot's, a deleted author's or another config's", () => {
    expect(
      isOurComment({ id: 1, body: `${marker}\nreport`, user: { login: 'pump-engineer', type: 'User' } }, marker),
    ).toBe(false);
    // A person cannot hold a bot's login, but a spoofed type on the record must not be enough either way.
    expect(
      isOurComment({ id: 1, body: `${marker}\nreport`, user: { login: 'github-actions[bot]', type: 'User' } }, marker),
    ).toBe(false);
    expect(isOurComment({ id: 1, body: `> ${marker}\n> quoted`, user: bot }, marker)).toBe(false);
    expect(
      isOurComment({ id: 1, body: `${marker}\nx`, user: { login: 'release-helper[bot]', type: 'Bot' } }, marker),
    ).toBe(false);
    expect(isOurComment({ id: 1, body: `${marker}\nx`, user: null }, marker)).toBe(false);
    expect(isOurComment({ id: 1, body: null, user: bot }, marker)).toBe(false);
    expect(isOurComment({ id: 1, body: `${commentMarker('other.yml')}\nx`, user: bot }, marker)).toBe(false);
  });
});

describe('isOurComment under a personal token', () => {
  const marker = commentMarker('neuron-budget.yml');
  const me = { login: 'pump-ci', type: 'User', how: 'test' };
  it("takes the token account's own marked comment, whatever the login's case", () => {
    expect(
      isOurComment({ id: 1, body: `${marker}\nreport`, user: { login: 'Pump-CI', type: 'User' } }, marker, me),
    ).toBe(true);
  });
  it("never takes another person's, the bot's, or the account's own quote of the marker", () => {
    expect(isOurComment({ id: 1, body: `${marker}\nx`, user: { login: 'reviewer', type: 'User' } }, marker, me)).toBe(
      false,
    );
    expect(isOurComment({ id: 1, body: `${marker}\nx`, user: bot }, marker, me)).toBe(false);
    // Same login, but filed as a bot: not the person the token belongs to.
    expect(isOurComment({ id: 1, body: `${marker}\nx`, user: { login: 'pump-ci', type: 'Bot' } }, marker, me)).toBe(
      false,
    );
    expect(
      isOurComment({ id: 1, body: `> ${marker}\n> quoted`, user: { login: 'pump-ci', type: 'User' } }, marker, me),
    ).toBe(false);
  });
});

describe('commentBody', () => {
  const marker = commentMarker('neuron-budget.yml');
  it('puts the marker first and keeps a short report whole', () => {
    expect(commentBody(marker, '**pass**\n', null)).toBe(`${marker}\n**pass**\n`);
  });
  // 65,536: the limit GitHub's REST API states when it rejects a longer body
  // ("Body is too long (maximum is 65536 characters)", 422).
  it('cuts a long report at a line to fit 65,536 characters, closes an open fence and points at the summary', () => {
    const lines = ['```mermaid', ...Array.from({ length: 20_000 }, (_, i) => `  point ${i}`)];
    const body = commentBody(marker, lines.join('\n'), 'https://github.com/o/r/actions/runs/1');
    expect(COMMENT_LIMIT).toBe(65_536);
    expect(body.length).toBeLessThanOrEqual(65_536);
    expect(body.length).toBeGreaterThan(60_000);
    expect(body.startsWith(`${marker}\n`)).toBe(true);
    expect((body.match(/^```/gm) ?? []).length % 2).toBe(0);
    expect(body).toContain('[job summary of this run](https://github.com/o/r/actions/runs/1)');
    // Cut between lines, not inside one.
    const kept = body.split('\n').filter((l) => l.startsWith('  point '));
    expect(kept.every((l) => /^ {2}point \d+$/.test(l))).toBe(true);
  });
  it('honours a smaller limit exactly', () => {
    const body = commentBody(marker, 'x'.repeat(500) + '\n' + 'y'.repeat(500), null, 400);
    expect(body.length).toBeLessThanOrEqual(400);
  });
});
