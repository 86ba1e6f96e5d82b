/**
 * Invented data from a random teacher network. The rows are generated here; they are not
 * measurements, and the pump-vibration column names only dress them in our demo scenario.
 *
 * Inputs are uniform in [-1, 1]. A teacher with one hidden layer of `hidden` tanh units scores
 * every row; the label is which side of the median score the row falls on (balanced classes, no
 * label noise). The units point in well-separated random directions, are steep (`gain`) and have
 * their kinks inside the data, so each one carries its own piece of the class boundary and a
 * student needs about as many hidden units as the teacher has to reach a high accuracy. Shared by
 * the tests and the benchmarks (bench/*.entry.ts may import it).
 */
import { rngFor, type Rng } from '../../src/common/random.js';
import { detTanh } from '../../src/nn/kernel/detmath.js';

export interface TeacherOptions {
  rows: number;
  inputs: number;
  /** Hidden tanh units of the teacher. */
  hidden: number;
  /** Picks the teacher and the rows. */
  seed: number;
  /** Steepness of every teacher unit: the norm of its weight vector. Default 6. */
  gain?: number;
}

/** One random teacher: hidden × inputs weights (row-major), hidden biases, hidden output weights. */
export interface Teacher {
  inputs: number;
  hidden: number;
  w: Float64Array;
  b: Float64Array;
  a: Float64Array;
}

export const DEFAULT_GAIN = 6;

/** Invented feature names in the pump-vibration scenario, then v13, v14, … */
const NAMES = [
  'rms_velocity',
  'peak_to_peak',
  'crest_factor',
  'kurtosis',
  'band_1x',
  'band_2x',
  'band_3x',
  'bearing_band',
  'casing_temp',
  'motor_current',
  'suction_pressure',
  'discharge_pressure',
];

export function teacherFeatureNames(inputs: number): string[] {
  return Array.from({ length: inputs }, (_, i) => (i < NAMES.length ? NAMES[i] : `v${i + 1}`));
}

function uniform(rng: Rng, lo: number, hi: number): number {
  return lo + (hi - lo) * rng.nextDouble();
}

/** A unit vector with `n` entries, uniform in direction (rejection from the cube to the ball). */
function direction(rng: Rng, n: number): Float64Array {
  const v = new Float64Array(n);
  for (;;) {
    let s = 0;
    for (let i = 0; i < n; i++) {
      v[i] = uniform(rng, -1, 1);
      s += v[i] * v[i];
    }
    if (s > 1e-6 && s <= 1) {
      const r = Math.sqrt(s);
      for (let i = 0; i < n; i++) v[i] /= r;
      return v;
    }
  }
}

function dot(u: Float64Array, v: Float64Array): number {
  let s = 0;
  for (let i = 0; i < u.length; i++) s += u[i] * v[i];
  return s;
}

/**
 * The random teacher. Directions are drawn until every pair has |cos| ≤ 0.5 (0.7 when there are
 * more units than inputs), so no two units can share one student unit; after 10,000 draws a
 * direction is taken as it comes. Output weights have random signs and magnitudes in [0.6, 1.4],
 * so no unit is negligible.
 */
export function randomTeacher(inputs: number, hidden: number, seed: number, gain = DEFAULT_GAIN): Teacher {
  const rng = rngFor(seed, 0x7465, 0x6163); // a stream of its own ("te", "ac")
  const maxCos = hidden <= inputs ? 0.5 : 0.7;
  const dirs: Float64Array[] = [];
  for (let tries = 1; dirs.length < hidden; tries++) {
    const d = direction(rng, inputs);
    if (tries > 10_000 || dirs.every((e) => Math.abs(dot(e, d)) <= maxCos)) dirs.push(d);
  }
  const w = new Float64Array(hidden * inputs);
  const b = new Float64Array(hidden);
  const a = new Float64Array(hidden);
  for (let j = 0; j < hidden; j++) {
    for (let i = 0; i < inputs; i++) w[j * inputs + i] = gain * dirs[j][i];
    // u·x has standard deviation 1/√3 for x uniform in [-1, 1]^n: the kink lies within ±0.4 of that.
    b[j] = -gain * uniform(rng, -0.4, 0.4) * Math.sqrt(1 / 3);
    a[j] = (rng.nextDouble() < 0.5 ? -1 : 1) * uniform(rng, 0.6, 1.4);
  }
  return { inputs, hidden, w, b, a };
}

