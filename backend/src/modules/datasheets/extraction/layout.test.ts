import { describe, expect, it } from 'vitest';
import { bodyFontSize, boxesOf, buildLines, joinItems, splitCells } from './layout';
import { item, row } from './test-support/items';

describe('buildLines', () => {
  it('groups items by baseline, sorts them left to right and orders lines top to bottom', () => {
    const lines = buildLines([...row(120, [[300, '13'], [50, 'Slew rate']]), ...row(100, [[50, 'Parameter'], [300, 'Typ']])]);
    expect(lines.map((l) => l.text)).toEqual(['Parameter  Typ', 'Slew rate  13']);
    expect(lines.map((l) => l.index)).toEqual([0, 1]);
  });

  it('keeps a subscript on its line', () => {
    // "V" then a lowered, smaller "OS", as a symbol is usually set.
    const lines = buildLines([item('V', 200, 100, 8, { width: 5 }), item('OS', 205, 102.5, 5.5, { width: 6 }), item('Offset', 50, 100)]);
    expect(lines).toHaveLength(1);
    expect(lines[0]!.cells.map((c) => c.text)).toEqual(['Offset', 'VOS']);
  });

  it('keeps text stacked at the same x on separate lines even when the boxes touch', () => {
    const lines = buildLines([item('BIG TITLE', 50, 40, 22), item('Maker name', 300, 41, 11), item('PRELIMINARY', 300, 53, 7.5)]);
    const maker = lines.find((l) => l.text.includes('Maker name'))!;
    expect(maker.text).not.toContain('PRELIMINARY');
    expect(lines.some((l) => l.cells.some((c) => c.text === 'PRELIMINARY'))).toBe(true);
  });

  it('puts each page apart', () => {
    const lines = buildLines([item('two', 50, 50, 8, { page: 2 }), item('one', 50, 50, 8, { page: 1 })]);
    expect(lines.map((l) => [l.page, l.text])).toEqual([
      [1, 'one'],
      [2, 'two'],
    ]);
  });
});

describe('splitCells and joinItems', () => {
  it('splits at gaps wider than a word space and joins words with one space', () => {
    const items = [item('Input', 50, 100, 8, { width: 20 }), item('offset', 72.5, 100, 8, { width: 24 }), item('0.5', 200, 100, 8, { width: 12 })];
    expect(splitCells(items).map((c) => c.text)).toEqual(['Input offset', '0.5']);
    expect(joinItems([item('V', 10, 0, 8, { width: 5 }), item('OS', 15, 0, 8, { width: 8 })])).toBe('VOS');
  });
});

describe('boxesOf', () => {
  it('gives one top-left box per line of the items', () => {
    const boxes = boxesOf([item('a', 50, 100, 8, { width: 10 }), item('b', 70, 100, 8, { width: 10 }), item('c', 50, 120, 8, { width: 10 })]);
    expect(boxes).toEqual([
      { x: 50, y: 100, width: 30, height: 8 },
      { x: 50, y: 120, width: 10, height: 8 },
    ]);
  });
});

describe('bodyFontSize', () => {
  it('is the size most characters are set in', () => {
    const lines = buildLines([item('Title', 50, 20, 24), item('A long paragraph of body text in nine point', 50, 60, 9)]);
    expect(bodyFontSize(lines)).toBe(9);
  });
});
