/**
 * Device reality: what a network costs on a microcontroller, its int8 form, and firmware
 * source for both forms. Pure functions; no I/O.
 */
export { costShapeOf, deviceCost, objectBytes, storedObjects, LUT_ENTRIES } from './cost.js';
export type { CostShape, CType, DeviceCost, StoredObject } from './cost.js';
export {
  multiplyByQuantizedMultiplier,
  quantizeMultiplier,
  roundHalfAway,
  roundingDivideByPot,
  saturatingRoundingDoublingHighMul,
} from './fixed-point.js';
export type { QuantizedMultiplier } from './fixed-point.js';
