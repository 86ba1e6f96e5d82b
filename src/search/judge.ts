/**
 * Whether a trained network meets the target: decided on the judging rows alone, which no
 * training ever reads (they do not stop a training, pick a restart or accept a pruning step).
 * Without judging rows the validation rows judge, and without those the training rows.
 *
 * A network meets the target when, in the form target.precision names (float32, or the int8
 * form the exported C runs, quantised as src/device/quantize.ts does), its metric meets the
 * threshold on those rows and every class with a recall floor (target.min-recall) reaches it.
 */
import { meetsThreshold } from '../common/metric.js';
import type { TargetConfig } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import { int8Forward, quantizeNetwork } from '../device/index.js';
import { classesOn, metricOn, type NetworkJson, type TrainRecord } from '../nn/index.js';
import { confusion, metricOfPredictions, recalls, precisions, recallsHold } from './classes.js';
import type { Appraisal, Judged, JudgingRows } from './types.js';

export function judgingRowsOf(data: EncodedDataset, folded: boolean): JudgingRows {
  if (data.judgingRows > 0) return { on: 'judging', rows: data.judgingRows, folded };
  if (data.validationRows > 0) return { on: 'validation', rows: data.validationRows, folded };
  return { on: 'training', rows: data.trainRows, folded };
}

/** The encoded rows that judge, with their targets (classes, or standardised values). */
function judgedRows(data: EncodedDataset): { x: Float64Array; y: Float64Array; rows: number } {
  if (data.judgingRows > 0) return { x: data.xJudging, y: data.yJudging, rows: data.judgingRows };
  if (data.validationRows > 0) return { x: data.xValidation, y: data.yValidation, rows: data.validationRows };
  return { x: data.xTrain, y: data.yTrain, rows: data.trainRows };
}

/** Everything the screens show about a network on the rows that judge. `withInt8` computes the int8 form even when float32 decides. */
export function appraise(data: EncodedDataset, net: NetworkJson, target: TargetConfig, withInt8: boolean): Appraisal {
  const { x, y, rows } = judgedRows(data);
  const std = data.encoding.target.std;
  const float32 = metricOn(net, x, y, rows, target.metric, std);
  const int8Decides = target.precision === 'int8';
  let int8: number | null = null;
  let int8Classes: Int32Array | null = null;
  if ((withInt8 || int8Decides) && data.rawJudged !== undefined) {
    const q = quantizeNetwork(net, data.encoding, { x: data.xTrain, rows: data.trainRows });
    const out = int8Forward(q, data.rawJudged, rows);
    if (data.task === 'classification') {
      int8Classes = out.classes;
      int8 = metricOfPredictions(target.metric, out.classes, y);
    } else {
      const t = data.encoding.target;
      int8 = metricOfPredictions(
        target.metric,
        out.outputs,
        Float64Array.from(y, (v) => v * t.std + t.mean),
      );
    }
  }
  if (int8Decides && int8 === null)
    throw new Error('target.precision is int8, but the dataset has no raw rows to run the int8 form on');
  const deciding = int8Decides ? (int8 as number) : float32;
  let counts: number[][] | null = null;
  if (data.task === 'classification') {
    const predicted = int8Decides ? (int8Classes as Int32Array) : classesOn(net, x, rows);
    counts = confusion(predicted, y, data.encoding.target.classes?.length ?? 2);
  }
  const floors = target.recallFloors ?? null;
  const recallOk = floors === null || counts === null || recallsHold(counts, floors);
  return {
    float32,
    int8,
    confusion: counts,
    recall: counts === null ? null : recalls(counts),
    precision: counts === null ? null : precisions(counts),
    deciding,
    met: meetsThreshold(deciding, target) && recallOk,
  };
}

/** The record of a finished training, with its judgement on the rows that judge added. */
export function judge(data: EncodedDataset, net: NetworkJson | null, rec: TrainRecord, target: TargetConfig): Judged {
  const diverged = rec.stop === 'diverged' || net === null;
  const a = diverged ? null : appraise(data, net, target, false);
  return {
    train: rec.trainMetric,
    steering: rec.steeringMetric,
    judged: a === null ? Number.NaN : a.deciding,
    reached: !diverged && meetsThreshold(rec.steeringMetric, target),
    met: a !== null && a.met,
  };
}
