// Schema validation of the parsed case with ajv (draft 2020-12).
import { createRequire } from 'node:module';
import type Ajv2020 from 'ajv/dist/2020.js';
import type { ValidateFunction } from 'ajv';
import { caseSchema, SCHEMA_ID } from './caseSchema.js';
import { GENERATED_VALIDATOR } from './generatedValidator.js';

// ajv is loaded only when a case fails the precompiled check (or there is none):
// a valid case never pays for loading and compiling it.
const require = createRequire(import.meta.url);
import type { Issue } from './issue.js';
import { schemaIssues } from './schemaErrors.js';
import type { YamlSource } from './yamlSource.js';

let ajv: InstanceType<typeof Ajv2020.default> | undefined;
let validateCase: ValidateFunction | undefined;
const branchValidators = new WeakMap<object, ValidateFunction>();

function compiler(): InstanceType<typeof Ajv2020.default> {
  if (!ajv) {
    // allErrors: every problem at once; verbose: errors carry their schema node,
    // which holds the example and the plain-words message.
    const { default: Ajv } = require('ajv/dist/2020.js') as typeof Ajv2020;
    ajv = new Ajv({ allErrors: true, verbose: true, strict: true, strictTypes: false, strictRequired: false });
    ajv.addKeyword({ keyword: 'x-quantity', schemaType: 'string' });
    ajv.addKeyword({ keyword: 'x-message', schemaType: 'string' });
    ajv.addSchema(caseSchema);
  }
  return ajv;
}

/** One branch of a oneOf compiled on its own; its "#/$defs/..." references still resolve. */
function branchValidator(branch: object): ValidateFunction {
  let validate = branchValidators.get(branch);
  if (!validate) {
    validate = compiler().compile({ $defs: caseSchema.$defs, ...branch });
    branchValidators.set(branch, validate);
  }
  return validate;
}

let precompiled: ((data: unknown) => boolean) | null | undefined;

/** The build's standalone validator, or null where there is none (tests running the TypeScript sources). */
function precompiledValidator(): ((data: unknown) => boolean) | null {
  if (precompiled === undefined) {
    try {
      precompiled = require(`./${GENERATED_VALIDATOR}`) as (data: unknown) => boolean;
    } catch {
      precompiled = null;
    }
  }
  return precompiled;
}

/** Every schema problem of the case, located in the YAML; [] when it conforms. */
export function validateAgainstSchema(source: YamlSource): Issue[] {
  // A conforming case needs no messages: the precompiled validator answers
  // alone. Any failure is described by the full compiler.
  const quick = precompiledValidator();
  if (quick && quick(source.data)) return [];
  if (!validateCase) validateCase = compiler().getSchema(SCHEMA_ID)!;
  if (validateCase(source.data)) return [];
  return schemaIssues(validateCase.errors ?? [], source, branchValidator);
}
