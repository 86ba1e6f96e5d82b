/**
 * The one definition of an adequate width, applied: a width is adequate when at least `required`
 * distinct networks of that width met the target on the judging rows, counting fresh restarts at
 * that width and networks pruned down to it from a larger width. The headline is the smallest
 * adequate width; its witness is the network of that width that did best on the steering rows
 * (the judging rows decide whether a network counts, never which one is shown).
 */
import { isBetter } from '../common/metric.js';
import type { TargetConfig } from '../config/types.js';
import type { NetworkJson } from '../nn/index.js';
import type { RestartAtWidth } from './growth.js';
import type { PruneResult } from './task.js';
import type { GrowthPlan, Judged, TrainingTask, WidthSummary, Witness } from './types.js';
import { wilsonInterval } from './wilson.js';

interface Candidate extends Judged {
  width: number;
  network: NetworkJson;
  source: TrainingTask;
  how: 'fresh' | 'pruned';
}

export interface Tally {
  widths: WidthSummary[];
  /** Smallest adequate width, or null. */
  width: number | null;
  /** At the smallest adequate width; else the best network that met the target at any width; else null. */
  witness: Witness | null;
}

/** @testOnly */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 === 1 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

/** The n-th best finite value (1 = the best), or null when fewer than n are finite. */
function nthBest(values: number[], n: number, target: TargetConfig): number | null {
  const finite = values
    .filter(Number.isFinite)
    .sort((a, b) => (isBetter(target.metric, a, b) ? -1 : isBetter(target.metric, b, a) ? 1 : 0));
  return finite.length >= n ? finite[n - 1] : null;
}

function bestOf(values: number[], target: TargetConfig): number | null {
  let best: number | null = null;
  for (const v of values) if (Number.isFinite(v) && (best === null || isBetter(target.metric, v, best))) best = v;
  return best;
}

/** Better witness first: steering metric, then fresh before pruned, then narrower source, then lower restart. */
function beats(a: Candidate, b: Candidate, target: TargetConfig): boolean {
  if (isBetter(target.metric, a.steering, b.steering)) return true;
  if (isBetter(target.metric, b.steering, a.steering)) return false;
  if (a.how !== b.how) return a.how === 'fresh';
  if (a.source.width !== b.source.width) return a.source.width < b.source.width;
  return a.source.restart < b.source.restart;
}

function pick(candidates: Candidate[], target: TargetConfig): Candidate | null {
  let best: Candidate | null = null;
  for (const c of candidates) if (c.met && (best === null || beats(c, best, target))) best = c;
  return best;
}

export function tally(
  plan: GrowthPlan,
  target: TargetConfig,
  tried: readonly { width: number; restarts: RestartAtWidth[] }[],
  pruned: readonly PruneResult[],
  seed: number,
): Tally {
  const fresh = new Map(tried.map((t) => [t.width, t.restarts]));
  const links = new Map<number, Candidate[]>();
  for (const r of pruned) {
    for (const link of r.chain) {
      const list = links.get(link.width) ?? [];
      list.push({ ...link, source: r.source, how: 'pruned' });
      links.set(link.width, list);
    }
  }
  const widthList = [...new Set([...fresh.keys(), ...links.keys()])].sort((a, b) => a - b);
  const widths: WidthSummary[] = [];
  const candidatesAt = new Map<number, Candidate[]>();
  for (const w of widthList) {
    const runs = fresh.get(w) ?? [];
    const prunedHere = links.get(w) ?? [];
    const freshCandidates: Candidate[] = runs
      .filter((r) => r.met && r.network !== null)
      .map((r) => ({ ...r, width: w, network: r.network!, source: r.task, how: 'fresh' }));
    candidatesAt.set(w, [...freshCandidates, ...prunedHere]);
    const freshMet = freshCandidates.length;
    const prunedMet = prunedHere.filter((c) => c.met).length;
    const all = [...runs, ...prunedHere];
    widths.push({
      width: w,
      restarts: runs.length,
      reached: runs.filter((r) => r.reached).length,
      met: freshMet + prunedMet,
      metBy: { fresh: freshMet, pruned: prunedMet },
      adequate: freshMet + prunedMet >= plan.required,
      best: bestOf(
        all.map((r) => r.judged),
        target,
      ),
      decisive: nthBest(
        all.map((r) => r.judged),
        plan.required,
        target,
      ),
      bestTrain: bestOf(
        all.map((r) => r.train),
        target,
      ),
      median: median(runs.map((r) => r.judged).filter(Number.isFinite)),
      wilson: wilsonInterval(freshMet, runs.length),
      medianEpochs: median(runs.map((r) => r.epochs)) ?? 0,
      diverged: runs.filter((r) => r.stop === 'diverged').length,
    });
  }
  const width = widths.find((w) => w.adequate)?.width ?? null;
  let chosen: Candidate | null = null;
  if (width !== null) chosen = pick(candidatesAt.get(width) ?? [], target);
  else for (const w of widthList) chosen ??= pick(candidatesAt.get(w) ?? [], target);
  return { widths, width, witness: chosen === null ? null : witnessOf(chosen, seed) };
}

function witnessOf(c: Candidate, seed: number): Witness {
  return {
    source: c.source,
    seed,
    how: c.how,
    network: c.network,
    train: c.train,
    steering: c.steering,
    judged: c.judged,
    reached: c.reached,
    met: c.met,
  };
}
