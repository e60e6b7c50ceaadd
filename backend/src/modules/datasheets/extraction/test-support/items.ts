import type { TextItem } from '../pdf-text';

/** A text item as pdf-text would give it, with a width estimated at half an em per character. */
export function item(text: string, x: number, y: number, size = 8, opts: { width?: number; page?: number; font?: string } = {}): TextItem {
  return {
    page: opts.page ?? 1,
    text,
    x,
    y,
    width: opts.width ?? text.length * size * 0.5,
    height: size,
    baseline: y + size * 0.8,
    fontSize: size,
    fontName: opts.font ?? 'body',
  };
}

/** One row of cells at the given left edges, all on one baseline. */
export function row(y: number, cells: [x: number, text: string][], size = 8): TextItem[] {
  return cells.map(([x, text]) => item(text, x, y, size));
}
