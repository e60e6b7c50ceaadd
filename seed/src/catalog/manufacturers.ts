/** A manufacturer in the demo catalog. Every one is invented; none stands for a real company. */
export interface DemoManufacturer {
  name: string;
  description: string;
}

export const MANUFACTURERS = [
  {
    name: 'Halvard Semiconductor',
    description: 'Bipolar audio op amps, from bargain duals to low-noise preamp parts.',
  },
  {
    name: 'Quillon Microdevices',
    description: 'JFET-input and CMOS op amps for high-impedance buffers and battery gear.',
  },
  {
    name: 'Kestrel Linear',
    description: 'An old linear house whose catalogue still carries a few classic single op amps.',
  },
  {
    name: 'Corvel Analog',
    description: 'Newer rail-to-rail CMOS op amps voiced for 9 V effects and synth modules.',
  },
  {
    name: 'Brightwater Optics',
    description: 'Cadmium sulphide and selenide photocells, and LED-lit resistive optocouplers.',
  },
  {
    name: 'Fenwick Photonics',
    description: 'Cadmium-free light sensors and surface-mount indicator LEDs.',
  },
  {
    name: 'Lumen Row',
    description: 'Through-hole indicator LEDs in every colour, binned for forward voltage.',
  },
  {
    name: 'Tessaly Components',
    description: 'Compact PCB-mount potentiometers in 9 mm and 16 mm bodies.',
  },
  {
    name: 'Orrin & Vale',
    description: 'Panel potentiometers with solder lugs, including ganged and centre-detent types.',
  },
] as const satisfies readonly DemoManufacturer[];

export type DemoManufacturerName = (typeof MANUFACTURERS)[number]['name'];

export const MANUFACTURER_NAMES: readonly DemoManufacturerName[] = MANUFACTURERS.map((m) => m.name);
