export const FAMILY_KEYS = ['op-amp', 'photoresistor', 'led', 'potentiometer', 'optocoupler'] as const;
/** Part families; 'optocoupler' is the resistive kind (an LED lighting a photoresistor in one package). */
export type FamilyKey = (typeof FAMILY_KEYS)[number];

export type ParameterKind = 'number' | 'text' | 'enum' | 'boolean';
export type ValueSlot = 'min' | 'typ' | 'max';
export const VALUE_SLOTS: readonly ValueSlot[] = ['min', 'typ', 'max'];

/** Test conditions that may accompany a value, e.g. slew rate at a ±15 V supply, dark resistance 10 s after darkness. */
export type ConditionKey = 'supply' | 'temperature' | 'current' | 'time';
export const CONDITION_KEYS: readonly ConditionKey[] = ['supply', 'temperature', 'current', 'time'];

export interface ParameterChoice {
  value: string;
  label: string;
}

export interface ParameterDefinition {
  /** API key, fixed: stored in the database and sent over the wire. */
  key: string;
  label: string;
  kind: ParameterKind;
  /** What a number measures ('voltage', 'slew rate'); matches UNITS[unit].quantity. */
  quantity?: string;
  /** Canonical unit the value is stored in (SI base units, or °C, °, %). */
  unit?: string;
  /** Unit to show the value in; without one formatQuantity picks a prefix. */
  displayUnit?: string;
  /** Which of min / typ / max a datasheet gives for this parameter. */
  slots?: readonly ValueSlot[];
  /** Significant digits to show. */
  precision?: number;
  choices?: readonly ParameterChoice[];
  conditions?: readonly ConditionKey[];
  /** One plain line for the UI. */
  description: string;
  filterable: boolean;
  columnByDefault: boolean;
}

export interface FamilyDefinition {
  key: FamilyKey;
  label: string;
  pluralLabel: string;
  description: string;
  parameters: readonly ParameterDefinition[];
}

/** Units and labels of the test conditions; supply is a total span like the op amp supply range. */
export const CONDITIONS: Record<ConditionKey, { label: string; unit: string; displayUnit?: string; description: string }> = {
  supply: { label: 'Supply', unit: 'V', description: 'Total supply span between the rails; a dual ±X V supply is 2X V' },
  temperature: { label: 'Temperature', unit: '°C', description: 'Ambient temperature' },
  current: { label: 'Current', unit: 'A', displayUnit: 'mA', description: 'Current through the part (for an optocoupler, the LED current)' },
  time: { label: 'Time', unit: 's', description: 'Time after the change, e.g. after the light is removed' },
};
