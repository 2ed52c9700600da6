// Lets Node run the backend's TypeScript sources as they are, compiled file by file with SWC and
// the same options as the backend's jest set-up, so no build (and no database) is needed to
// describe the API. Relative imports name `.js` files; the `.ts` beside them is loaded.
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import swc from '@swc/core';

const SWC_OPTIONS = {
  jsc: {
    parser: { syntax: 'typescript', decorators: true },
    transform: { legacyDecorator: true, decoratorMetadata: true },
    target: 'es2022',
  },
  module: { type: 'es6' },
  sourceMaps: 'inline',
};

export async function resolve(specifier, context, nextResolve) {
  if (
    (specifier.startsWith('.') || specifier.startsWith('/')) &&
    specifier.endsWith('.js') &&
    context.parentURL?.endsWith('.ts')
  ) {
    const url = new URL(specifier, context.parentURL);
    const ts = new URL(url.href.replace(/\.js$/, '.ts'));
    if (!existsSync(fileURLToPath(url)) && existsSync(fileURLToPath(ts))) return { url: ts.href, shortCircuit: true };
  }
  return nextResolve(specifier, context);
}

export async function load(url, context, nextLoad) {
  if (!url.startsWith('file:') || !url.endsWith('.ts')) return nextLoad(url, context);
  const filename = fileURLToPath(url);
  const { code } = await swc.transform(await readFile(filename, 'utf8'), { ...SWC_OPTIONS, filename });
  return { format: 'module', source: code, shortCircuit: true };
}
