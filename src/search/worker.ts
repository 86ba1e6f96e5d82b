/**
 * The worker-thread side of the pool. A bundle calls runSearchWorker() when it starts
 * as a worker (`!isMainThread`); the thread then answers task messages until terminated.
 */
import { parentPort } from 'node:worker_threads';
import type { EncodedDataset } from '../data/types.js';
import type { WorkerReply, WorkerRequest } from './executor.js';
import { runPruneJob, runTask } from './task.js';
import type { SearchContext } from './task.js';

export function runSearchWorker(): void {
  const port = parentPort;
  if (port === null) throw new Error('runSearchWorker() must run in a worker thread');
  let data: EncodedDataset | null = null;
  let ctx: SearchContext | null = null;
  let cancel: Int32Array<ArrayBufferLike> = new Int32Array(1).fill(-1);
  port.on('message', (msg: WorkerRequest) => {
    if (msg.type === 'init') {
      data = msg.data;
      ctx = msg.ctx;
      cancel = msg.cancel;
      return;
    }
    let reply: WorkerReply;
    try {
      if (data === null || ctx === null) throw new Error('search worker got a task before its data');
      const id = msg.id;
      const result =
        msg.type === 'train'
          ? runTask(data, ctx, msg.task, () => Atomics.load(cancel, 0) === id)
          : runPruneJob(data, ctx, msg.job);
      reply = result === null ? { type: 'cancelled', id } : { type: 'done', id, result };
    } catch (e) {
      reply = { type: 'error', id: msg.id, message: e instanceof Error ? (e.stack ?? e.message) : String(e) };
    }
    port.postMessage(reply);
  });
}
