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

function splitLine(config: Config, report: ReportDraft): string {
  const d = report.data;
  if (d.validationRows === 0) return `${d.trainRows} training rows, judged on themselves (data.validation is 0)`;
  const how = d.task === 'classification' ? 'stratified by class, ' : '';
  return `${d.trainRows} training / ${d.validationRows} validation (${how}seed ${config.search.seed})`;
}

export function dataSummaryText(config: Config, data: LoadedData, report: ReportDraft): string {
  const d = report.data;
  const rows: [string, string][] = [
    ['config', plain(displayPath(config.root, config.file))],
    ['data', plain(d.file)],
    ['rows', `${d.rows} used${d.droppedRows > 0 ? `, ${d.droppedRows} dropped for missing values` : ''}`],
    ['split', splitLine(config, report)],
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
