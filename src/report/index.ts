/** Rendering a report: pull-request comment / job summary, terminal text, JSON. */
export { renderMarkdown, COMMENT_LIMIT } from './markdown.js';
export { DEFAULT_CONTEXT } from './context.js';
export type { RenderContext } from './context.js';
export type { MarkdownOptions } from './markdown.js';
export { renderText, TEXT_WIDTH } from './text.js';
export { withGate } from './json.js';
export { baselineRecordLine } from './baseline-record.js';
export type { Report, Verdict } from './types.js';
