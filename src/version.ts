/** The tool's version, taken from package.json when the bundle is built (ncc inlines the JSON). */
import packageJson from '../package.json' with { type: 'json' };

export const TOOL_NAME = 'neuron-budget';
export const TOOL_VERSION: string = packageJson.version;
