/**
 * An invented failing pull request in the pump-vibration scenario, built through the
 * real gate (evaluateGate + withGate): the baseline was accepted three times on the base
 * readings; the pull request adds readings from a third pump model running at another
 * speed, and the smallest adequate width grows past the device budget.
 * Every number here is invented; none is a measurement.
 */
import { evaluateGate } from '../../src/gate/index.js';
import { nextBaseline } from '../../src/gate/baseline.js';
import type { Baseline } from '../../src/gate/types.js';
import { withGate } from '../../src/report/json.js';
import type { Report } from '../../src/report/types.js';
import type { SearchResult } from '../../src/search/types.js';
import { config, dataReport, loaded, profile, width } from '../gate/build.js';

function curve(points: [number, number, number | null][], pruneTo: number | null, seconds: number): SearchResult {
  const widths = points.map(([w, reached, best]) => width(w, reached, 10, best));
  const grown = points[points.length - 1][0];
  const finalWidth = pruneTo ?? grown;
  return {
    outcome: 'found',
    width: finalWidth,
    grownWidth: grown,
    metric: points[points.length - 1][2],
    witness: null,
    widths,
    pruning: [],
    trainings: widths.reduce((n, w) => n + w.restarts, 0),
    note: null,
    timing: { searchSeconds: seconds, growthSeconds: seconds * 0.9, pruneSeconds: seconds * 0.1 },
  };
}

export function demoFailReport(): Report {
  const cfg = config({ data: { pathAsWritten: 'examples/pump-vibration/readings.csv' } });
  const base = profile();
  let baseline: Baseline | null = null;
  const accepted: [number, number, string, string][] = [
    [1500, 3, '3f9c2e1', '2026-01-12T08:00:00.000Z'],
    [1650, 4, '81d0b7a', '2026-02-03T08:00:00.000Z'],
    [1800, 4, 'c47e5d2', '2026-02-24T08:00:00.000Z'],
  ];
  for (const [rows, w, commit, date] of accepted) {
    const points: [number, number, number | null][] = [];
    for (let k = 1; k <= w; k++) points.push([k, k === w ? 6 : 0, k === w ? 0.9622 : 0.62 + 0.09 * k]);
    const result = curve(points, null, 9.8 + rows / 1000);
    baseline = nextBaseline(
      baseline,
      { result, loaded: loaded(profile({ rows }), rows.toString(16).padStart(64, '0')), config: cfg },
      { date: new Date(date), commit, toolVersion: '0.1.0' },
    );
  }

  const prProfile = profile({
    rows: 2400,
    classes: { bearing_wear: 600, imbalance: 600, normal: 1200 },
    features: {
      pump_model: { kind: 'categorical', counts: { 'P-100': 1000, 'P-200': 800, 'P-300': 600 }, missing: 0 },
      rms_velocity: { kind: 'numeric', mean: 2.7, std: 0.9, min: 0.6, max: 6.3, missing: 0 },
      kurtosis: { kind: 'numeric', mean: 3.25, std: 0.9, min: 1.8, max: 8.4, missing: 0 },
      band_1x: { kind: 'numeric', mean: 1.35, std: 0.5, min: 0.2, max: 3.4, missing: 0 },
    },
  });
  const prCfg = config({ data: { pathAsWritten: 'examples/pump-vibration/readings.csv' } });
  const result = curve(
    [
      [1, 0, 0.6533],
      [2, 0, 0.7617],
      [3, 0, 0.8233],
      [4, 0, 0.8717],
      [5, 0, 0.9033],
      [6, 0, 0.925],
      [7, 0, 0.9383],
      [8, 1, 0.9517],
      [9, 3, 0.9567],
      [10, 5, 0.9617],
    ],
    9,
    31.4,
  );
  result.pruning = [
    { restart: 2, width: 10, neuron: 7, metricBefore: 0.9617, metricAfter: 0.9583, kept: true },
    { restart: 2, width: 9, neuron: 3, metricBefore: 0.9583, metricAfter: 0.9417, kept: false },
    { restart: 2, width: 9, neuron: 0, metricBefore: 0.9583, metricAfter: 0.9267, kept: false },
  ];
  result.metric = 0.9583;
  const fingerprint = 'e'.repeat(64);
  const outcome = evaluateGate({ result, loaded: loaded(prProfile, fingerprint), config: prCfg, baseline });
  return withGate(dataReport(result, prCfg, prProfile, fingerprint), outcome, prCfg.gate);
}
