// Writes backend/openapi.json from the backend's sources (no build, no database), then the front
// end's types from it (frontend/src/lib/api/schema.d.ts).
// Run from anywhere: node tools/openapi/write.mjs [--skip-metadata]
// Without --skip-metadata it first refreshes backend/src/openapi/plugin-metadata.ts.
import { execFileSync } from 'node:child_process';
import { register } from 'node:module';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = path.resolve(fileURLToPath(import.meta.url), '../../..');
if (!process.argv.includes('--skip-metadata')) {
  execFileSync(process.execPath, [path.join(root, 'tools/openapi/generate-metadata.mjs')], { stdio: 'inherit' });
}
register('./backend-ts-hook.mjs', import.meta.url);
const { writeOpenApiDocument } = await import(
  pathToFileURL(path.join(root, 'backend/src/openapi/write-document.ts')).href
);
const target = path.join(root, 'backend/openapi.json');
await writeOpenApiDocument(target);
execFileSync(
  path.join(root, 'tools/node_modules/.bin/openapi-typescript'),
  [target, '-o', path.join(root, 'frontend/src/lib/api/schema.d.ts')],
  { stdio: 'inherit', cwd: root },
);
