// Picture of the example pull-request comment: docs/example-comment.md → HTML styled like a
// rendered GitHub comment, every <details> opened, every ```mermaid block drawn by the mermaid
// package → a PNG taken by headless Chromium (Debian's `chromium`).
//
//   npm run screenshot:comment [-- --in FILE] [-- --out FILE.png] [-- --chromium PATH]
//
// Prints one JSON line: the picture's size and, per mermaid block, whether it rendered to an
// svg. Exits 1 when any block failed, 2 on bad arguments or a missing browser. The PNG carries
// a tEXt chunk with the SHA-256 of the markdown it shows, so a test can tell a stale picture.
//
// Chromium is driven over its DevTools pipe (--remote-debugging-pipe: JSON messages ending in
// NUL on file descriptors 3 and 4), which needs no client library.
import { spawn } from 'node:child_process';
import { createHash, randomBytes } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import MarkdownIt from 'markdown-it';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
/** CSS pixels of the page: about the width GitHub gives a comment body on a desktop screen. */
const PAGE_WIDTH = 900;
const TIMEOUT_MS = 90_000;
const SOURCE_KEYWORD = 'neuron-budget source';

function usage(message) {
  process.stderr.write(`screenshot-comment: ${message}\n`);
  process.exit(2);
}

function parseArgs(argv) {
  const opts = {
    input: join(root, 'docs/example-comment.md'),
    output: join(root, 'docs/example-comment.png'),
    chromium: process.env.NEURON_BUDGET_CHROMIUM || '/usr/bin/chromium',
  };
  for (let i = 0; i < argv.length; i += 2) {
    const [flag, value] = [argv[i], argv[i + 1]];
    if (value === undefined) usage(`${flag} needs a value`);
    if (flag === '--in') opts.input = resolve(value);
    else if (flag === '--out') opts.output = resolve(value);
    else if (flag === '--chromium') opts.chromium = value;
    else usage(`unknown option ${flag} (expected --in, --out or --chromium)`);
  }
  if (!existsSync(opts.input)) usage(`no such file: ${opts.input}`);
  if (!existsSync(opts.chromium))
    usage(`no Chromium at ${opts.chromium}: install it (apt-get install -y chromium) or pass --chromium PATH`);
  return opts;
}

// The stylesheet imitates how GitHub renders Markdown in a comment (fonts, tables, code, rules),
// so the picture shows what a reviewer sees; it is written here, not copied from anywhere.
const CSS = `
body { margin: 0; background: #fff; color: #1f2328; font: 14px/1.5 -apple-system, "Segoe UI", "Noto Sans",
  Helvetica, "Liberation Sans", Arial, sans-serif; }
.comment { box-sizing: border-box; width: ${PAGE_WIDTH - 32}px; margin: 16px; padding: 16px;
  border: 1px solid #d1d9e0; border-radius: 6px; word-wrap: break-word; }
.comment > :first-child { margin-top: 0; }
h1, h2, h3, h4 { margin: 24px 0 16px; font-weight: 600; line-height: 1.25; }
h1 { font-size: 2em; padding-bottom: .3em; border-bottom: 1px solid #d1d9e0; }
h3 { font-size: 1.25em; } h4 { font-size: 1em; }
p, ul, ol, table, pre, details, blockquote { margin: 0 0 16px; }
ul, ol { padding-left: 2em; } li + li { margin-top: .25em; }
hr { height: .25em; margin: 24px 0; padding: 0; background: #d1d9e0; border: 0; }
blockquote { padding: 0 1em; color: #59636e; border-left: .25em solid #d1d9e0; }
table { display: block; width: max-content; max-width: 100%; overflow: auto; border-collapse: collapse; }
th, td { padding: 6px 13px; border: 1px solid #d1d9e0; } th { font-weight: 600; }
tr:nth-child(2n) { background: #f6f8fa; }
code { padding: .2em .4em; font: 85%/1.45 ui-monospace, "SFMono-Regular", Menlo, Consolas, "Liberation Mono",
  "DejaVu Sans Mono", monospace; background: rgba(129, 139, 151, .12); border-radius: 6px; }
pre { padding: 16px; overflow: auto; background: #f6f8fa; border-radius: 6px; }
pre code { padding: 0; background: none; font-size: 85%; }
summary { cursor: pointer; margin-bottom: 8px; }
.chart { margin: 0 0 16px; text-align: center; }
.chart-error { padding: 16px; color: #d1242f; border: 1px solid #d1242f; border-radius: 6px; text-align: left; }
`;

