/**
 * Where tasks run: in this thread (one worker, and the path tests take from TypeScript
 * source) or on a pool of worker threads that share the encoded data without copies.
 * Both run the same task code, so the choice never changes a result.
 */
import { Worker } from 'node:worker_threads';
import type { EncodedDataset } from '../data/types.js';
import { taskKey } from './growth.js';
import { runPruneJob, runTask } from './task.js';
import type { PruneJob, PruneResult, SearchContext } from './task.js';
import type { TaskResult, TrainingTask } from './types.js';

export interface Executor {
  readonly size: number;
  /** The task's result; null when it gave up because the search's time ran out. */
  train(task: TrainingTask): Promise<TaskResult | null>;
  prune(job: PruneJob): Promise<PruneResult>;
  /**
   * Give up a growth task whose answer is no longer needed: drop it if queued, tell its
   * thread to stop it if running. Its promise then never settles.
   */
  discard(task: TrainingTask): void;
  /** Stop every thread; work still running is abandoned. */
  close(): Promise<void>;
}

/** Marks a worker thread started by the pool (the bundle checks it to act as the worker). */
const WORKER_MARK = 'neuron-budget/search-worker';

export type WorkerRequest =
  /** `cancel` holds the id of the task the thread should give up (-1: none). */
  | { type: 'init'; data: EncodedDataset; ctx: SearchContext; cancel: Int32Array }
  | { type: 'train'; id: number; task: TrainingTask }
  | { type: 'prune'; id: number; job: PruneJob };

export type WorkerReply =
  | { type: 'done'; id: number; result: TaskResult | PruneResult }
  | { type: 'cancelled'; id: number }
  | { type: 'error'; id: number; message: string };

const yieldToEventLoop = (): Promise<void> => new Promise((resolve) => setImmediate(resolve));

export function inThreadExecutor(data: EncodedDataset, ctx: SearchContext): Executor {
  return {
    size: 1,
    async train(task) {
      await yieldToEventLoop();
      // Never discarded here (nothing runs ahead in one thread); null only when the time ran out.
      return runTask(data, ctx, task);
    },
    async prune(job) {
      await yieldToEventLoop();
      return runPruneJob(data, ctx, job);
    },
    discard() {},
    async close() {},
  };
}

function isShared(a: Float64Array): boolean {
  return typeof SharedArrayBuffer !== 'undefined' && a.buffer instanceof SharedArrayBuffer;
}

function toShared(a: Float64Array): Float64Array {
  if (isShared(a)) return a;
  const s = new Float64Array(new SharedArrayBuffer(a.length * Float64Array.BYTES_PER_ELEMENT));
  s.set(a);
  return s;
}

/** The dataset with every array on SharedArrayBuffer (already the case for loaded data), so posting it shares memory. */
export function shareDataset(data: EncodedDataset): EncodedDataset {
  return {
    ...data,
    xTrain: toShared(data.xTrain),
    yTrain: toShared(data.yTrain),
    xValidation: toShared(data.xValidation),
    xJudging: toShared(data.xJudging),
    yJudging: toShared(data.yJudging),
    yValidation: toShared(data.yValidation),
  };
}

interface Pending {
  resolve: (r: TaskResult | PruneResult | null) => void;
  reject: (e: Error) => void;
}

interface Slot {
  worker: Worker;
  busy: number | null;
  cancel: Int32Array;
}

type Job = { type: 'train'; task: TrainingTask } | { type: 'prune'; job: PruneJob };

/**
 * A fixed pool of worker threads. `entry` is the file of the running bundle, which acts
 * as the worker when started with WORKER_MARK (ncc does not follow `new Worker(path)`).
 */
export function workerPoolExecutor(data: EncodedDataset, ctx: SearchContext, size: number, entry: string): Executor {
  const shared = shareDataset(data);
  const pending = new Map<number, Pending>();
  const trainIds = new Map<string, number>();
  const queue: { id: number; job: Job }[] = [];
  const slots: Slot[] = [];
  let nextId = 0;
  let closed = false;

  const pump = (): void => {
    for (const slot of slots) {
      if (slot.busy !== null || queue.length === 0) continue;
      const next = queue.shift()!;
      slot.busy = next.id;
      const msg: WorkerRequest =
        next.job.type === 'train'
          ? { type: 'train', id: next.id, task: next.job.task }
          : { type: 'prune', id: next.id, job: next.job.job };
      slot.worker.postMessage(msg);
    }
  };

  const settle = (id: number): Pending | undefined => {
    const p = pending.get(id);
    pending.delete(id);
    for (const [key, tid] of trainIds) if (tid === id) trainIds.delete(key);
    return p;
  };

  const startSlot = (): Slot => {
    const cancel = new Int32Array(new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT)).fill(-1);
    const slot: Slot = { worker: new Worker(entry, { workerData: { role: WORKER_MARK } }), busy: null, cancel };
    slot.worker.on('message', (reply: WorkerReply) => {
      slot.busy = null;
      const p = settle(reply.id);
      if (p !== undefined) {
        if (reply.type === 'done') p.resolve(reply.result);
        else if (reply.type === 'cancelled') p.resolve(null);
        else p.reject(new Error(reply.message));
      }
      pump();
    });
    const fail = (error: Error): void => {
      if (closed) return;
      if (slot.busy !== null) settle(slot.busy)?.reject(error);
      slot.busy = null;
    };
    slot.worker.on('error', fail);
    slot.worker.on('exit', (code) => fail(new Error(`search worker stopped unexpectedly (exit code ${code})`)));
    // The data's SharedArrayBuffers are shared with the thread, not copied.
    const init: WorkerRequest = { type: 'init', data: shared, ctx, cancel };
    slot.worker.postMessage(init);
    return slot;
  };
  for (let k = 0; k < size; k++) slots.push(startSlot());

  const submit = <R extends TaskResult | PruneResult | null>(job: Job): Promise<R> =>
    new Promise<R>((resolve, reject) => {
      if (closed) {
        reject(new Error('search worker pool is closed'));
        return;
      }
      const id = nextId++;
      pending.set(id, { resolve: resolve as (r: TaskResult | PruneResult | null) => void, reject });
      if (job.type === 'train') trainIds.set(taskKey(job.task), id);
      queue.push({ id, job });
      pump();
    });

  return {
    size,
    train: (task) => submit<TaskResult | null>({ type: 'train', task }),
    prune: (job) => submit<PruneResult>({ type: 'prune', job }),
    discard(task) {
      const id = trainIds.get(taskKey(task));
      if (id === undefined) return;
      settle(id);
      const q = queue.findIndex((e) => e.id === id);
      if (q >= 0) {
        queue.splice(q, 1);
        return;
      }
      // The thread looks at its flag between slices of epochs and answers 'cancelled'.
      const slot = slots.find((s) => s.busy === id);
      if (slot !== undefined) Atomics.store(slot.cancel, 0, id);
    },
    async close() {
      closed = true;
      queue.length = 0;
      await Promise.all(slots.map((s) => s.worker.terminate()));
      pending.clear();
    },
  };
}
