export * from './types';
export { TEMPLATES, getTemplate, templateVersion } from './templates';
export { listFields, fieldsByKey } from './lookup';
export { buildValuesSchema, fieldValueSchema } from './valuesSchema';
export { validateSetupValues, SHEET_ERROR_KEY } from './validate';
export type { SetupValidationResult } from './validate';