// Runs in the page: open the collapsed evidence, draw each mermaid block, report what happened.
const PAGE_SCRIPT = `
window.__result = (async () => {
  const details = [...document.querySelectorAll('details')];
  for (const d of details) d.open = true;
  mermaid.initialize({ startOnLoad: false, securityLevel: 'strict', theme: 'default' });
  const blocks = [];
  const codes = [...document.querySelectorAll('pre > code.language-mermaid')];
  for (const [index, code] of codes.entries()) {
    const box = document.createElement('div');
    box.className = 'chart';
    code.parentElement.replaceWith(box);
    let error = null;
    try {
      const { svg } = await mermaid.render('chart-' + index, code.textContent);
      box.innerHTML = svg;
    } catch (e) {
      error = String((e && e.message) || e);
      box.className += ' chart-error';
      box.textContent = 'mermaid could not draw this block: ' + error;
    }
    const el = box.querySelector('svg');
    const r = el ? el.getBoundingClientRect() : { width: 0, height: 0 };
    if (!error && !el) error = 'no svg';
    if (!error && el.querySelector('.error-icon, .error-text')) error = 'mermaid drew its error picture';
    if (!error && (r.width < 100 || r.height < 100)) error = 'svg of ' + r.width + ' x ' + r.height + ' px';
    blocks.push({ index, type: el ? el.getAttribute('aria-roledescription') : null,
      width: Math.round(r.width), height: Math.round(r.height), error });
  }
  await document.fonts.ready;
  return { details: details.length, open: details.filter((d) => d.open).length, blocks,
    width: document.documentElement.scrollWidth, height: document.documentElement.scrollHeight };
})();
`;