/** The teacher's output for one row (the engine's own tanh, so every Node gives the same labels). */
export function teacherScore(t: Teacher, x: Float64Array): number {
  let f = 0;
  for (let j = 0; j < t.hidden; j++) {
    let z = t.b[j];
    for (let i = 0; i < t.inputs; i++) z += t.w[j * t.inputs + i] * x[i];
    f += t.a[j] * detTanh(z);
  }
  return f;
}

/**
 * CSV text with a header: the feature columns (4 decimals; the label is computed from the
 * rounded values), then `condition`: `worn` for the half of the rows with the higher teacher
 * score, `ok` for the rest.
 */
export function teacherCsv(options: TeacherOptions): string {
  const { rows, inputs, hidden, seed } = options;
  const teacher = randomTeacher(inputs, hidden, seed, options.gain ?? DEFAULT_GAIN);
  const rng = rngFor(seed, 0x726f, 0x7773); // "ro", "ws"
  const cells: string[][] = [];
  const scores = new Float64Array(rows);
  const x = new Float64Array(inputs);
  for (let p = 0; p < rows; p++) {
    const row: string[] = [];
    for (let i = 0; i < inputs; i++) {
      x[i] = Math.round(uniform(rng, -1, 1) * 1e4) / 1e4;
      row.push(x[i].toFixed(4));
    }
    cells.push(row);
    scores[p] = teacherScore(teacher, x);
  }
  const median = Float64Array.from(scores).sort()[Math.floor(rows / 2)];
  const lines = [[...teacherFeatureNames(inputs), 'condition'].join(',')];
  for (let p = 0; p < rows; p++) lines.push([...cells[p], scores[p] >= median ? 'worn' : 'ok'].join(','));
  return `${lines.join('\n')}\n`;
}

/**
 * The calibrated case: teacher A has 10 hidden units, teacher B the same recipe with 2 more.
 * Measured with teacherConfigYaml and the CLI (`check` without a baseline, and `baseline`: every
 * width from min-width up) on a 2-core machine; the same widths and trainings with 1 or 2 workers:
 *   A: width 10, 53 trainings, search 5.6–9.7 s; widths 1–9 each 0 met of 5 restarts (best
 *      judged accuracy at 9: 0.9605), width 10: the first 2 restarts met (best 0.989).
 *   B: width 12, 63 trainings, search 8.0–10.2 s; widths 1–11 each 0 met of 5 (best at 11:
 *      0.950), width 12: the first 2 restarts met (best 0.988).
 * These hold for this engine's training and seeds; a check should allow A in 9–11 and B − A in
 * 1–3. 10,000 rows are needed: with 6,000 or 8,000 the wider students overfit and stay below the
 * threshold. Data seed 2 gives the same widths; seed 3 gives A 10 but B only after pruning.
 */
export const TEACHER_CASE = {
  a: { rows: 10_000, inputs: 12, hidden: 10, seed: 1, gain: DEFAULT_GAIN },
  b: { rows: 10_000, inputs: 12, hidden: 12, seed: 1, gain: DEFAULT_GAIN },
  widthA: 10,
  widthB: 12,
} as const satisfies {
  a: TeacherOptions;
  b: TeacherOptions;
  widthA: number;
  widthB: number;
};

/** The calibrated config for TEACHER_CASE, reading `dataFile` (relative to the config's folder). */
export function teacherConfigYaml(dataFile: string): string {
  return [
    '# Invented data from a random teacher network (test/helpers/teacher.ts), not measurements.',
    'data:',
    `  path: ${JSON.stringify(dataFile)}`,
    '  target: condition',
    '  validation: 0.25',
    '  judging: 0.2',
    'target:',
    '  metric: accuracy',
    '  threshold: 0.975',
    'search:',
    '  min-width: 1',
    '  max-width: 16',
    '  restarts: 6',
    '  required: 2',
    '  max-epochs: 800',
    '  seed: 1',
    '',
  ].join('\n');
}
