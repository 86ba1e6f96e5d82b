#!/usr/bin/env node
// Writes the demo data of neuron-budget: INVENTED vibration readings from water pumps.
// Nothing here was measured; the numbers only have to look like a plausible condition-
// monitoring table and to make the neuron-budget demo interesting. Do not use them to
// judge any real pump.
//
//   node examples/pump-vibration/generate.mjs
//
// writes readings.csv (the committed data a main branch would hold) and readings-pr.csv
// (the same rows plus readings from a new pump model, as a pull request would bring them).
// Deterministic: a seeded xoshiro128** stream, no Math.random, fixed number formatting.
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

// ---- Knobs -----------------------------------------------------------------------------
const SEED = 20240611n;
/** Rows per pump model in the base file. */
const BASE_ROWS_PER_MODEL = 700;
/** Rows the pull request adds, all from the new model. */
const PR_ROWS = 1500;
/** Share of each condition among a model's readings (the rest is normal). */
const CONDITION_SHARE = {
  horizontal: { imbalance: 0.2, misalignment: 0.2, bearing_wear: 0.2 },
  vertical: { imbalance: 0.2, misalignment: 0.2, bearing_wear: 0.2 },
};
/** Spread of the band levels (log-normal sigma) per layout. Larger → classes overlap more. */
const BAND_SPREAD = { horizontal: 0.28, vertical: 0.22 };
/** Spread of kurtosis and crest factor around their means (relative). */
const SHAPE_SPREAD = 0.18;

/**
 * Mean band levels in mm/s (1x and 2x running speed, bearing band), kurtosis and crest
 * factor per layout and condition, before the model's `scale`. The two horizontal AQ
 * models share one signature. The vertical HX-90 of the pull request runs at twice the
 * speed with its sensor on the motor's axial face, and the bands are fixed in hertz for
 * the 1480 rpm fleet. So, in this invented world, the same columns mean other things for
 * it: imbalance lifts band_2x, misalignment's harmonic lands in the bearing band, and
 * bearing wear shows either as impacts (early: high kurtosis and crest factor) or as
 * looseness at running speed in band_1x (late). A condition listed with two forms picks
 * one at random. Same features, new meanings: the network needs an extra hidden neuron
 * to tell the model families apart and apply each one's rules.
 */
const MODELS = {
  // rpm is for the reader: the signatures below already reflect each model's speed.
  'AQ-40': { rpm: 1480, scale: 1.0, tempBase: 41 },
  'AQ-55': { rpm: 1480, scale: 1.35, tempBase: 45 },
  'HX-90': { rpm: 2960, scale: 1.6, tempBase: 52 },
};
const SIGNATURES = {
  horizontal: {
    normal: { x1: 1.0, x2: 0.45, bearing: 0.3, kurtosis: 3.0, crest: 3.1 },
    imbalance: { x1: 3.0, x2: 0.55, bearing: 0.33, kurtosis: 3.0, crest: 3.1 },
    misalignment: { x1: 1.25, x2: 2.1, bearing: 0.36, kurtosis: 3.1, crest: 3.1 },
    bearing_wear: { x1: 1.05, x2: 0.5, bearing: 1.3, kurtosis: 5.6, crest: 4.6 },
  },
  vertical: {
    normal: { x1: 1.0, x2: 0.45, bearing: 0.6, kurtosis: 3.0, crest: 3.1 },
    imbalance: { x1: 1.1, x2: 2.1, bearing: 0.65, kurtosis: 3.0, crest: 3.1 },
    misalignment: { x1: 1.1, x2: 0.6, bearing: 2.0, kurtosis: 3.1, crest: 3.1 },
    bearing_wear: [
      { x1: 1.05, x2: 0.5, bearing: 0.65, kurtosis: 5.6, crest: 4.6 },
      { x1: 3.0, x2: 0.55, bearing: 0.7, kurtosis: 3.2, crest: 3.2 },
    ],
  },
};

const layoutOf = (model) => (model === 'HX-90' ? 'vertical' : 'horizontal');

