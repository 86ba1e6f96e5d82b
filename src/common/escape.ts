/**
 * The one sanitiser for strings from the repository (column names, class labels, categories,
 * paths, YAML values, and sentences that quote them). A data file is written by whoever opens
 * the pull request, so its strings are hostile until shown otherwise.
 *
 * - `escapeText`: for logs, the terminal and messages. Control characters (C0, DEL, C1) and
 *   invisible or bidirectional formatting characters are shown escaped (`\n`, `\x1b`,
 *   `\u202e`), never raw, so a string can neither start a line nor move the cursor; and `::`
 *   is broken up, so even a line that starts with a repository string cannot be read by the
 *   Actions runner as a workflow command (`::error …::`).
 * - `quote`: a value inside a message: clipped, escaped, in double quotes.
 * - `escapeMarkdown`: for the pull-request comment and the job summary.
 * - `clip`: shortens a string to a bounded number of characters with an ellipsis.
 */

/** Most characters of one repository string shown on any screen. */
const MAX_SHOWN = 200;
/** Most characters of one value quoted inside a message. */
const MAX_QUOTED = 80;

const ELLIPSIS = '…';
/** Invisible and bidirectional formatting characters that could disguise text. */
const INVISIBLE = /[\u00ad\u061c\u180e\u200b-\u200f\u2028\u2029\u202a-\u202e\u2060-\u2064\u2066-\u2069\ufeff]/u;
const SHORT_ESCAPES: Record<number, string> = { 0x0a: '\\n', 0x0d: '\\r', 0x09: '\\t' };

/** At most `max` characters (code points), the last of them an ellipsis when cut. */
export function clip(s: string, max: number = MAX_SHOWN): string {
  if (s.length <= max) return s;
  // A code point takes one or two code units, so the first 2 × (max + 1) units hold more than
  // `max` code points whenever the whole string does.
  const chars = Array.from(s.slice(0, 2 * max + 2));
  return chars.length > max ? `${chars.slice(0, max - 1).join('')}${ELLIPSIS}` : s;
}

function hex(c: number, width: number): string {
  return c.toString(16).padStart(width, '0');
}

/** Is this code point one that `escapeText` shows escaped? (A lone surrogate is not text either.) */
function needsEscape(c: number, ch: string): boolean {
  return c < 0x20 || c === 0x7f || (c >= 0x80 && c < 0xa0) || (c >= 0xd800 && c <= 0xdfff) || INVISIBLE.test(ch);
}

/** Whether `escapeText` would show every character of `s` as it is (no control, invisible or bidi character). */
export function isPrintable(s: string): boolean {
  for (const ch of s) if (needsEscape(ch.codePointAt(0) ?? 0, ch)) return false;
  return true;
}

/** Text for logs, the terminal and messages: clipped, control and invisible characters escaped, `::` broken. */
export function escapeText(raw: string, max: number = MAX_SHOWN): string {
  const s = clip(raw, max);
  let out = '';
  for (const ch of s) {
    const c = ch.codePointAt(0) ?? 0;
    if (!needsEscape(c, ch)) out += ch;
    else if (SHORT_ESCAPES[c] !== undefined) out += SHORT_ESCAPES[c];
    else if (c < 0x100) out += `\\x${hex(c, 2)}`;
    else out += `\\u${hex(c, 4)}`;
  }
  // The runner reads a line that starts with "::" as a command; "::" never survives whole.
  return out.replace(/::/g, ':\\x3a');
}

/** A repository value inside a message: `"name"`, clipped and escaped. */
export function quote(raw: string, max: number = MAX_QUOTED): string {
  return `"${escapeText(raw, max).replace(/"/g, '\\"')}"`;
}

/** Whole lines of text (our own line breaks kept), each escaped as `escapeText` does. */
export function escapeLines(text: string): string {
  return text
    .split('\n')
    .map((line) => escapeText(line, Number.MAX_SAFE_INTEGER))
    .join('\n');
}

/**
 * ASCII punctuation that is Markdown syntax in the middle of a line (emphasis, code, links and
 * images, HTML, entities, table pipes, strikethrough, math); a backslash makes it literal.
 */
const MARKDOWN_PUNCTUATION = new Set('\\`*_[]<|~&$'.split(''));
/** Characters GitHub may turn into a mention, reference, URL or emoji when a word follows. */
const LINK_STARTS = new Set(['@', '#', ':', '\uff20', '\ufe6b']);
const ZWSP = '\u200b';
/** Between two of these, "_" cannot open or close emphasis (CommonMark's intraword rule), so it stays bare. */
const WORD = /^[\p{L}\p{N}]$/u;
const REPLACEMENT = '\ufffd';

/**
 * Markdown that reads as written: the ASCII punctuation that GitHub-flavoured Markdown could
 * read as syntax mid-line gets a backslash, which CommonMark defines as "this character, literally"; everything else stays
 * as it is, so the raw comment (in e-mail notifications and the raw view) stays readable.
 * GitHub also turns some plain text into links after rendering (@-mentions, #123 references,
 * URLs, :emoji:; GitHub behaviour as we know it, not checked against GitHub here), which no
 * escape prevents, so a zero-width space breaks exactly those patterns: after "@", "#" or ":"
 * when a word character or "/" follows, and before the dot of "www.". Line breaks become
 * spaces, so a string never leaves its line or table cell; control and invisible or
 * bidirectional characters become U+FFFD. Meant for the middle of a line, where these
 * strings always go.
 */
export function escapeMarkdown(raw: string, max: number = MAX_SHOWN): string {
  const s = clip(raw, max);
  let out = '';
  for (let i = 0; i < s.length; i++) {
    const ch = s[i];
    const c = s.charCodeAt(i);
    const next = s[i + 1] ?? '';
    if (c === 0x0a || c === 0x0d || c === 0x09) out += ' ';
    else if (c < 0x20 || c === 0x7f || (c >= 0x80 && c < 0xa0) || INVISIBLE.test(ch)) out += REPLACEMENT;
    else if (ch === '_' && WORD.test(s[i - 1] ?? '') && WORD.test(next)) out += ch;
    else if (MARKDOWN_PUNCTUATION.has(ch)) out += `\\${ch}`;
    else if (ch === '.' && /www$/i.test(s.slice(Math.max(0, i - 3), i))) out += `${ZWSP}.`;
    else if (LINK_STARTS.has(ch) && /^[\p{L}\p{N}_/]/u.test(next)) out += `${ch}${ZWSP}`;
    else out += ch;
  }
  return escapeLineStart(out);
}

/**
 * A list item or a cell may begin with the string, where a heading (`# `), quote (`>`), list
 * item (`- `, `+ `, `1. `), rule or underline (`---`, `===`) or an indent would start a block:
 * those get a backslash too (an indent becomes no-break spaces). Anything else, such as "-3" or
 * "1.5", stays as it is.
 */
function escapeLineStart(s: string): string {
  const indent = /^ +/.exec(s)?.[0].length ?? 0;
  const rest = s.slice(indent);
  const lead = '\u00a0'.repeat(indent);
  if (/^(>|#{1,6}(\s|$)|[+-](\s|$)|[-= ]+$)/.test(rest)) return `${lead}\\${rest}`;
  const ordered = /^(\d{1,9})([.)](\s|$))/.exec(rest);
  if (ordered) return `${lead}${ordered[1]}\\${rest.slice(ordered[1].length)}`;
  return `${lead}${rest}`;
}
