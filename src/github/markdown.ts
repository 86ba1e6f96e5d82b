/** The few pieces of markdown the shell writes itself (the report layout belongs to src/report/). */
import { clip, escapeLines } from '../common/escape.js';
import { MAX_MESSAGE } from '../common/errors.js';

/** The runner refuses a step summary over 1 MiB; leave room for the note. */
const SUMMARY_LIMIT = 1_000_000;

/** Shown in the summary (and the pull-request comment) when the job could not run. */
export function failureMarkdown(message: string, kind: 'input' | 'internal'): string {
  const head =
    kind === 'input'
      ? '### neuron-budget could not run: the config or data needs fixing'
      : '### neuron-budget stopped with an internal error';
  const tail =
    kind === 'input'
      ? 'No verdict was reached, so this change has not been checked. The error is also annotated on the file.'
      : 'No verdict was reached. This is a bug in neuron-budget; the step log has the details.';
  return `${head}\n\n${codeBlock(escapeLines(clip(message, MAX_MESSAGE)))}\n\n${tail}\n`;
}

/**
 * A fenced code block: shown verbatim, and GitHub links nothing inside one (no mention, reference
 * or URL). The fence is longer than any run of backticks in the text, so the text cannot close it;
 * control characters are already shown escaped.
 */
function codeBlock(text: string): string {
  const longest = Math.max(0, ...(text.match(/`+/g) ?? []).map((run) => run.length));
  const fence = '`'.repeat(Math.max(3, longest + 1));
  return `${fence}text\n${text}\n${fence}`;
}

export function fitSummary(markdown: string, limit = SUMMARY_LIMIT): string {
  if (markdown.length <= limit) return markdown;
  const note =
    "\n\n_The summary was cut to fit the runner's 1 MiB limit; the JSON report (output `report`) has everything._\n";
  const cut = markdown.slice(0, limit - note.length);
  return cut.slice(0, Math.max(0, cut.lastIndexOf('\n'))) + note;
}
