import { UNITS, type CanonicalUnit } from '../units/units';
import type { ConditionKey, ParameterChoice, ParameterDefinition, ValueSlot } from './types';

interface Common {
  key: string;
  label: string;
  description: string;
  filterable?: boolean;
  columnByDefault?: boolean;
}

// Small builders so each family file reads as a list; defaults: filterable, not a default column.

export function numberParam(
  p: Common & {
    unit?: CanonicalUnit;
    displayUnit?: string;
    slots: readonly ValueSlot[];
    precision?: number;
    conditions?: readonly ConditionKey[];
    quantity?: string;
  },
): ParameterDefinition {
  const unit = p.unit ?? '';
  return {
    key: p.key,
    label: p.label,
    kind: 'number',
    quantity: p.quantity ?? (unit === '' ? 'count' : UNITS[unit].quantity),
    ...(unit === '' ? {} : { unit }),
    ...(p.displayUnit === undefined ? {} : { displayUnit: p.displayUnit }),
    slots: p.slots,
    precision: p.precision ?? 3,
    ...(p.conditions === undefined ? {} : { conditions: p.conditions }),
    description: p.description,
    filterable: p.filterable ?? true,
    columnByDefault: p.columnByDefault ?? false,
  };
}

export function enumParam(p: Common & { choices: readonly ParameterChoice[] }): ParameterDefinition {
  return {
    key: p.key,
    label: p.label,
    kind: 'enum',
    choices: p.choices,
    description: p.description,
    filterable: p.filterable ?? true,
    columnByDefault: p.columnByDefault ?? false,
  };
}

export function booleanParam(p: Common): ParameterDefinition {
  return {
    key: p.key,
    label: p.label,
    kind: 'boolean',
    description: p.description,
    filterable: p.filterable ?? true,
    columnByDefault: p.columnByDefault ?? false,
  };
}

export function choices(...pairs: [value: string, label: string][]): ParameterChoice[] {
  return pairs.map(([value, label]) => ({ value, label }));
}
