/** The few pieces of markdown the shell writes itself (the report layout belongs to src/report/). */
import { clip, escapeLines } from '../common/escape.js';
import { MAX_MESSAGE } from '../common/errors.js';

/** The runner refuses a step summary over 1 MiB; leave room for the note. */
const SUMMARY_LIMIT = 1_000_000;

/** Shown in the summary (and the pull-request comment) when the job could not run. */
/** `onFile`: the error names a file it is annotated on (a config or data error); else an input of the step (a missing part). */
export function failureMarkdown(message: string, kind: 'input' | 'internal', onFile = true): string {
  const head =
    kind === 'internal'
      ? '### neuron-budget stopped with an internal error'
      : onFile
        ? '### neuron-budget could not run: the config or data needs fixing'
        : '### neuron-budget could not run: an input of the step needs fixing';
  const tail =
    kind === 'internal'
      ? 'No verdict was reached. This is a bug in neuron-budget; the step log has the details.'
      : `No verdict was reached, so this change has not been checked.${onFile ? ' The error is also annotated on the file.' : ' The step log has the error.'}`;
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
