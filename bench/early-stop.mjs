// Early-stop benchmark (prints figures; not a test): records the learning curve of every growth
// restart the search runs (and the ones it skips) up to the grown width, on the demo data and
// the generated dataset, and evaluates offline rules that would stop a failing restart early.
// Usage: node bench/early-stop.mjs [--cases=demo,demo-pr,generated] [--seeds=1-20] [--curves=DIR] [--verify=N]
// (wrap in flock /tmp/nb-heavy.lock on shared machines; seeds 1-20 take about 9 minutes on one core;
// --curves=DIR keeps the recorded curves so the rules can be evaluated again in seconds)
import { runBundled } from './bundle.mjs';

runBundled('bench/early-stop.entry.ts', process.argv.slice(2));
