/**
 * Compiling and running the exported C in tests: the system C compiler, a generated test
 * driver that reads rows of raw features (exact hexadecimal floats) from stdin and prints each
 * path's class and outputs as exact hexadecimal floats (%a).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { floatLiteral, type CFiles } from '../../src/device/index.js';

export const C_FLAGS = ['-std=c99', '-Wall', '-Wextra', '-Werror', '-pedantic'];

function which(cmd: string): boolean {
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;
}

/** The system C compiler (gcc, else cc), or null. */
export const CC: string | null = which('gcc') ? 'gcc' : which('cc') ? 'cc' : null;
/** binutils nm, to read object sizes from the compiled file. */
export const NM: string | null = which('nm') ? 'nm' : null;

export function driverSource(name: string): string {
  const N = name.toUpperCase();
  return `#include <stdio.h>
#include <stdlib.h>
#include "${name}.h"

int main(void) {
  float features[${N}_FEATURES];
  float out[${N}_OUTPUTS];
  char word[128];
  int f, k, cls;
  for (;;) {
    for (f = 0; f < ${N}_FEATURES; f++) {
      if (scanf("%127s", word) != 1) return f == 0 ? 0 : 3;
      features[f] = strtof(word, NULL);
    }
    cls = ${name}_predict(features, out);
    printf("%d", cls);
    for (k = 0; k < ${N}_OUTPUTS; k++) printf(" %a", (double)out[k]);
    cls = ${name}_predict_int8(features, out);
    printf(" | %d", cls);
    for (k = 0; k < ${N}_OUTPUTS; k++) printf(" %a", (double)out[k]);
    printf("\\n");
  }
}
`;
}

/** A hexadecimal float as C's %a prints it (also inf and nan), exactly. */
export function parseHexFloat(text: string): number {
  const t = text.trim().toLowerCase();
  const neg = t.startsWith('-');
  const body = neg || t.startsWith('+') ? t.slice(1) : t;
  if (body === 'inf' || body === 'infinity') return neg ? -Infinity : Infinity;
  if (body === 'nan') return Number.NaN;
  const m = /^0x([0-9a-f]*)(?:\.([0-9a-f]*))?p([+-]?\d+)$/.exec(body);
  if (!m) throw new Error(`not a hexadecimal float: ${text}`);
  const frac = m[2] ?? '';
  const mantissa = parseInt(`${m[1]}${frac}` || '0', 16); // at most 14 hex digits: exact
  const value = mantissa * 2 ** (Number(m[3]) - 4 * frac.length);
  return neg ? -value : value;
}

/** A float32 value as an exact C hexadecimal float for the driver's input (strtof reads it back exactly). */
export function hexFloat(x: number): string {
  if (Number.isNaN(x)) return 'nan';
  if (!Number.isFinite(x)) return x > 0 ? 'inf' : '-inf';
  return floatLiteral(x).slice(0, -1);
}

export interface CRow {
  floatClass: number;
  floatOutputs: number[];
  int8Class: number;
  int8Outputs: number[];
}

export interface Built {
  dir: string;
  run(features: Float32Array, featuresPerRow: number): CRow[];
  /** Sizes of the read-only data objects in NAME.o, by symbol name (compiled at -O0 so none is folded away). */
  objectSizes(): Map<string, number>;
}

/** Writes NAME.h, NAME.c and the driver to a temp folder and compiles them with the strict flags. */
export function build(files: CFiles, name: string, optimise = '-O2'): Built {
  if (CC === null) throw new Error('no C compiler');
  const dir = mkdtempSync(join(tmpdir(), 'nb-c-'));
  writeFileSync(join(dir, files.headerFile), files.header);
  writeFileSync(join(dir, files.sourceFile), files.source);
  writeFileSync(join(dir, 'driver.c'), driverSource(name));
  const exe = join(dir, 'driver');
  execFileSync(CC, [...C_FLAGS, optimise, '-o', exe, join(dir, 'driver.c'), join(dir, files.sourceFile), '-lm'], {
    cwd: dir,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  return {
    dir,
    run(features, F) {
      const lines: string[] = [];
      for (let p = 0; p < features.length / F; p++) {
        lines.push(Array.from(features.subarray(p * F, (p + 1) * F), hexFloat).join(' '));
      }
      const out = execFileSync(exe, { input: `${lines.join('\n')}\n`, maxBuffer: 1 << 26 }).toString('utf8');
      return out
        .trim()
        .split('\n')
        .map((line) => {
          const [f, i] = line.split(' | ').map((half) => half.trim().split(/\s+/));
          return {
            floatClass: Number(f[0]),
            floatOutputs: f.slice(1).map(parseHexFloat),
            int8Class: Number(i[0]),
            int8Outputs: i.slice(1).map(parseHexFloat),
          };
        });
    },
    objectSizes() {
      if (NM === null) throw new Error('no nm');
      const obj = join(dir, 'model.o');
      execFileSync(CC!, [...C_FLAGS, '-O0', '-c', '-o', obj, join(dir, files.sourceFile)], { cwd: dir });
      const sizes = new Map<string, number>();
      const listing = execFileSync(NM, ['-S', '--defined-only', obj]).toString('utf8');
      for (const line of listing.split('\n')) {
        const m = /^[0-9a-f]+ ([0-9a-f]+) [rR] (\S+)$/.exec(line.trim());
        if (m) sizes.set(m[2], parseInt(m[1], 16));
      }
      return sizes;
    },
  };
}

/** Compiles a whole C program with the strict flags and returns what it prints. */
export function compileAndRun(program: string, input = ''): string {
  if (CC === null) throw new Error('no C compiler');
  const dir = mkdtempSync(join(tmpdir(), 'nb-c-'));
  writeFileSync(join(dir, 'main.c'), program);
  const exe = join(dir, 'main');
  execFileSync(CC, [...C_FLAGS, '-o', exe, join(dir, 'main.c')], { stdio: ['ignore', 'pipe', 'pipe'] });
  return execFileSync(exe, { input }).toString('utf8');
}
