/**
 * The shape of the code, checked: no import cycles among src/ files (type-only imports
 * included), a ground floor (src/common) that imports no stage, the pipeline's direction
 * (config → data → search/nn → gate → report → shells) never reversed, and no source file over
 * 400 lines outside generated ones.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = resolve(import.meta.dirname, '..', '..');
const srcDir = join(root, 'src');

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? walk(join(dir, e.name)) : e.name.endsWith('.ts') ? [join(dir, e.name)] : [],
  );
}

const files = walk(srcDir).map((f) => relative(root, f).split('\\').join('/'));
const GENERATED = new Set(['src/nn/kernel/kernel-bytes.ts']);

/** Relative imports of a file (import, import type, export … from, dynamic import), as repo paths. */
function importsOf(file: string): string[] {
  const text = readFileSync(join(root, file), 'utf8');
  const out: string[] = [];
  for (const m of text.matchAll(
    /(?:^|\n)\s*(?:import|export)\b[^'";]*?from\s+['"](\.[^'"]+)['"]|import\(\s*['"](\.[^'"]+)['"]\s*\)/g,
  )) {
    const spec = m[1] ?? m[2];
    const target = relative(root, resolve(root, dirname(file), spec))
      .split('\\')
      .join('/')
      .replace(/\.js$/, '.ts');
    if (target.startsWith('src/')) out.push(target);
  }
  return out;
}

const graph = new Map(files.map((f) => [f, importsOf(f)]));

/** Strongly connected components with more than one file, or a file importing itself (Tarjan). */
function cycles(): string[][] {
  let index = 0;
  const idx = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const on = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string): void => {
    idx.set(v, index);
    low.set(v, index++);
    stack.push(v);
    on.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!graph.has(w)) continue;
      if (!idx.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (on.has(w)) low.set(v, Math.min(low.get(v)!, idx.get(w)!));
    }
    if (low.get(v) === idx.get(v)) {
      const part: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        on.delete(w);
        part.push(w);
      } while (w !== v);
      if (part.length > 1 || (graph.get(v) ?? []).includes(v)) found.push(part.sort());
    }
  };
  for (const f of files) if (!idx.has(f)) visit(f);
  return found;
}

/** The stage a file belongs to, by folder. */
function stageOf(file: string): string {
  const parts = file.split('/');
  return parts.length > 2 ? parts[1] : parts[1].replace(/\.ts$/, '');
}

describe('structure of src/', () => {
  it('finds the files (the check itself works)', () => {
    expect(files.length).toBeGreaterThan(50);
    expect(graph.get('src/job/prepare.ts')).toContain('src/config/index.ts');
    // A planted cycle is found: the detector can fail.
    graph.set('src/common/metric.ts', [...(graph.get('src/common/metric.ts') ?? []), 'src/common/format.ts']);
    expect(cycles().some((c) => c.includes('src/common/metric.ts'))).toBe(true);
    graph.set('src/common/metric.ts', importsOf('src/common/metric.ts'));
  });

  it('has no import cycle, type-only imports included', () => {
    expect(cycles()).toEqual([]);
  });

  it('keeps the ground floor (src/common) free of imports from the stages', () => {
    const upward = files
      .filter((f) => f.startsWith('src/common/'))
      .flatMap((f) =>
        graph
          .get(f)!
          .filter((t) => !t.startsWith('src/common/'))
          .map((t) => `${f} → ${t}`),
      );
    expect(upward).toEqual([]);
  });

  it('never imports against the pipeline (config → data → nn/search → gate → report → shells)', () => {
    const order: Record<string, number> = {
      common: 0,
      version: 0,
      config: 1,
      files: 1,
      data: 2,
      nn: 3,
      search: 4,
      model: 4,
      device: 4,
      gate: 5,
      matrix: 5,
      report: 6,
      run: 7,
      job: 7,
      github: 8,
      cli: 8,
      index: 9,
    };
    const backwards: string[] = [];
    for (const [f, targets] of graph) {
      const from = order[stageOf(f)];
      for (const t of targets) {
        const to = order[stageOf(t)];
        expect(from, `stage of ${f}`).toBeDefined();
        expect(to, `stage of ${t}`).toBeDefined();
        if (to > from) backwards.push(`${f} → ${t}`);
      }
    }
    expect(backwards).toEqual([]);
  });

  it('has no source file over 400 lines outside generated files', () => {
    const long = files
      .filter((f) => !GENERATED.has(f))
      .map((f) => ({ f, lines: readFileSync(join(root, f), 'utf8').split('\n').length }))
      .filter((x) => x.lines > 400)
      .map((x) => `${x.f}: ${x.lines}`);
    expect(long).toEqual([]);
  });
});