function page(markdownHtml, mermaidUrl, nonce) {
  // Only the two scripts carrying this run's nonce may run: a <script> or an event handler that
  // came in with the markdown stays inert.
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="script-src 'nonce-${nonce}'">
<title>example comment</title><style>${CSS}</style></head>
<body><div class="comment">${markdownHtml}</div>
<script nonce="${nonce}" src="${mermaidUrl}"></script>
<script nonce="${nonce}">${PAGE_SCRIPT}</script>
</body></html>
`;
}

/** A minimal DevTools client over the pipe Chromium opens with --remote-debugging-pipe. */
function devtools(child) {
  let nextId = 1;
  let buffer = '';
  const waiting = new Map();
  child.stdio[4].on('data', (chunk) => {
    buffer += chunk.toString('utf8');
    let end;
    while ((end = buffer.indexOf('\0')) >= 0) {
      const message = JSON.parse(buffer.slice(0, end));
      buffer = buffer.slice(end + 1);
      const w = message.id !== undefined ? waiting.get(message.id) : undefined;
      if (!w) continue;
      waiting.delete(message.id);
      if (message.error) w.reject(new Error(`${w.method}: ${message.error.message}`));
      else w.resolve(message.result);
    }
  });
  return (method, params = {}, sessionId) =>
    new Promise((resolve, reject) => {
      const id = nextId++;
      waiting.set(id, { resolve, reject, method });
      child.stdio[3].write(`${JSON.stringify({ id, method, params, ...(sessionId ? { sessionId } : {}) })}\0`);
    });
}

async function shoot(opts, htmlFile) {
  const profile = join(dirname(htmlFile), 'profile');
  const args = [
    '--headless',
    '--remote-debugging-pipe',
    `--user-data-dir=${profile}`,
    '--no-first-run',
    '--no-default-browser-check',
    '--disable-gpu',
    '--disable-extensions',
    '--hide-scrollbars',
    '--mute-audio',
    // Root (CI, containers) cannot use Chromium's sandbox; the page is our own local file.
    ...(process.getuid?.() === 0 ? ['--no-sandbox'] : []),
    'about:blank',
  ];
  const child = spawn(opts.chromium, args, { stdio: ['ignore', 'ignore', 'pipe', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d) => (stderr = (stderr + d.toString('utf8')).slice(-4000)));
  let done = false;
  const gone = new Promise((resolve) => child.on('exit', resolve));
  const exited = gone.then((code) => {
    if (!done) throw new Error(`Chromium exited (${code}) early:\n${stderr}`);
  });
  const timer = setTimeout(() => child.kill('SIGKILL'), TIMEOUT_MS);
  const send = devtools(child);
  try {
    const run = async () => {
      const { targetId } = await send('Target.createTarget', { url: 'about:blank' });
      const { sessionId } = await send('Target.attachToTarget', { targetId, flatten: true });
      const on = (method, params) => send(method, params, sessionId);
      await on('Emulation.setDeviceMetricsOverride', {
        width: PAGE_WIDTH,
        height: 1000,
        deviceScaleFactor: 1,
        mobile: false,
      });
      await on('Page.navigate', { url: pathToFileURL(htmlFile).href });
      const evaluated = await on('Runtime.evaluate', {
        // Navigation may not have replaced about:blank yet: wait for our page's promise.
        expression: `(async () => { while (!window.__result) await new Promise((r) => setTimeout(r, 20)); return window.__result; })()`,
        awaitPromise: true,
        returnByValue: true,
      });
      if (evaluated.exceptionDetails) {
        const d = evaluated.exceptionDetails;
        throw new Error(`the page failed: ${d.exception?.description ?? d.text}`);
      }
      const report = evaluated.result.value;
      await on('Emulation.setDeviceMetricsOverride', {
        width: PAGE_WIDTH,
        height: report.height,
        deviceScaleFactor: 1,
        mobile: false,
      });
      const shot = await on('Page.captureScreenshot', { format: 'png' });
      done = true;
      return { report, png: Buffer.from(shot.data, 'base64') };
    };
    return await Promise.race([run(), exited]);
  } finally {
    done = true;
    // Let Chromium close and finish writing its profile before the caller deletes the folder.
    send('Browser.close').catch(() => {});
    const grace = setTimeout(() => child.kill('SIGKILL'), 5_000);
    if (child.exitCode === null && child.signalCode === null) await gone;
    clearTimeout(grace);
    clearTimeout(timer);
  }
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(bytes) {
  let c = 0xffffffff;
  for (const b of bytes) c = CRC_TABLE[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

/** The PNG with a tEXt chunk (keyword, text) right after its IHDR chunk. */
function withText(png, keyword, text) {
  const body = Buffer.concat([Buffer.from('tEXt', 'latin1'), Buffer.from(`${keyword}\0${text}`, 'latin1')]);
  const chunk = Buffer.alloc(body.length + 8);
  chunk.writeUInt32BE(body.length - 4, 0);
  body.copy(chunk, 4);
  chunk.writeUInt32BE(crc32(body), body.length + 4);
  const afterHeader = 8 + 25; // signature, then IHDR: length, type, 13 bytes, CRC
  return Buffer.concat([png.subarray(0, afterHeader), chunk, png.subarray(afterHeader)]);
}

async function main() {
  const opts = parseArgs(process.argv.slice(2));
  const markdown = readFileSync(opts.input, 'utf8');
  const html = new MarkdownIt({ html: true, linkify: true }).render(markdown);
  const mermaidUrl = pathToFileURL(createRequire(import.meta.url).resolve('mermaid/dist/mermaid.min.js')).href;
  const work = mkdtempSync(join(tmpdir(), 'nb-screenshot-'));
  try {
    const htmlFile = join(work, 'comment.html');
    writeFileSync(htmlFile, page(html, mermaidUrl, randomBytes(16).toString('hex')));
    const { report, png } = await shoot(opts, htmlFile);
    const sha = createHash('sha256').update(markdown).digest('hex');
    const tmp = `${opts.output}.${process.pid}.tmp`;
    writeFileSync(tmp, withText(png, SOURCE_KEYWORD, `sha256:${sha}`));
    renameSync(tmp, opts.output);
    const failed = report.blocks.filter((b) => b.error !== null);
    const summary = {
      output: opts.output,
      bytes: png.length,
      width: png.readUInt32BE(16),
      height: png.readUInt32BE(20),
      details: report.details,
      detailsOpen: report.open,
      blocks: report.blocks.length,
      rendered: report.blocks.length - failed.length,
      charts: report.blocks,
    };
    process.stdout.write(`${JSON.stringify(summary)}\n`);
    if (failed.length > 0) {
      for (const b of failed) process.stderr.write(`mermaid block ${b.index + 1}: ${b.error}\n`);
      process.exitCode = 1;
    }
  } finally {
    rmSync(work, { recursive: true, force: true, maxRetries: 5 });
  }
}

main().catch((e) => {
  process.stderr.write(`screenshot-comment: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exitCode = 1;
});
