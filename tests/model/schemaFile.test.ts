// schema/case.schema.json is generated from src/model/caseSchema.ts; this test
// fails when they differ. Regenerate with: UPDATE_SCHEMA=1 npx vitest run tests/model/schemaFile.test.ts
import { readFileSync, writeFileSync } from 'node:fs';
import { expect, test } from 'vitest';
import { caseSchema } from '../../src/model/index.js';

const file = new URL('../../schema/case.schema.json', import.meta.url);
const generated = `${JSON.stringify(caseSchema, null, 2)}\n`;

test('schema/case.schema.json is exactly the schema the loader validates with', () => {
  if (process.env.UPDATE_SCHEMA === '1') writeFileSync(file, generated);
  expect(readFileSync(file, 'utf8')).toBe(generated);
});
