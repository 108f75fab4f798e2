// Build step: writes the case schema's standalone validator beside the
// compiled model code (dist/src/model/), after tsc.
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { caseValidatorCode, GENERATED_VALIDATOR } from '../src/model/caseValidatorCode.js';

const target = fileURLToPath(new URL(`../src/model/${GENERATED_VALIDATOR}`, import.meta.url));
writeFileSync(target, caseValidatorCode());
