/**
 * Will the data fit in memory? The column stores grow by doubling while the file is read, and
 * the split and the encoded dataset come after; a process that runs out of address space or
 * heap on the way dies with a fatal V8 error and a native stack, or an internal error, after
 * minutes of reading. So each time the stores are about to double, the reader projects the
 * whole file's rows from the bytes read so far and the file's size, estimates what loading them
 * takes, and stops with a message (how much, the limit, what to do) when it will not fit.
 *
 * The estimate counts what src/data allocates; the search's own working memory comes on top.
 */
import { readFileSync } from 'node:fs';
import { totalmem } from 'node:os';
import { getHeapStatistics } from 'node:v8';
import { formatCount } from '../common/format.js';

const MIB = 1024 * 1024;
/** Room kept free for everything not estimated (parser buffers, the report, the workers' start). */
const HEADROOM = 64 * MIB;
/** The estimate is an estimate: ask for this much more (a practical margin, no source). */
const MARGIN = 1.1;

/** One column being read: whether it still keeps cell codes, and how many inputs it will encode to. */
export interface ColumnShape {
  /** The store still keeps an Int32 code per cell (the column may be categorical). */
  codes: boolean;
  /** Network inputs the column becomes: 1 for a number, the category count for one-hot; 0 for the target. */
  inputs: number;
}

export interface LoadShape {
  /** Rows kept so far and the capacity the stores have now. */
  rows: number;
  capacity: number;
  /** Records parsed and the bytes they took (csv-parse's count), and the file's size. */
  recordsParsed: number;
  bytesParsed: number;
  fileBytes: number;
  columns: ColumnShape[];
}

export interface LoadEstimate {
  /** Rows the whole file will give, projected from the part read. */
  rows: number;
  /** Bytes the data stage will hold at its peak, in all. */
  total: number;
  /** Of those, on the JavaScript heap (the split's row lists). */
  heap: number;
  /** Bytes the stores hold already (counted in the process's use). */
  held: number;
}

/** Bytes per row the split keeps: its row lists as JavaScript arrays (heap) and as Int32Arrays. */
const SPLIT_HEAP_PER_ROW = 16;
const SPLIT_TYPED_PER_ROW = 12;

export function estimateLoad(shape: LoadShape): LoadEstimate {
  const perRecord = shape.bytesParsed / Math.max(1, shape.recordsParsed);
  const rows = Math.max(shape.rows, Math.ceil(shape.fileBytes / Math.max(1, perRecord)));
  let capacity = shape.capacity;
  while (capacity < rows) capacity *= 2;
  let storePerRow = 0;
  let afterPerRow = 8; // the target per row as the network reads it
  for (const c of shape.columns) {
    storePerRow += 8 + (c.codes ? 4 : 0);
    afterPerRow += 8 * c.inputs + (c.codes ? 4 : 0); // inputs as float64; categories re-coded in sorted order
  }
  const stores = capacity * storePerRow;
  // While the last doubling copies, the old stores are still there; after reading, the stores
  // stay while the split and the encoded arrays are made.
  const reading = stores + (capacity / 2) * storePerRow;
  const after = stores + rows * (afterPerRow + SPLIT_TYPED_PER_ROW + SPLIT_HEAP_PER_ROW);
  return {
    rows,
    total: Math.max(reading, after),
    heap: rows * SPLIT_HEAP_PER_ROW,
    held: shape.capacity * storePerRow,
  };
}

/** How much more this process may allocate, and what bounds it, as read from the system. */
export interface MemoryRoom {
  /** Bytes more for typed arrays (outside the JavaScript heap): the tightest limit below. */
  bytes: number;
  /** What bounds `bytes`, for the message ("the address-space limit (ulimit -v) of 1,536 MiB, 700 MiB in use"). */
  bound: string;
  /** Bytes more the JavaScript heap may grow, and its limit. */
  heapBytes: number;
  heapLimit: number;
}

export function memoryRoom(): MemoryRoom {
  const heap = getHeapStatistics();
  const rss = process.memoryUsage.rss();
  const candidates: { bytes: number; bound: string }[] = [];
  const total = totalmem();
  candidates.push({ bytes: total - rss, bound: `the machine's memory of ${mib(total)}` });
  const constrained = process.constrainedMemory();
  if (constrained > 0 && constrained < total) {
    candidates.push({ bytes: constrained - rss, bound: `the container's memory limit of ${mib(constrained)}` });
  }
  const space = addressSpace();
  if (space !== null) {
    candidates.push({
      bytes: space.limit - space.used,
      bound: `the address-space limit (ulimit -v) of ${mib(space.limit)}, ${mib(space.used)} of it in use`,
    });
  }
  const tightest = candidates.reduce((a, b) => (b.bytes < a.bytes ? b : a));
  return {
    bytes: Math.max(0, tightest.bytes),
    bound: tightest.bound,
    heapBytes: Math.max(0, heap.heap_size_limit - heap.used_heap_size),
    heapLimit: heap.heap_size_limit,
  };
}

/** Why the estimate does not fit in `room`, or null when it does. */
export function whyNotFit(estimate: LoadEstimate, room: MemoryRoom): string | null {
  const need = estimate.total * MARGIN;
  const have = Math.max(0, room.bytes + estimate.held - HEADROOM);
  const heapNeed = estimate.heap * MARGIN;
  const heapHave = Math.max(0, room.heapBytes - HEADROOM);
  if (need <= have && heapNeed <= heapHave) return null;
  return (
    `loading about ${formatCount(estimate.rows)} rows needs about ${mib(need)} of memory ` +
    `(${mib(heapNeed)} of it on the JavaScript heap), but this process has room for about ${mib(have)}: ` +
    `typed arrays are bounded by ${room.bound}, and the JavaScript heap by its limit of ${mib(room.heapLimit)} ` +
    `(v8 heap_size_limit; ${mib(room.heapBytes)} of it free). Commit fewer rows (a sample of them), raise the ` +
    'limit (NODE_OPTIONS=--max-old-space-size=… for the heap; ulimit -v or the container limit for the rest), ' +
    'or run on a bigger runner'
  );
}

function mib(bytes: number): string {
  return `${formatCount(Math.round(bytes / MIB))} MiB`;
}

/** The soft address-space limit and the address space in use (Linux /proc), or null when there is none. */
function addressSpace(): { limit: number; used: number } | null {
  try {
    const limits = readFileSync('/proc/self/limits', 'utf8');
    const m = /^Max address space\s+(\S+)/m.exec(limits);
    if (m === null || m[1] === 'unlimited') return null;
    const status = readFileSync('/proc/self/status', 'utf8');
    const used = /^VmSize:\s+(\d+) kB/m.exec(status);
    return { limit: Number(m[1]), used: used === null ? 0 : Number(used[1]) * 1024 };
  } catch {
    return null; // not Linux: the other limits still apply
  }
}
