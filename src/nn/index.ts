/**
 * The training engine's public surface, used by src/search and src/model. Pure computation: no
 * I/O, no clocks, no Math.random.
 */
export type * from './types.js';
export type { OptimizerSettings } from './optimizers.js';
export type { Metrics } from './metrics.js';
export { createTrainer, trainerFromNetwork, headFor } from './trainer.js';
export { classesOn, metricOn, predict } from './predict.js';
