import { describe, expect, it } from 'vitest';
import { escapeText } from '../../src/common/escape.js';
import { baselineRecordLine } from '../../src/report/baseline-record.js';
import { HOSTILE_FILE_NAMES, rawControlLines } from '../helpers/hostile.js';

describe('the baseline line', () => {
  it('names the file, the width and the history entries, in the singular for one', () => {
    expect(baselineRecordLine({ file: 'gates/pump.json', width: 3, historyEntries: 1 })).toBe(
      'baseline written: gates/pump.json, width 3, 1 history entry',
    );
    expect(baselineRecordLine({ file: 'neuron-budget.baseline.json', width: 12, historyEntries: 100 })).toBe(
      'baseline written: neuron-budget.baseline.json, width 12, 100 history entries',
    );
    expect(baselineRecordLine({ notWritten: 'no width reached the target' })).toBe(
      'baseline not written: no width reached the target',
    );
  });

  it('holds a hostile file name escaped, on one line', () => {
    for (const name of HOSTILE_FILE_NAMES) {
      const line = baselineRecordLine({ file: name, width: 2, historyEntries: 2 });
      expect(line).toBe(`baseline written: ${escapeText(name)}, width 2, 2 history entries`);
      expect(line.split('\n')).toHaveLength(1);
      expect(rawControlLines(line, 'line')).toEqual([]);
    }
  });
});
