/**
 * Device reality: what a network costs on a microcontroller, its int8 form, and firmware
 * source for both forms. Pure functions; no I/O.
 */
export { costShapeOf, deviceCost, objectBytes, storedObjects, LUT_ENTRIES } from './cost.js';
export type { CostShape, CType, DeviceCost, StoredObject } from './cost.js';
export {
  activationRanges,
  activationTable,
  dequantizeValue,
  foldZeroPoint,
  quantizeLayer,
  quantizeNetwork,
  quantizeValue,
  rangeParams,
} from './quantize.js';
export type { Calibration, Int8Feature, Int8Network, QuantParams } from './quantize.js';
export { categoryIndex, inputCode, int8Forward, rawFeatureRows } from './int8-forward.js';
export type { Int8Result, Int8Trace } from './int8-forward.js';
export {
  multiplyByQuantizedMultiplier,
  quantizeMultiplier,
  roundHalfAway,
  roundingDivideByPot,
  saturatingRoundingDoublingHighMul,
} from './fixed-point.js';
export type { QuantizedMultiplier } from './fixed-point.js';
export { checkInt8Network } from './int8-check.js';
export type { Int8Problem } from './int8-check.js';
export { DEFAULT_C_NAME, exportC } from './export-c.js';
export type { CFiles, FirmwareModel, Provenance } from './export-c.js';
export { checkCName, commentText, floatLiteral } from './c-text.js';
