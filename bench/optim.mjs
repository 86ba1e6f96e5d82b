// Optimiser benchmark (prints figures; not a test): epochs and seconds until a fresh training
// first meets the target, for each optimiser, on XOR, 4-bit parity, two spirals, Iris and the
// demo, through the real data stage and trainer (bench/optim.entry.ts).
// Usage: node bench/optim.mjs [--runs=N]   (wrap in flock /tmp/nb-heavy.lock on shared machines)
import { runBundled } from './bundle.mjs';

runBundled('bench/optim.entry.ts', process.argv.slice(2));
