/**
 * Makes strings from the repository (column names, class labels, paths, values, and
 * sentences that quote them) safe to show.
 *
 * Markdown: every ASCII character other than letters, digits, space and , ; ' " / % = ?
 * (which mean nothing to Markdown in the middle of a line, where these strings always
 * go) becomes a numeric character reference, which GitHub-flavoured Markdown shows as
 * literal text and never reads as syntax (emphasis, links, images, HTML, code, table
 * pipes, headings, lists).
 * GitHub turns some plain text into links after rendering (@-mentions, #123 references,
 * URLs, www. addresses, :emoji:; GitHub behaviour as we know it, not checked against
 * GitHub here), so a zero-width space follows every "@", "#" and ":"
 * and before the dot of "www.", which breaks those patterns without changing what a reader sees.
 * Line breaks become spaces, so a string never leaves its line or table cell.
 */

const ZWSP = '&#8203;';
/** Bidirectional and invisible formatting characters that could disguise text. */
const INVISIBLE = /[\u200b-\u200f\u2028\u2029\u202a-\u202e\u2060-\u2064\u2066-\u2069\ufeff\u00ad]/u;
const MAX_SHOWN = 200;
/** Space , ; ' " / % = ? */
const PLAIN = new Set([0x20, 0x2c, 0x3b, 0x27, 0x22, 0x2f, 0x25, 0x3d, 0x3f]);

export function escapeMarkdown(raw: string): string {
  const s = clip(raw);
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

/** Plain text for a terminal: control characters (escape sequences) and invisible formatting become "?". */
export function escapeTerminal(raw: string): string {
  const s = clip(raw);
  let out = '';
  for (const ch of s) {
    const c = ch.codePointAt(0) ?? 0;
    if (c === 0x0a || c === 0x0d || c === 0x09) out += ' ';
    else if (c < 0x20 || c === 0x7f || (c >= 0x80 && c < 0xa0) || INVISIBLE.test(ch)) out += '?';
    else out += ch;
  }
  return out;
}

/** Long names are shortened so one pathological column cannot swamp the report. */
function clip(s: string): string {
  const chars = Array.from(s);
  return chars.length > MAX_SHOWN ? `${chars.slice(0, MAX_SHOWN - 3).join('')}...` : s;
}
