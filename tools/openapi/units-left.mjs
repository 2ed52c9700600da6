// Lists the numbers in backend/openapi.json whose description names no unit (nor says plainly that
// it has none), by the same rule test/openapi.e2e-spec.ts holds the document to
// (backend/src/openapi/unit-rule.ts). Run: node tools/openapi/units-left.mjs
import { readFileSync } from 'node:fs';
import { register } from 'node:module';

register('./backend-ts-hook.mjs', import.meta.url);
const { numbersWithoutUnit } = await import('../../backend/src/openapi/unit-rule.ts');
const document = JSON.parse(readFileSync(new URL('../../backend/openapi.json', import.meta.url), 'utf8'));
const missing = numbersWithoutUnit(document);
console.log(missing.join('\n'));
console.error(`${missing.length} numbers without a stated unit`);
