/** File name of the case schema's precompiled validator, written beside the compiled validateSchema.js by the build. */
export const GENERATED_VALIDATOR = 'caseValidator.generated.cjs';
