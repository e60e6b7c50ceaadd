export * from './types';
export { FAMILIES, FAMILY_LABELS, FamilyKeySchema, getFamily, getParameter, isFamilyKey } from './families';
export {
  ConditionsSchema,
  ParameterValueSchema,
  parameterValueSchemaFor,
  parametersSchemaFor,
  type FamilyParameters,
  type ParameterConditions,
  type ParameterValue,
} from './schema';
export { CADMIUM_CAUTION, CADMIUM_HANDLING_NOTE, isCadmiumCell } from './cadmium';
export * from './pinouts';
