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
//
// How the data are shaped (so that the demo shows what the product is for): in normal
// running every indicator wanders over a wide range (operating point, flow, mounting),
// and a fault lifts ONE indicator only a little above the top of that range. So each
// fault signature is a threshold on its own indicator, and a network needs roughly one
// hidden neuron per signature. The main-branch pumps have three signatures (a handful of
// neurons); the pull request's new pump model shows its faults in seven, some of them in
// columns where the older pumps show a different fault (clearly more neurons).
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

// ---- Knobs -----------------------------------------------------------------------------
const SEED = 20240611n;
/** Rows per pump model in the base file (two models). */
const BASE_ROWS_PER_MODEL = 600;
/** Rows the pull request adds, all from the new model. */
const PR_ROWS = 1500;
/** Share of each fault among a layout's readings (the rest is normal). */
const CONDITION_SHARE = {
  horizontal: { imbalance: 0.2, misalignment: 0.2, bearing_wear: 0.2 },
  vertical: { imbalance: 0.25, misalignment: 0.25, bearing_wear: 0.25 },
};
/**
 * Normal range of each indicator [low, high], drawn log-uniformly. Band levels and
 * broadband energy are in mm/s before the model's `scale`; casing temperature is a
 * multiple of the model's `tempBase`; kurtosis and crest factor are as they are.
 */
const NORMAL_RANGE = {
  band_1x: [0.6, 1.6],
  band_2x: [0.3, 0.8],
  bearing_band: [0.2, 0.5],
  broadband: [0.3, 0.6],
  kurtosis: [2.6, 3.6],
  crest_factor: [2.8, 3.6],
  casing_temp: [0.85, 1.1],
};
/** A raised indicator starts GAP times above the top of its normal range... */
const GAP = 1.04;
/** ...and spans RAISE times that start (log-uniformly). Larger GAP or RAISE: easier, fewer neurons. */
const RAISE = 1.25;

const MODELS = {
  // rpm is for the reader: the signatures below already reflect each model's speed.
  'AQ-40': { rpm: 1480, scale: 1.0, tempBase: 41, layout: 'horizontal' },
  'AQ-55': { rpm: 1480, scale: 1.35, tempBase: 45, layout: 'horizontal' },
  'HX-90': { rpm: 2960, scale: 1.6, tempBase: 52, layout: 'vertical' },
};
/**
 * Which indicators each condition raises, per layout. A condition with several forms
 * picks one with equal odds. The horizontal AQ models have one form per fault. The
 * vertical HX-90 of the pull request runs at twice the speed with its sensor on the
 * motor's axial face, and the bands are fixed in hertz for the 1480 rpm fleet, so in this
 * invented world the same columns mean other things for it: its running speed lands in
 * band_2x, its misalignment harmonic in the bearing band, and looseness from worn
 * bearings at half its speed in band_1x. Imbalance may instead excite the motor frame
 * (broadband), misalignment may show only as heat, and bearing wear shows as impacts
 * (kurtosis early, crest factor later) or as looseness.
 */
const SIGNATURES = {
  horizontal: {
    normal: [[]],
    imbalance: [['band_1x']],
    misalignment: [['band_2x']],
    bearing_wear: [['bearing_band', 'kurtosis']],
  },
  vertical: {
    normal: [[]],
    imbalance: [['band_2x'], ['broadband']],
    misalignment: [['bearing_band'], ['casing_temp']],
    bearing_wear: [['kurtosis'], ['crest_factor'], ['band_1x']],
  },
};

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
const logUniform = (low, high) => low * Math.exp(Math.log(high / low) * uniform());

// ---- One reading -----------------------------------------------------------------------
function pickCondition(layout) {
  let u = uniform();
  for (const [condition, share] of Object.entries(CONDITION_SHARE[layout])) {
    if (u < share) return condition;
    u -= share;
  }
  return 'normal';
}

/** One indicator's level: inside its normal range, or just above it when raised. */
function level(name, raised, factor) {
  const [low, high] = NORMAL_RANGE[name];
  const value = raised ? logUniform(high * GAP, high * GAP * RAISE) : logUniform(low, high);
  return value * factor;
}

function reading(id, model) {
  const m = MODELS[model];
  const condition = pickCondition(m.layout);
  const forms = SIGNATURES[m.layout][condition];
  const form = forms[Math.min(forms.length - 1, Math.floor(uniform() * forms.length))];
  const up = (name) => form.includes(name);
  const x1 = level('band_1x', up('band_1x'), m.scale);
  const x2 = level('band_2x', up('band_2x'), m.scale);
  const bearing = level('bearing_band', up('bearing_band'), m.scale);
  const broadband = level('broadband', up('broadband'), m.scale);
  const kurtosis = level('kurtosis', up('kurtosis'), 1);
  const crest = level('crest_factor', up('crest_factor'), 1);
  const temperature = level('casing_temp', up('casing_temp'), m.tempBase);
  const rms = Math.sqrt(x1 * x1 + x2 * x2 + bearing * bearing + broadband * broadband);
  const peakToPeak = 2 * rms * crest * (1 + 0.05 * gaussian());
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
console.error(
  `wrote readings.csv (${base.length} rows) and readings-pr.csv (${base.length + added.length} rows): invented data`,
);
