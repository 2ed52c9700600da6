import { realpathSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';

// The swagger plugin imports `typescript`; from the backend that would resolve to the root's
// native compiler, which has no JavaScript API. Point it at the tools workspace's compiler instead.
// (Its real path: a checkout whose node_modules is a link must load the compiler under one name.)
const TYPESCRIPT = pathToFileURL(
  realpathSync(fileURLToPath(new URL('../node_modules/typescript/lib/typescript.js', import.meta.url))),
).href;

export async function resolve(specifier, context, nextResolve) {
  if (specifier === 'typescript') return { url: TYPESCRIPT, format: 'commonjs', shortCircuit: true };
  return nextResolve(specifier, context);
}
