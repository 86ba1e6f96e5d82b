/**
 * Mermaid text through the mermaid package's own parser, in Node, with no DOM library.
 *
 * mermaid's parse path runs labels through DOMPurify, which needs a `window` when it is first
 * imported. A whole DOM (jsdom, happy-dom) is not needed for a grammar check: the shim below
 * gives DOMPurify a document without an HTML parser, so DOMPurify reports itself unsupported and
 * hands strings back unchanged. Sanitising is the browser's business; the screenshot test
 * renders the same blocks in Chromium. Should a mermaid or DOMPurify update want more of the
 * DOM, the import throws and every test using this helper fails: it cannot pass silently.
 */
import type { Mermaid } from 'mermaid';

export interface ParsedChart {
  /** x-axis categories as mermaid read them (band axis), or null for a numeric axis. */
  categories: string[] | null;
  /** The y-axis range mermaid draws: the block's own (`y-axis "…" a --> b`), else one from the data. */
  yRange: [number, number] | null;
  /** Each series, in order, with the values mermaid will draw. */
  plots: { type: string; values: unknown[] }[];
}

export type MermaidParse = { ok: true; diagramType: string; chart: ParsedChart | null } | { ok: false; error: string };

let loading: Promise<Mermaid> | null = null;

function loadMermaid(): Promise<Mermaid> {
  const g = globalThis as { window?: unknown };
  // Just enough for DOMPurify to initialise (document node type 9, an Element class, createElement).
  g.window ??= { document: { nodeType: 9, implementation: {}, createElement: () => ({}) }, Element: class {} };
  loading ??= import('mermaid').then((m) => m.default);
  return loading;
}

/** What mermaid's xychart database holds after parsing (the fields the renderer draws from). */
interface XYChartData {
  xAxis: { type: string; categories?: string[] };
  yAxis: { type: string; min?: number; max?: number };
  plots: { type: string; data: [string, unknown][] }[];
}

/** The text of every ```mermaid (or ~~~mermaid) fenced block, in order, without its fences. */
export function mermaidBlocks(markdown: string): string[] {
  const lines = markdown.split('\n');
  const blocks: string[] = [];
  for (let i = 0; i < lines.length; i++) {
    const open = /^ {0,3}(`{3,}|~{3,})\s*mermaid\s*$/.exec(lines[i]);
    if (!open) continue;
    const fence = open[1];
    const close = new RegExp(`^ {0,3}${fence[0] === '`' ? '`' : '~'}{${fence.length},}\\s*$`);
    const body: string[] = [];
    let j = i + 1;
    while (j < lines.length && !close.test(lines[j])) body.push(lines[j++]);
    if (j === lines.length) throw new Error(`mermaid block opened on line ${i + 1} is never closed`);
    blocks.push(body.join('\n'));
    i = j;
  }
  return blocks;
}

/** Parse one block; never throws for a parse error, returns it. */
export async function parseMermaid(text: string): Promise<MermaidParse> {
  const mermaid = await loadMermaid();
  let diagramType: string;
  try {
    // Without suppressErrors, mermaid.parse throws on any error rather than returning false.
    diagramType = (await mermaid.parse(text)).diagramType;
  } catch (e) {
    return { ok: false, error: e instanceof Error ? e.message : String(e) };
  }
  if (diagramType !== 'xychart') return { ok: true, diagramType, chart: null };
  const diagram = await mermaid.mermaidAPI.getDiagramFromText(text);
  const data = (diagram.db as { getXYChartData(): XYChartData }).getXYChartData();
  const y = data.yAxis;
  return {
    ok: true,
    diagramType,
    chart: {
      categories: data.xAxis.type === 'band' ? [...(data.xAxis.categories ?? [])] : null,
      yRange: y.type === 'linear' && typeof y.min === 'number' && typeof y.max === 'number' ? [y.min, y.max] : null,
      plots: data.plots.map((p) => ({ type: p.type, values: p.data.map((d) => d[1]) })),
    },
  };
}
