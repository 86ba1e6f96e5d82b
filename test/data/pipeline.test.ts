import { describe, expect, it } from 'vitest';
import { loadData } from '../../src/data/index.js';
import { UserError } from '../../src/common/errors.js';
import { tempDir, withFile } from './make-config.js';

type Extra = Record<string, unknown>;

async function load(content: string | Uint8Array, extra: Extra = {}) {
  return loadData(withFile(tempDir(), 'd.csv', content, { target: 'y', validation: 0, ...extra }));
}

async function failure(content: string | Uint8Array, extra: Extra = {}): Promise<UserError> {
  try {
    await load(content, extra);
  } catch (e) {
    if (e instanceof UserError) return e;
    throw e;
  }
  throw new Error('expected a UserError');
}

describe('encoding', () => {
  it('one-hot encodes categories in sorted order and keeps numeric inputs in column order', async () => {
    const d = (await load('a,kind,y\n1,zeta,p\n2,alpha,q\n3,mid,p\n4,alpha,q\n')).dataset;
    expect(d.inputs).toBe(4);
    expect(d.encoding.features).toMatchObject([
      { kind: 'numeric', name: 'a' },
      { kind: 'categorical', name: 'kind', categories: ['alpha', 'mid', 'zeta'] },
    ]);
    const oneHot = (r: number) => Array.from(d.xTrain.subarray(r * 4 + 1, r * 4 + 4));
    expect([0, 1, 2, 3].map(oneHot)).toEqual([
      [0, 0, 1],
      [1, 0, 0],
      [0, 1, 0],
      [1, 0, 0],
    ]);
    // Two classes: one logistic output; class indices follow the sorted labels.
    expect(d.outputs).toBe(1);
    expect(Array.from(d.yTrain)).toEqual([0, 1, 0, 1]);
  });

  it('leaves a constant feature centred instead of dividing by zero', async () => {
    const d = (await load('a,b,y\n5,1,p\n5,2,q\n5,3,p\n')).dataset;
    expect(Array.from(d.xTrain).filter((_, i) => i % 2 === 0)).toEqual([0, 0, 0]);
    expect(d.encoding.features[0]).toMatchObject({ kind: 'numeric', mean: 5, std: 1 });
    expect(d.xTrain.every((v) => Number.isFinite(v))).toBe(true);
  });

  it('standardises a regression target and can report it back in original units', async () => {
    const rows = Array.from({ length: 40 }, (_, i) => `${i},${(i * 0.37).toFixed(2)}`).join('\n');
    const data = await load(`a,y\n${rows}\n`, { validation: 0.25 });
    const d = data.dataset;
    expect(d.task).toBe('regression');
    expect(d.outputs).toBe(1);
    const t = d.encoding.target;
    let sum = 0;
    for (const v of d.yTrain) sum += v;
    expect(sum / d.trainRows).toBeCloseTo(0, 12);
    const back = Array.from(d.yValidation, (v) => v * t.std + t.mean);
    const rowsBack = Array.from(data.splitRows?.validation ?? [], (r) => Number((r * 0.37).toFixed(2)));
    back.forEach((v, i) => expect(v).toBeCloseTo(rowsBack[i], 10));
  });

  it('task auto: text → classification, few numbers → classification, many → regression', async () => {
    expect((await load('a,y\n1,0\n2,1\n3,2\n4,0\n')).dataset).toMatchObject({ task: 'classification', outputs: 3 });
    const eleven = Array.from({ length: 11 }, (_, i) => `${i},${i}`).join('\n');
    expect((await load(`a,y\n${eleven}\n`)).dataset.task).toBe('regression');
    const ten = Array.from({ length: 20 }, (_, i) => `${i},${i % 10}`).join('\n');
    expect((await load(`a,y\n${ten}\n`)).dataset.task).toBe('classification');
    // Numeric labels sort by value, not by spelling.
    const d = (await load('a,y\n1,10\n2,9\n3,10\n4,9.5\n')).dataset;
    expect(d.encoding.target.classes).toEqual(['9', '9.5', '10']);
    expect((await load(`a,y\n${eleven}\n`, { task: 'classification' })).dataset.outputs).toBe(11);
  });

  it('uses data.features in the order given and honours data.ignore', async () => {
    const d = (await load('id,a,b,c,y\n1,1,2,3,p\n2,4,5,6,q\n', { features: ['c', 'a'] })).dataset;
    expect(d.encoding.features.map((f) => f.name)).toEqual(['c', 'a']);
    const e = (await load('id,a,b,y\n1,1,2,p\n2,4,5,q\n', { ignore: ['id'] })).dataset;
    expect(e.encoding.features.map((f) => f.name)).toEqual(['a', 'b']);
  });

  it('reads another delimiter, a BOM, CRLF and quoted fields', async () => {
    const data = await load('\uFEFFa;"b c";y\r\n"1,5";x;p\r\n"2,5";"x; y";q\r\n', {
      delimiter: ';',
      task: 'classification',
    });
    expect(data.profile.columns).toEqual(['a', 'b c', 'y']);
    expect(data.profile.features['b c']).toEqual({ kind: 'categorical', counts: { x: 1, 'x; y': 1 }, missing: 0 });
    // "1,5" (a decimal comma) is not plain decimal notation, so column a is text.
    expect(data.profile.features.a.kind).toBe('categorical');
  });

  it('drops rows with a missing feature when asked, and counts them', async () => {
    const data = await load('a,b,y\n1,,p\n2,3,q\n,,p\n4,5,p\n6,7,q\n', { missing: 'drop' });
    expect(data.rows).toBe(3);
    expect(data.droppedRows).toBe(2);
    expect(data.profile.features.a).toMatchObject({ missing: 1, min: 2, max: 6 });
    expect(data.profile.features.b).toMatchObject({ missing: 2 });
  });
});

