/**
 * Hostile strings, as whoever opens a pull request can put them into a data file (class
 * labels, column names, categories), a file name or the config, and the checks that what the
 * command line and the action print holds them inert. Shared by the end-to-end tests of both
 * bundles (test/cli/hostile.test.ts, test/github/hostile-e2e.test.ts).
 *
 * The data built here are invented for the tests (pump sites and readings), not measurements.
 */

/** Line breaks of every kind, a workflow command of every family, ANSI, bidi, NUL, very long. */
export const HOSTILE: readonly string[] = [
  'pos\n::error file=evil.yml,line=1::INJECTED\x1b[31mRED', // the issue's own example
  'lf\n::warning::lf',
  'cr\r::notice::cr',
  'crlf\r\n::debug::crlf',
  'nel\u0085::group::nel',
  'ls\u2028::endgroup::ls',
  'ps\u2029::add-mask::ps',
  '::stop-commands::hijack',
  '::set-output name=verdict::pass',
  '::set-env name=NODE_OPTIONS::--require=evil.js',
  '::add-path::/tmp/evil',
  '::save-state name=token::stolen',
  '::echo::on',
  '::error title=forged::forged annotation',
  '\x1b[2J\x1b[H\x1b[31mclear and red\x1b[0m',
  '\x1b]0;retitled\x07osc',
  '\u009b31mC1 CSI',
  'bidi \u202eevil\u202c and \u2066isolate\u2069',
  'tab\tvt\x0bff\x0cbell\x07del\x7f',
  '<img src=x onerror=alert(1)> @someone #1 [x](https://evil.example)',
  '%0A::error::percent',
  '  ::warning::indented',
  '\u200b::notice::zero width',
  '\ufeff::error::byte order mark',
];

/** Strings that only reach messages: NUL (no text file holds one) and very long ones. */
export const HOSTILE_MESSAGES: readonly string[] = [
  'nul\u0000::error::nul',
  `${'x'.repeat(5000)}\n::error::late`,
  `${'\u{1F600}'.repeat(3000)}\n::warning::astral`,
];

/** Every string of the corpus. */
export const CORPUS: readonly string[] = [...HOSTILE, ...HOSTILE_MESSAGES];

/** File names from the corpus: no "/" or NUL, at most 255 bytes. */
export const HOSTILE_FILE_NAMES: readonly string[] = HOSTILE.filter(
  (s) => !s.includes('/') && Buffer.byteLength(s) < 200,
).map((s, i) => `${i}-${s}`);

/**
 * A raw control character (C0 but the line break, DEL, C1), another kind of line break, or an
 * invisible or bidirectional formatting character: none may reach a log line or a screen.
 */
const RAW =
  /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u00ad\u061c\u200b-\u200f\u2028\u2029\u202a-\u202e\u2060-\u2069\ufeff]/u;

/** Lines of `text` holding a raw control or invisible character, with where. */
export function rawControlLines(text: string, what: string): string[] {
  return text
    .split('\n')
    .map((line, i) => ({ line, i }))
    .filter(({ line }) => RAW.test(line))
    .map(({ line, i }) => `${what} line ${i + 1}: ${JSON.stringify(line.slice(0, 160))}`);
}

/** Lines the runner would read as a workflow command (it trims leading whitespace first). */
export function commandLines(stdout: string): string[] {
  return stdout.split('\n').filter((line) => line.trimStart().startsWith('::'));
}

/** A CSV cell: always quoted, inner quotes doubled. */
export function cell(s: string): string {
  return `"${s.replace(/"/g, '""')}"`;
}

export function csv(header: readonly string[], rows: readonly (readonly (string | number)[])[]): string {
  return [header, ...rows].map((r) => r.map((v) => cell(String(v))).join(',')).join('\n') + '\n';
}

/** A YAML double-quoted scalar with everything outside printable ASCII escaped. */
export function yamlString(s: string): string {
  let out = '"';
  for (const ch of s) {
    const c = ch.codePointAt(0)!;
    if (ch === '"' || ch === '\\') out += `\\${ch}`;
    else if (c >= 0x20 && c < 0x7f) out += ch;
    else if (c <= 0xffff) out += `\\u${c.toString(16).padStart(4, '0')}`;
    else out += `\\U${c.toString(16).padStart(8, '0')}`;
  }
  return `${out}"`;
}

/** Whitespace runs as one space: text wrapped at 80 columns compares with the unwrapped string. */
export function squash(s: string): string {
  return s.replace(/\s+/g, ' ');
}

export interface HostileTable {
  /** Column names: features in file order, then the target. */
  header: string[];
  target: string;
  categorical: string;
  numeric: string[];
  labels: string[];
  categories: string[];
  csv: string;
}

/**
 * An invented table whose every string is hostile: class labels, the categorical column's
 * values, and every column name. Two rows per class; one numeric column carries the class
 * index, so a small network tells the classes apart (enough for a low accuracy target).
 * `variant` 1 is the pull request's version: some classes, categories and columns are gone,
 * others new, and one column's mean moved.
 */
export function hostileTable(variant: 0 | 1 = 0): HostileTable {
  const strings = [...HOSTILE];
  const target = strings[5];
  const categorical = strings[10];
  const names = strings.filter((s) => s !== target && s !== categorical);
  let numeric = names.slice(0, 8);
  let labels = [...strings];
  let categories = [...strings];
  if (variant === 1) {
    numeric = [...names.slice(1, 8), `added\n::error::${names[0]}`];
    labels = [...strings.slice(3), ...strings.slice(0, 3).map((s) => `new ${s}`)];
    categories = [...strings.slice(2), `new\r::warning::${strings[0]}`];
  }
  const header = [...numeric, categorical, target];
  const rows: (string | number)[][] = [];
  labels.forEach((label, k) => {
    for (let r = 0; r < 2; r++) {
      const values = numeric.map((_, j) =>
        j === 0 ? k + r * 0.25 : ((k * 7 + j * 3 + r) % 11) + (variant === 1 && j === 1 ? 40 : 0),
      );
      rows.push([...values, categories[(k + r) % categories.length], label]);
    }
  });
  return { header, target, categorical, numeric, labels, categories, csv: csv(header, rows) };
}

/** The config for hostileTable: every repository string in it YAML-escaped. */
export function hostileConfig(dataPath: string, table: HostileTable, opts: { listFeatures?: boolean } = {}): string {
  return [
    'data:',
    `  path: ${yamlString(dataPath)}`,
    `  target: ${yamlString(table.target)}`,
    ...(opts.listFeatures ? [`  features: [${[...table.numeric, table.categorical].map(yamlString).join(', ')}]`] : []),
    '  validation: 0',
    '  max-categories: 40',
    'target:',
    '  metric: accuracy',
    '  threshold: 0.2',
    'search:',
    '  min-width: 1',
    '  max-width: 3',
    '  restarts: 2',
    '  required: 1',
    '  max-epochs: 300',
    '  seed: 5',
    '  workers: 1',
    'gate:',
    '  baseline: neuron-budget.baseline.json',
    '',
  ].join('\n');
}
