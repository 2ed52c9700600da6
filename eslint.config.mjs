// The configuration lives in the tools workspace, beside typescript-eslint and its TypeScript.
export { default } from './tools/eslint/config.js';
