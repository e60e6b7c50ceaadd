import { useId, type ReactNode, type SVGProps } from 'react';
import { cx } from '../cx';

/**
 * A chart with everything that makes it readable without seeing it: a visible title and summary, an SVG with its
 * own title and description, and the numbers behind it as a table.
 */
export function ChartFigure({
  title,
  summary,
  description,
  width,
  height,
  svgProps,
  legend,
  controls,
  table,
  children,
  className,
  testId,
}: {
  title: string;
  /** One visible line under the title. */
  summary?: ReactNode;
  /** Read by assistive technology: what the chart shows, in words. */
  description: string;
  width: number;
  height: number;
  svgProps?: SVGProps<SVGSVGElement>;
  legend?: ReactNode;
  controls?: ReactNode;
  table: ReactNode;
  children: ReactNode;
  className?: string;
  testId?: string;
}) {
  const headingId = useId();
  const titleId = useId();
  const descId = useId();
  return (
    <figure aria-labelledby={headingId} className={cx('flex flex-col gap-3', className)} data-testid={testId}>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h3 id={headingId} className="text-base font-semibold text-ink">
            {title}
          </h3>
          {summary && <p className="text-sm text-ink-soft">{summary}</p>}
        </div>
        {controls}
      </div>
      <svg
        role="img"
        aria-labelledby={titleId}
        aria-describedby={descId}
        viewBox={`0 0 ${width} ${height}`}
        className="h-auto w-full max-w-[50rem] overflow-visible font-sans select-none"
        {...svgProps}
      >
        <title id={titleId}>{title}</title>
        <desc id={descId}>{description}</desc>
        {children}
      </svg>
      {legend}
      <details className="rounded-md border border-rule bg-paper/40 text-sm">
        <summary className="cursor-pointer px-3 py-2 font-semibold text-ink-soft hover:text-ink">Show the numbers as a table</summary>
        <div className="overflow-x-auto border-t border-rule">{table}</div>
      </details>
    </figure>
  );
}

export function ChartLegend({ items }: { items: ReadonlyArray<{ id: string; label: string; colour: string; dash: string }> }) {
  return (
    <ul aria-label="Legend" className="flex flex-wrap gap-x-5 gap-y-1.5 text-sm text-ink">
      {items.map((item) => (
        <li key={item.id} className="inline-flex items-center gap-2">
          <svg aria-hidden="true" viewBox="0 0 28 10" className="h-2.5 w-7">
            <line x1="1" y1="5" x2="27" y2="5" stroke={item.colour} strokeWidth="2.5" strokeDasharray={item.dash || undefined} />
          </svg>
          {item.label}
        </li>
      ))}
    </ul>
  );
}

export function ChartTable({ caption, head, rows }: { caption: string; head: readonly string[]; rows: ReadonlyArray<readonly ReactNode[]> }) {
  return (
    <table className="w-full border-collapse text-left text-sm">
      <caption className="sr-only">{caption}</caption>
      <thead>
        <tr className="border-b border-rule">
          {head.map((h) => (
            <th key={h} scope="col" className="px-3 py-2 text-xs font-semibold whitespace-nowrap text-ink-soft">
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row, i) => (
          <tr key={i} className="border-b border-rule last:border-b-0">
            {row.map((cell, j) =>
              j === 0 ? (
                <th key={j} scope="row" className="px-3 py-2 font-semibold whitespace-nowrap text-ink">
                  {cell}
                </th>
              ) : (
                <td key={j} className="px-3 py-2 whitespace-nowrap text-ink-soft tabular-nums">
                  {cell}
                </td>
              ),
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
