/** Witness export: the winning network as a JSON document anyone can run on raw rows. */
export { MODEL_SCHEMA, modelDocument, serializeModel } from './document.js';
export type { ModelDocument, Provenance } from './document.js';
export { parseModel } from './parse.js';
export { encodeRows, predictRows, scoreRows, standardise } from './predict.js';
export type { Prediction, Row } from './predict.js';
