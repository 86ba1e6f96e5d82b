/** The data summary the job logs before the search: what was read, how it was split and encoded. */
import type { Config } from '../config/types.js';
import type { LoadedData } from '../data/types.js';
import { escapeText as plain } from '../common/escape.js';
import { targetShort } from '../common/format.js';
import { displayPath } from '../common/paths.js';
import { TOOL_NAME, TOOL_VERSION } from '../version.js';
import type { ReportDraft } from './types.js';

/** Class labels are padded into a column; a longer one is clipped so one label cannot widen every line. */
const LABEL_SHOWN = 40;

function inputsLine(data: LoadedData): string {
  const features = data.dataset.encoding.features;
  const numeric = features.filter((f) => f.kind === 'numeric').length;
  const categorical = features.filter((f) => f.kind === 'categorical');
  const parts = [`${numeric} numeric`];
  if (categorical.length > 0) {
    const oneHot = categorical
      .map((f) => (f.kind === 'categorical' ? `${plain(f.name, 60)} → ${f.categories.length}` : ''))
      .join(', ');
    parts.push(`${categorical.length} categorical (${oneHot})`);
  }
  return `${data.dataset.inputs} after encoding: ${parts.join(', ')}`;
}

function splitLine(config: Config, report: ReportDraft, data: LoadedData): string {
  const d = report.data;
  const how = `${d.task === 'classification' ? 'stratified by class, ' : ''}seed ${config.search.seed}`;
  if (d.validationRows === 0 && d.judgingRows === 0) {
    return `${d.trainRows} training rows, steered and judged on themselves (data.validation is 0)`;
  }
  const parts = [`${d.trainRows} training`];
  if (d.validationRows > 0) parts.push(`${d.validationRows} validation`);
  if (d.judgingRows > 0) parts.push(`${d.judgingRows} judging`);
  const folded = data.judgingFolded ? '; a class is too small for judging rows, so the validation rows judge' : '';
  const optimistic =
    d.judgingRows === 0 && !data.judgingFolded ? '; judged on the validation rows (data.judging is 0)' : '';
  return `${parts.join(' / ')} (${how})${folded}${optimistic}`;
}

export function dataSummaryText(config: Config, data: LoadedData, report: ReportDraft): string {
  const d = report.data;
  const rows: [string, string][] = [
    ['config', plain(displayPath(config.root, config.file))],
    ['data', plain(d.file)],
    ['rows', `${d.rows} used${d.droppedRows > 0 ? `, ${d.droppedRows} dropped for missing values` : ''}`],
    ['split', splitLine(config, report, data)],
    ['inputs', inputsLine(data)],
    [
      'task',
      `${d.task}${d.classes ? `, ${d.classes.length} classes` : ''}; ${d.outputs} network output${d.outputs === 1 ? '' : 's'}`,
    ],
  ];
  if (d.classes) {
    const labels = d.classes.map((c) => plain(c.label, LABEL_SHOWN));
    const width = Math.max(...labels.map((l) => l.length));
    d.classes.forEach((c, i) => {
      const share = ((100 * c.count) / d.rows).toFixed(1);
      rows.push([
        i === 0 ? 'classes' : '',
        `${labels[i].padEnd(width)}  ${String(c.count).padStart(7)}  ${share.padStart(5)}%`,
      ]);
    });
  }
  rows.push(['target', targetShort(report.metric.name, report.metric.threshold)]);
  rows.push(['fingerprint', d.fingerprint]);
  const body = rows.map(([k, v]) => `  ${k.padEnd(12)}${v}`).join('\n');
  return `${TOOL_NAME} ${TOOL_VERSION} · data summary\n${body}`;
}
