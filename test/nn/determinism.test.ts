/**
 * The same seed gives bit-identical weights under Node 20 and Node 24 (and on the float64
 * reference path as on the WebAssembly path), for the first-order optimisers and for L-BFGS.
 * Small scripts train several networks and print a sha256 of each one's final weights.
 */
import { describe, expect, it } from 'vitest';
import { runUnderBothNodes } from './cross-node.js';

describe('bit-identical training across Node versions', () => {
  it('Node 20 and Node 24 give the same weights for the same seeds', () => {
    const { here, there } = runUnderBothNodes('test/nn/determinism-script.ts');
    const lines = here.trim().split('\n');
    expect(lines.length).toBe(26);
    expect(there).toBe(here);
    // The reference path gives the same bits as the WebAssembly path.
    const byName = (prefix: string) => lines.filter((l) => l.startsWith(prefix)).map((l) => l.slice(prefix.length));
    expect(byName('wasm ')).toEqual(byName('reference '));
  });

  it('Node 20 and Node 24 give the same L-BFGS parameters for the same starts', () => {
    const { here, there } = runUnderBothNodes('test/nn/lbfgs-determinism-script.ts');
    expect(here.trim().split('\n')).toHaveLength(9);
    expect(there).toBe(here);
  });
});
