/**
 * What a screen needs to know about the run beyond the report, so its hints fit: who shows it,
 * which command ran, the config the user named, and what the baseline step wrote.
 */
export interface RenderContext {
  /** The command line prints to a terminal; the action writes the comment and the job summary. */
  surface: 'cli' | 'action';
  mode: 'check' | 'baseline';
  /** The config file as the user passed it (for commands in hints); null when it was the default. */
  configShown: string | null;
  /** The baseline file from the repository root (what to commit); null: as the report names it. */
  baselineFile: string | null;
  /** In baseline mode: what was written, or why nothing was; null in check mode. */
  baseline: { file: string; width: number; historyEntries: number } | { notWritten: string } | null;
}

export const DEFAULT_CONTEXT: RenderContext = {
  surface: 'cli',
  mode: 'check',
  configShown: null,
  baselineFile: null,
  baseline: null,
};
