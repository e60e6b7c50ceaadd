import { booleanParam, choices, enumParam, numberParam } from './define';
import type { FamilyDefinition } from './types';

export const POTENTIOMETER: FamilyDefinition = {
  key: 'potentiometer',
  label: 'Potentiometer',
  pluralLabel: 'Potentiometers',
  description: 'Rotary potentiometers: volume, tone and trim controls.',
  parameters: [
    numberParam({
      key: 'resistance',
      label: 'Resistance',
      unit: 'Ω',
      slots: ['typ'],
      description: 'Track resistance end to end.',
      columnByDefault: true,
    }),
    // Letter codes (A, B, C) mean different tapers in different regions, so the labels spell the law out.
    enumParam({
      key: 'taper',
      label: 'Taper',
      choices: choices(['linear', 'Linear'], ['log', 'Logarithmic (audio)'], ['reverse-log', 'Reverse logarithmic']),
      description: 'How resistance follows rotation.',
      columnByDefault: true,
    }),
    numberParam({
      key: 'tolerance',
      label: 'Tolerance',
      unit: '%',
      slots: ['typ'],
      precision: 2,
      description: 'Tolerance of the track resistance, ± percent.',
    }),
    numberParam({
      key: 'powerRating',
      label: 'Power rating',
      unit: 'W',
      slots: ['max'],
      description: 'Highest power across the whole track.',
    }),
    numberParam({
      key: 'gangs',
      label: 'Gangs',
      slots: ['typ'],
      precision: 1,
      description: 'Tracks on one shaft: 1 for mono, 2 for stereo.',
      columnByDefault: true,
    }),
    numberParam({
      key: 'bodySize',
      label: 'Body size',
      unit: 'm',
      displayUnit: 'mm',
      slots: ['typ'],
      description: 'Body diameter or width, e.g. 9, 16 or 24 mm.',
      columnByDefault: true,
    }),
    enumParam({
      key: 'shaftType',
      label: 'Shaft',
      choices: choices(['knurled', 'Knurled'], ['d-flat', 'D-flat'], ['smooth', 'Smooth'], ['slotted', 'Slotted']),
      description: 'Shaft shape, which decides the knobs that fit.',
    }),
    numberParam({
      key: 'shaftLength',
      label: 'Shaft length',
      unit: 'm',
      displayUnit: 'mm',
      slots: ['typ'],
      description: 'Shaft length from the mounting face.',
    }),
    enumParam({
      key: 'mounting',
      label: 'Mounting',
      choices: choices(
        ['pcb-vertical', 'PCB, vertical'],
        ['pcb-right-angle', 'PCB, right angle'],
        ['solder-lug', 'Solder lugs'],
        ['panel', 'Panel'],
      ),
      description: 'How the pot is fixed and wired.',
    }),
    booleanParam({
      key: 'centreDetent',
      label: 'Centre detent',
      description: 'A click at mid-rotation, usual on balance and EQ controls.',
    }),
  ],
};
