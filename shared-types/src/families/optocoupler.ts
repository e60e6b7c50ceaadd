import { choices, enumParam, numberParam } from './define';
import type { FamilyDefinition } from './types';

export const OPTOCOUPLER: FamilyDefinition = {
  key: 'optocoupler',
  label: 'Resistive optocoupler',
  pluralLabel: 'Resistive optocouplers',
  description: 'An LED and a photoresistor sealed together: a resistance set by the LED current.',
  parameters: [
    numberParam({
      key: 'onResistance',
      label: 'On resistance',
      unit: 'Ω',
      slots: ['typ', 'max'],
      conditions: ['current'],
      description: 'Cell resistance with the LED lit; the condition is the LED current.',
      columnByDefault: true,
    }),
    numberParam({
      key: 'offResistance',
      label: 'Off resistance',
      unit: 'Ω',
      slots: ['min'],
      conditions: ['time'],
      description: 'Cell resistance with the LED dark, measured a set time after switch-off.',
      columnByDefault: true,
    }),
    numberParam({
      key: 'ledForwardVoltage',
      label: 'LED forward voltage',
      unit: 'V',
      slots: ['typ', 'max'],
      conditions: ['current'],
      description: 'Voltage across the LED at the stated current.',
    }),
    numberParam({
      key: 'ledMaxCurrent',
      label: 'LED maximum current',
      unit: 'A',
      displayUnit: 'mA',
      slots: ['max'],
      description: 'Highest continuous LED current.',
      columnByDefault: true,
    }),
    numberParam({
      key: 'turnOnTime',
      label: 'Turn-on time',
      unit: 's',
      displayUnit: 'ms',
      slots: ['typ'],
      conditions: ['current'],
      description: 'Time for the resistance to fall after the LED lights.',
      columnByDefault: true,
    }),
    numberParam({
      key: 'turnOffTime',
      label: 'Turn-off time',
      unit: 's',
      displayUnit: 'ms',
      slots: ['typ'],
      description: 'Time for the resistance to recover after the LED goes dark; usually much slower.',
      columnByDefault: true,
    }),
    // Most resistive optocouplers use a CdS cell, so the cadmium caution applies to them too.
    enumParam({
      key: 'cellMaterial',
      label: 'Cell material',
      choices: choices(['cds', 'CdS'], ['cdse', 'CdSe'], ['other', 'Other']),
      description: 'Photoconductive material of the cell; CdS and CdSe contain cadmium.',
    }),
  ],
};
