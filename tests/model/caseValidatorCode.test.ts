import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { parse } from 'yaml';
import Ajv2020 from 'ajv/dist/2020.js';
import { caseSchema, SCHEMA_ID } from '../../src/model/index.js';
import { caseValidatorCode } from '../../src/model/caseValidatorCode.js';

// The standalone validator must answer exactly as the schema compiled at run time.
function precompiled(): (data: unknown) => boolean {
  const module = { exports: {} as unknown };
  const require = createRequire(import.meta.url);
  new Function('module', 'exports', 'require', caseValidatorCode())(module, module.exports, require);
  return module.exports as (data: unknown) => boolean;
}

function compiled(): (data: unknown) => boolean {
  const ajv = new Ajv2020.default({ allErrors: true, strict: true, strictTypes: false, strictRequired: false });
  ajv.addKeyword({ keyword: 'x-quantity', schemaType: 'string' });
  ajv.addKeyword({ keyword: 'x-message', schemaType: 'string' });
  ajv.addSchema(caseSchema);
  const validate = ajv.getSchema(SCHEMA_ID)!;
  return (data) => validate(data) as boolean;
}

describe('caseValidatorCode()', () => {
  const quick = precompiled();
  const full = compiled();
  const demos = ['cases/kestrel-bay-board-mill.yaml', 'cases/millbrook-creamery.yaml', 'cases/orchard-vale-foods.yaml'].map((path) => parse(readFileSync(path, 'utf8')));

  it('accepts the demo cases, as the compiled schema does', () => {
    for (const demo of demos) {
      expect(full(demo)).toBe(true);
      expect(quick(demo)).toBe(true);
    }
  });

  it('agrees with the compiled schema on broken cases', () => {
    const broken = [
      { ...demos[0], headers: 'none' },
      { ...demos[0], unknown_key: 1 },
      { ...demos[0], boilers: [{ id: 'b' }] },
      { ...demos[0], site: { ...demos[0].site, units: 'metric' } },
      {},
      [],
    ];
    for (const data of broken) expect(quick(data)).toBe(full(data));
    expect(broken.some((data) => full(data))).toBe(false);
  });
});