// ---- Seeded random numbers (xoshiro128** 1.1, seeded through SplitMix64) ----------------
function splitMix64(seed) {
  let state = BigInt.asUintN(64, seed);
  return () => {
    state = BigInt.asUintN(64, state + 0x9e3779b97f4a7c15n);
    let z = state;
    z = BigInt.asUintN(64, (z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n);
    z = BigInt.asUintN(64, (z ^ (z >> 27n)) * 0x94d049bb133111ebn);
    return z ^ (z >> 31n);
  };
}

function uniformStream(seed) {
  const mix = splitMix64(seed);
  const r0 = mix();
  const r1 = mix();
  let a = Number(r0 & 0xffffffffn) >>> 0;
  let b = Number(r0 >> 32n) >>> 0;
  let c = Number(r1 & 0xffffffffn) >>> 0;
  let d = Number(r1 >> 32n) >>> 0;
  const next = () => {
    const r = Math.imul(b, 5);
    const result = Math.imul((r << 7) | (r >>> 25), 9) >>> 0;
    const t = b << 9;
    c ^= a;
    d ^= b;
    b ^= c;
    a ^= d;
    c ^= t;
    d = (d << 11) | (d >>> 21);
    return result;
  };
  return () => ((next() >>> 5) * 67108864 + (next() >>> 6)) / 9007199254740992;
}

const uniform = uniformStream(SEED);
/** Standard normal deviate (Box–Muller; the second value is dropped for simplicity). */
function gaussian() {
  const u = 1 - uniform(); // (0, 1]
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniform());
}
const logNormal = (mean, sigma) => mean * Math.exp(sigma * gaussian() - (sigma * sigma) / 2);

// ---- One reading -----------------------------------------------------------------------
function pickCondition(model) {
  let u = uniform();
  for (const [condition, share] of Object.entries(CONDITION_SHARE[layoutOf(model)])) {
    if (u < share) return condition;
    u -= share;
  }
  return 'normal';
}

function reading(id, model) {
  const condition = pickCondition(model);
  const m = MODELS[model];
  const forms = SIGNATURES[layoutOf(model)][condition];
  // Some conditions show in one of two ways; pick one with equal odds.
  const s = Array.isArray(forms) ? forms[uniform() < 0.5 ? 0 : 1] : forms;
  const spread = BAND_SPREAD[layoutOf(model)];
  const x1 = logNormal(s.x1 * m.scale, spread);
  const x2 = logNormal(s.x2 * m.scale, spread);
  const bearing = logNormal(s.bearing * m.scale, spread);
  const broadband = logNormal(0.4 * m.scale, 0.2);
  const rms = Math.sqrt(x1 * x1 + x2 * x2 + bearing * bearing + broadband * broadband);
  const kurtosis = Math.max(1.8, s.kurtosis * (1 + SHAPE_SPREAD * gaussian()));
  const crest = Math.max(1.5, s.crest * (1 + SHAPE_SPREAD * gaussian()));
  const peakToPeak = 2 * rms * crest * (1 + 0.05 * gaussian());
  const temperature = m.tempBase + (condition === 'bearing_wear' ? 5 : 0) + 4 * gaussian();
  return {
    reading_id: `R${String(id).padStart(5, '0')}`,
    pump_model: model,
    rms_velocity: rms.toFixed(3),
    peak_to_peak: peakToPeak.toFixed(3),
    crest_factor: crest.toFixed(3),
    kurtosis: kurtosis.toFixed(3),
    band_1x: x1.toFixed(3),
    band_2x: x2.toFixed(3),
    bearing_band: bearing.toFixed(3),
    casing_temp: temperature.toFixed(1),
    condition,
  };
}

// ---- Files -----------------------------------------------------------------------------
const COLUMNS = [
  'reading_id',
  'pump_model',
  'rms_velocity',
  'peak_to_peak',
  'crest_factor',
  'kurtosis',
  'band_1x',
  'band_2x',
  'bearing_band',
  'casing_temp',
  'condition',
];

function toCsv(rows) {
  return [COLUMNS.join(','), ...rows.map((r) => COLUMNS.map((c) => r[c]).join(','))].join('\n') + '\n';
}

let id = 1;
const base = [];
for (let i = 0; i < BASE_ROWS_PER_MODEL; i++) {
  // Interleave the models, as readings from a mixed fleet would arrive.
  base.push(reading(id++, 'AQ-40'));
  base.push(reading(id++, 'AQ-55'));
}
const added = [];
for (let i = 0; i < PR_ROWS; i++) added.push(reading(id++, 'HX-90'));

const here = dirname(fileURLToPath(import.meta.url));
writeFileSync(join(here, 'readings.csv'), toCsv(base));
writeFileSync(join(here, 'readings-pr.csv'), toCsv([...base, ...added]));
console.error(`wrote readings.csv (${base.length} rows) and readings-pr.csv (${base.length + added.length} rows): invented data`);
