// Schema validation of the parsed case with ajv (draft 2020-12).
import Ajv2020 from 'ajv/dist/2020.js';
import type { ValidateFunction } from 'ajv';
import { caseSchema, SCHEMA_ID } from './caseSchema.js';
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
    ajv = new Ajv2020.default({ allErrors: true, verbose: true, strict: true, strictTypes: false, strictRequired: false });
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

/** Every schema problem of the case, located in the YAML; [] when it conforms. */
export function validateAgainstSchema(source: YamlSource): Issue[] {
  if (!validateCase) validateCase = compiler().getSchema(SCHEMA_ID)!;
  if (validateCase(source.data)) return [];
  return schemaIssues(validateCase.errors ?? [], source, branchValidator);
}
