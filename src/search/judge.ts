/**
 * Whether a trained network meets the target: decided on the judging rows alone, which no
 * training ever reads (they do not stop a training, pick a restart or accept a pruning step).
 * Without judging rows the validation rows judge, and without those the training rows.
 */
import { meetsThreshold } from '../common/metric.js';
import type { TargetConfig } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import { metricOn, type NetworkJson, type TrainRecord } from '../nn/index.js';
import type { Judged, JudgingRows } from './types.js';

export function judgingRowsOf(data: EncodedDataset, folded: boolean): JudgingRows {
  if (data.judgingRows > 0) return { on: 'judging', rows: data.judgingRows, folded };
  if (data.validationRows > 0) return { on: 'validation', rows: data.validationRows, folded };
  return { on: 'training', rows: data.trainRows, folded };
}

/** The judged metric of `net`. */
function judgedMetric(data: EncodedDataset, net: NetworkJson, target: TargetConfig): number {
  const std = data.encoding.target.std;
  if (data.judgingRows > 0) return metricOn(net, data.xJudging, data.yJudging, data.judgingRows, target.metric, std);
  if (data.validationRows > 0)
    return metricOn(net, data.xValidation, data.yValidation, data.validationRows, target.metric, std);
  return metricOn(net, data.xTrain, data.yTrain, data.trainRows, target.metric, std);
}

/** The record of a finished training, with the judged metric added. */
export function judge(data: EncodedDataset, net: NetworkJson | null, rec: TrainRecord, target: TargetConfig): Judged {
  const diverged = rec.stop === 'diverged' || net === null;
  const judged = diverged ? Number.NaN : judgedMetric(data, net, target);
  return {
    train: rec.trainMetric,
    steering: rec.steeringMetric,
    judged,
    reached: !diverged && meetsThreshold(rec.steeringMetric, target),
    met: !diverged && meetsThreshold(judged, target),
  };
}
