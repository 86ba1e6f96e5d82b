/**
 * Entry of the action bundle (dist/index.js). The same bundle is also the entry of the search's
 * worker threads, since the bundler does not follow `new Worker(path)`.
 */
import { isMainThread } from 'node:worker_threads';
import { run } from './github/main.js';
import { runSearchWorker } from './search/index.js';

if (!isMainThread) {
  runSearchWorker();
} else {
  await run();
}
