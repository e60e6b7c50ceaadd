import { lines, makePdf, table } from '../src/modules/datasheets/extraction/test-support/make-pdf';

/**
 * A one-page invented op amp datasheet. `variant` changes the bytes (revision letter), so files do not collide
 * as duplicates; the richer generated corpus lives in seed/src/datasheets for the accuracy benchmark.
 */
export async function renderOpAmp(partNumber: string, manufacturer: string, slewRate = 9, variant = 0): Promise<Buffer> {
  const pdf = await makePdf([
    {
      texts: [
        { text: partNumber, x: 50, y: 50, size: 22, bold: true },
        { text: 'Dual low-noise operational amplifier', x: 50, y: 80, size: 12 },
        { text: `${manufacturer} · Rev. ${String.fromCharCode(65 + variant)}`, x: 50, y: 98, size: 9 },
        ...lines(50, 130, [`The ${partNumber} is a dual operational amplifier for audio gain stages and buffers.`]),
        { text: 'Electrical characteristics', x: 50, y: 170, size: 12, bold: true },
        { text: 'VS = ±15 V, TA = 25 °C unless otherwise noted', x: 50, y: 186, size: 9 },
        ...table({
          columns: [50, 220, 280, 330, 380, 430],
          top: 205,
          rows: [
            ['Parameter', 'Symbol', 'Min', 'Typ', 'Max', 'Unit'],
            ['Supply voltage range', 'VS', '±2', '', '±16', 'V'],
            ['Slew rate', 'SR', '', String(slewRate), '', 'V/µs'],
            ['Gain-bandwidth product', 'GBW', '', '3', '', 'MHz'],
            ['Input offset voltage', 'VOS', '', '1', '5', 'mV'],
          ],
        }),
        { text: `© 2025 ${manufacturer}`, x: 50, y: 800, size: 8 },
        { text: 'Page 1 of 1', x: 480, y: 800, size: 8 },
      ],
    },
  ]);
  return Buffer.from(pdf);
}