describe('messages point where an editor would', () => {
  it('counts lines across quoted line breaks, CRLF ones included, and blank lines', async () => {
    const text = 'a,b,y\r\n1,"two\r\nlines",p\r\n\r\n2,"x",q\r\nbad,"three\nline\nvalue",p\r\n';
    const e = await failure(text, { features: ['a'] });
    expect(e.message).toMatch(/^d\.csv:6:1: column 1 "a": expected a number, found "bad"/);
    expect([e.line, e.column]).toEqual([6, 1]);
  });

  it('names the value and the row of a stray text in a numeric column', async () => {
    const e = await failure('a,b,y\n1,2,p\n3,n/a,q\n5,6,p\n');
    expect(e.message).toContain('d.csv:3:2');
    expect(e.message).toContain('"n/a"');
    expect(e.message).toContain('column 2 "b"');
  });

  it('suggests the nearest column name', async () => {
    const e = await failure('rms,kurtosis,condition\n1,2,p\n', { target: 'conditon' });
    expect(e.message).toContain('did you mean "condition"');
    expect(e.key).toBe('data.target');
  });

  it('refuses a categorical column over the cap, naming the count', async () => {
    const rows = Array.from({ length: 8 }, (_, i) => `${i},tag${i},${i % 2}`).join('\n');
    const e = await failure(`a,tag,y\n${rows}\n`, { maxCategories: 5 });
    expect(e.message).toMatch(/^d\.csv:7:2: column 2 "tag" is text with 8 distinct values; .*at most 5/);
  });

  it('refuses invalid UTF-8 bytes split across the stream, pointing at the line', async () => {
    const head = Buffer.from('a,b,y\n' + '1,2,p\n'.repeat(200_000));
    const bytes = Buffer.concat([head, Buffer.from('3,'), Buffer.from([0xe2, 0x28, 0xa1]), Buffer.from(',q\n')]);
    const e = await failure(bytes);
    expect([e.line, e.column]).toEqual([200_002, 2]);
    expect(e.message).toContain('column 2 "b"');
  });

  it('accepts valid multi-byte text', async () => {
    const data = await load('temp,site,y\n1,Zürich,p\n2,東京,q\n3,🙂,p\n');
    expect(Object.keys((data.profile.features.site as { counts: object }).counts)).toEqual(['Zürich', '東京', '🙂']);
  });
});
