// typescript-eslint needs the TypeScript compiler's JavaScript API. The repository's own TypeScript
// (7, the native compiler) has none, and npm hoists some of typescript-eslint's helpers
// (ts-api-utils) to the root, where `require('typescript')` would find TypeScript 7. While ESLint
// runs, every `typescript` request is answered with this workspace's TypeScript 5 instead.
import Module, { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const toolsTypescript = require.resolve('typescript');
const toolsRoot = toolsTypescript.slice(0, toolsTypescript.lastIndexOf('/typescript/') + '/typescript/'.length);

const resolve = Module._resolveFilename;
Module._resolveFilename = function resolveToolsTypescript(request, parent, ...rest) {
  if (request === 'typescript') return toolsTypescript;
  if (request.startsWith('typescript/'))
    return resolve.call(this, toolsRoot + request.slice('typescript/'.length), parent, ...rest);
  return resolve.call(this, request, parent, ...rest);
};
