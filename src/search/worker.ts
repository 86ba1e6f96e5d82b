/**
 * The worker-thread side of the pool. A bundle calls runSearchWorker() when it starts
 * as a worker (`!isMainThread`); the thread then answers task messages until terminated.
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { EncodedDataset } from '../data/types.js';
import { WORKER_MARK } from './executor.js';
import type { WorkerReply, WorkerRequest } from './executor.js';
import { runPruneJob, runTask } from './task.js';
import type { SearchContext } from './task.js';

/** True when this thread was started by the search pool. */
export function isSearchWorker(): boolean {
  return parentPort !== null && (workerData as { role?: unknown } | null)?.role === WORKER_MARK;
}

export function runSearchWorker(): void {
  const port = parentPort;
  if (port === null) throw new Error('runSearchWorker() must run in a worker thread');
  let data: EncodedDataset | null = null;
  let ctx: SearchContext | null = null;
  port.on('message', (msg: WorkerRequest) => {
    if (msg.type === 'init') {
      data = msg.data;
      ctx = msg.ctx;
      return;
    }
    let reply: WorkerReply;
    try {
      if (data === null || ctx === null) throw new Error('search worker got a task before its data');
      const result = msg.type === 'train' ? runTask(data, ctx, msg.task) : runPruneJob(data, ctx, msg.job);
      reply = { type: 'done', id: msg.id, result };
    } catch (e) {
      reply = { type: 'error', id: msg.id, message: e instanceof Error ? (e.stack ?? e.message) : String(e) };
    }
    port.postMessage(reply);
  });
}
