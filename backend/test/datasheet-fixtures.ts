import type { DatasheetSpec } from '@understudy/seed/src/datasheets/datasheet-spec';
import { renderDatasheet } from '@understudy/seed/src/datasheets/render-datasheet';

/** A small invented op amp datasheet; `variant` changes the bytes (and the slew rate) so files do not collide. */
export function opAmpSpec(partNumber: string, manufacturer: string, slewRate = 9, variant = 0): DatasheetSpec {
  return {
    meta: { title: `${partNumber} datasheet`, author: manufacturer, date: new Date(Date.UTC(2025, 2, 14 + variant)) },
    titleBlock: { partNumber, manufacturer, description: 'Dual low-noise operational amplifier', layout: 'banner', details: [`Rev. ${String.fromCharCode(65 + variant)}`] },
    footer: { left: `© 2025 ${manufacturer}`, pageLabel: 'Page {n} of {total}', pageLabelPosition: 'right' },
    pages: [
      {
        blocks: [
          { kind: 'paragraph', text: `The ${partNumber} is a dual operational amplifier for audio gain stages and buffers.` },
          {
            kind: 'table',
            title: 'Electrical characteristics',
            subtitle: 'VS = ±15 V, TA = 25 °C unless otherwise noted',
            rules: 'header',
            columns: [
              { header: 'Parameter', width: 170 },
              { header: 'Symbol', width: 50 },
              { header: 'Min', width: 50, align: 'right' },
              { header: 'Typ', width: 50, align: 'right' },
              { header: 'Max', width: 50, align: 'right' },
              { header: 'Unit', width: 60 },
            ],
            rows: [
              { cells: ['Supply voltage range', 'VS', '±2', '', '±16', 'V'] },
              { cells: ['Slew rate', 'SR', '', String(slewRate), '', 'V/µs'] },
              { cells: ['Gain-bandwidth product', 'GBW', '', '3', '', 'MHz'] },
              { cells: ['Input offset voltage', 'VOS', '', '1', '5', 'mV'] },
            ],
          },
        ],
      },
    ],
  };
}

export const renderOpAmp = (partNumber: string, manufacturer: string, slewRate = 9, variant = 0) =>
  renderDatasheet(opAmpSpec(partNumber, manufacturer, slewRate, variant));
