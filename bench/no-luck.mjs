// No-luck benchmark (prints figures; not a test): two Gaussian classes with a known Bayes
// accuracy, the target 2 points above and 2 points below it, over many seeds, judged as the tool
// judges (held-out judging rows) and as it judged before (on the validation rows that steer).
// Usage: node bench/no-luck.mjs [--rows=1000,2000,5000,10000] [--seeds=20] [--max-width=4]
// (wrap in flock /tmp/nb-heavy.lock on shared machines; it runs on one core for several minutes)
import { runBundled } from './bundle.mjs';

runBundled('bench/no-luck.entry.ts', process.argv.slice(2));
