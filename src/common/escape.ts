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
const ZWSP = '&#8203;';
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

/** Space , ; ' " / % = ? */
const PLAIN = new Set([0x20, 0x2c, 0x3b, 0x27, 0x22, 0x2f, 0x25, 0x3d, 0x3f]);

/**
 * Markdown: every ASCII character other than letters, digits, space and , ; ' " / % = ?
 * (which mean nothing to Markdown in the middle of a line, where these strings always go)
 * becomes a numeric character reference, which GitHub-flavoured Markdown shows as literal
 * text and never reads as syntax (emphasis, links, images, HTML, code, table pipes,
 * headings, lists). GitHub turns some plain text into links after rendering (@-mentions,
 * #123 references, URLs, www. addresses, :emoji:; GitHub behaviour as we know it, not
 * checked against GitHub here), so a zero-width space follows every "@", "#" and ":" and
 * precedes the dot of "www.", which breaks those patterns without changing what a reader
 * sees. Line breaks become spaces, so a string never leaves its line or table cell.
 */
export function escapeMarkdown(raw: string, max: number = MAX_SHOWN): string {
  const s = clip(raw, max);
  let out = '';
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if ((c >= 0x30 && c <= 0x39) || (c >= 0x41 && c <= 0x5a) || (c >= 0x61 && c <= 0x7a) || PLAIN.has(c)) {
      out += s[i];
    } else if (c === 0x0a || c === 0x0d || c === 0x09) {
      out += ' ';
    } else if (c < 0x20 || c === 0x7f || (c >= 0x80 && c < 0xa0)) {
      out += '&#65533;';
    } else if (c < 0x80) {
      if (c === 0x2e && /www$/i.test(s.slice(Math.max(0, i - 3), i))) out += ZWSP;
      out += `&#${c};`;
      if (c === 0x40 || c === 0x23 || c === 0x3a) out += ZWSP;
    } else if (INVISIBLE.test(s[i])) {
      out += '&#65533;';
    } else if (c === 0xff20 || c === 0xfe6b) {
      // Full-width and small commercial at: GitHub does not mention on them, but keep them inert anyway.
      out += `&#${c};${ZWSP}`;
    } else {
      out += s[i];
    }
  }
  return out;
}
