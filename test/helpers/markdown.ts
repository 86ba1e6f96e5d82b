/**
 * What a CommonMark renderer makes of our Markdown: markdown-it (a general-purpose renderer with
 * GFM tables, strikethrough and linkify) with raw HTML allowed, as GitHub allows some. "Inert"
 * in the tests means inert as this renderer reads it, not as the escaper intends.
 */
import MarkdownIt from 'markdown-it';
import { expect } from 'vitest';

export const renderer = new MarkdownIt({ html: true, linkify: true });

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', '#39': "'" };

/** Text content of rendered HTML: tags dropped, the renderer's entities decoded. */
export function textOf(html: string): string {
  return html
    .replace(/<[^>]*>/g, '')
    .replace(/&(amp|lt|gt|quot|#39);/g, (_, e: string) => ENTITIES[e])
    .replace(/&#(\d+);/g, (_, n: string) => String.fromCodePoint(Number(n)));
}

/** Rendered text outside code spans and blocks (where GitHub links nothing). */
export function proseOf(html: string): string {
  return textOf(html.replace(/<pre>[\s\S]*?<\/pre>|<code>[\s\S]*?<\/code>/g, ' '));
}

/** GitHub links these in rendered prose (GitHub behaviour as we know it, not checked here). */
export function expectNoAutolinks(prose: string): void {
  expect(prose.match(/.{0,40}(https?:\/\/|www\.).{0,40}/i)?.[0] ?? null).toBeNull();
  expect(prose).not.toMatch(/@[A-Za-z0-9]/);
  expect(prose).not.toMatch(/#[0-9]/);
  expect(prose).not.toMatch(/:[a-z_]+:/);
}

/** Tags Markdown itself produces, plus the renderer's own details/summary. */
const ALLOWED_TAGS = new Set([
  'h3',
  'h4',
  'p',
  'table',
  'thead',
  'tbody',
  'tr',
  'th',
  'td',
  'ul',
  'li',
  'code',
  'pre',
  'strong',
  'em',
  'hr',
  'details',
  'summary',
]);

/** Renders `md` and checks that nothing from the data became a tag, a link or an autolink. */
export function expectInertMarkdown(md: string, what: string): string {
  const html = renderer.render(md.replace(/```mermaid\n[\s\S]*?\n```/g, ''));
  for (const tag of html.match(/<\/?[A-Za-z][^>]*>/g) ?? []) {
    const name = /^<\/?([A-Za-z0-9]+)/.exec(tag)![1].toLowerCase();
    expect(ALLOWED_TAGS.has(name), `${what}: tag ${tag}`).toBe(true);
    if (name === 'details' || name === 'summary') expect(tag, what).toMatch(/^<\/?(details|summary)>$/);
  }
  expectNoAutolinks(proseOf(html));
  return html;
}
