import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import { formatQuantity, type DerivedNeed, type Margin, type PositionMatch, type PositionResults } from '@understudy/shared-types';
import { useMemo } from 'react';
import { PartCell } from './part-cell';
import { Badge, type ColumnMeta, cx, EmptyState, ExpandableTable, LifecycleBadge, ScoreBar } from '../../../components/ui';
import { pinLayoutFor } from '../../../lib/part-display';
import { formatNeedMargin } from '../lib/display';
import { UnsuitableList } from './unsuitable-list';

const DISPLAY_UNITS: Record<string, string> = { 'V/s': 'V/µs', A: 'mA' };

function formatNeedNumber(value: number, unit: string): string {
  try {
    return formatQuantity(value, unit, { displayUnit: DISPLAY_UNITS[unit], digits: 3 });
  } catch {
    return `${Number(value.toPrecision(3))} ${unit}`.trim();
  }
}

/** "0.25 V/µs", or "4.7 kΩ to 47 kΩ" for a range. */
export function formatNeed(need: DerivedNeed): string {
  const { min, typ, max } = need.value;
  if (min !== undefined && max !== undefined && min !== max) return `${formatNeedNumber(min, need.unit)} to ${formatNeedNumber(max, need.unit)}`;
  const one = typ ?? min ?? max;
  if (one !== undefined) return formatNeedNumber(one, need.unit);
  const v = need.value.value;
  if (typeof v === 'boolean') return v ? 'Yes' : 'No';
  if (typeof v === 'string') return pinLayoutFor(v)?.label ?? v;
  return '—';
}

function MarginTag({ margin, need }: { margin: Margin; need: Pick<DerivedNeed, 'key' | 'unit'> }) {
  return (
    <span className="inline-flex flex-col items-end gap-0.5 whitespace-nowrap">
      <span className={cx('inline-flex items-center gap-1 font-semibold tabular-nums', margin.ok ? 'text-ok' : 'text-danger')}>
        <span aria-hidden="true">{margin.ok ? '✓' : '✕'}</span>
        {formatNeedMargin(need, margin.margin)}
        <span className="sr-only">{margin.ok ? ', meets it' : ', falls short'}</span>
      </span>
      <span className="text-xs text-ink-faint tabular-nums">{margin.actual ?? 'not stated'}</span>
    </span>
  );
}

function MarginsTable({ match, needs }: { match: PositionMatch; needs: readonly DerivedNeed[] }) {
  return (
    <div className="bg-paper/50 px-4 py-4" data-testid="position-margins">
      <div className="overflow-x-auto rounded-md border border-rule bg-card">
        <table className="w-full min-w-[40rem] border-collapse text-left text-sm">
          <caption className="px-3 py-2 text-left text-sm font-semibold text-ink">How {match.part.partNumber} meets each requirement</caption>
          <thead>
            <tr className="border-y border-rule bg-paper/60 text-xs font-semibold tracking-wider text-ink-soft uppercase">
              <th scope="col" className="px-3 py-2">
                Requirement
              </th>
              <th scope="col" className="px-3 py-2">
                Needed
              </th>
              <th scope="col" className="px-3 py-2">
                Actual
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Margin
              </th>
              <th scope="col" className="px-3 py-2">
                Meets it
              </th>
              <th scope="col" className="px-3 py-2">
                Reason
              </th>
            </tr>
          </thead>
          <tbody>
            {match.margins.map((m) => (
              <tr key={m.need} data-need={m.need} className="border-b border-rule last:border-b-0">
                <th scope="row" className="px-3 py-2 font-semibold whitespace-nowrap text-ink">
                  {m.label}
                </th>
                <td className="px-3 py-2 whitespace-nowrap text-ink-soft tabular-nums">{m.needed}</td>
                <td className="px-3 py-2 whitespace-nowrap text-ink tabular-nums">{m.actual ?? '—'}</td>
                <td className={cx('px-3 py-2 text-right whitespace-nowrap tabular-nums', m.ok ? 'text-ok' : 'font-semibold text-danger')}>
                  {formatNeedMargin(
                    needs.find((n) => n.key === m.need),
                    m.margin,
                  )}
                </td>
                <td className="px-3 py-2">{m.ok ? <Badge tone="ok">Yes</Badge> : <Badge tone="danger">No</Badge>}</td>
                <td className="px-3 py-2 text-ink">{m.reason}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

interface TableMeta {
  partNumbers: ReadonlyMap<string, string>;
}

const column = createColumnHelper<PositionMatch>();

const LEADING: ColumnDef<PositionMatch, any>[] = [
  column.display({
    id: 'rank',
    header: 'Rank',
    meta: { align: 'end' } satisfies ColumnMeta,
    cell: ({ row }) => <span className="font-semibold text-ink-soft tabular-nums">{row.index + 1}</span>,
  }),
  column.display({
    id: 'part',
    header: 'Part',
    cell: ({ row }) => <PartCell part={row.original.part} />,
  }),
  column.display({
    id: 'score',
    header: 'Score',
    cell: ({ row }) => <ScoreBar score={row.original.score} />,
  }),
];

const TRAILING: ColumnDef<PositionMatch, any>[] = [
  column.display({
    id: 'lifecycle',
    header: 'Lifecycle',
    cell: ({ row }) => <LifecycleBadge lifecycle={row.original.part.lifecycle} short />,
  }),
  column.display({
    id: 'equivalent',
    header: 'Equivalent',
    cell: ({ row, table }) => {
      const of = row.original.equivalentOf;
      if (of.length === 0) return <span className="text-ink-faint">—</span>;
      const { partNumbers } = table.options.meta as TableMeta;
      const names = of.map((id) => partNumbers.get(id)).filter((n): n is string => !!n);
      return (
        <Badge tone="ok" className="gap-1 whitespace-normal!">
          <span aria-hidden="true">✓</span>
          {names.length > 0 ? `Approved equivalent of ${names.join(', ')}` : `Approved equivalent of ${of.length} ${of.length === 1 ? 'part' : 'parts'}`}
        </Badge>
      );
    },
  }),
];

function needColumn(need: Pick<DerivedNeed, 'key' | 'label' | 'explanation' | 'unit'>): ColumnDef<PositionMatch, any> {
  return column.display({
    id: `need-${need.key}`,
    header: () => <span title={need.explanation}>{need.label}</span>,
    meta: { align: 'end' } satisfies ColumnMeta,
    cell: ({ row }) => {
      const margin = row.original.margins.find((m) => m.need === need.key);
      return margin ? <MarginTag margin={margin} need={need} /> : <span className="text-ink-faint">—</span>;
    },
  });
}

/** What the requirements imply, then every part ranked by how well it meets them, with its margin on each. */
export function PositionResultsView({ results, busy }: { results: PositionResults; busy?: boolean }) {
  // Columns change only when the needs' headings do, so cells keep their identity while the numbers move.
  // Only needs with a number get a column; yes/no needs (single supply, a pin layout) are read in the details.
  const numeric = results.derived.filter((d) => d.value.min !== undefined || d.value.typ !== undefined || d.value.max !== undefined);
  const headings = JSON.stringify(numeric.map((d) => [d.key, d.label, d.explanation, d.unit]));
  const columns = useMemo(
    () => [
      ...LEADING,
      ...(JSON.parse(headings) as Array<[string, string, string, string]>).map(([key, label, explanation, unit]) =>
        needColumn({ key, label, explanation, unit }),
      ),
      ...TRAILING,
    ],
    [headings],
  );
  const partNumbers = new Map([...results.items, ...results.unsuitable].map((i) => [i.part.id, i.part.partNumber]));

  return (
    <div className="flex flex-col gap-5">
      {results.derived.length > 0 && (
        <section aria-labelledby="needs-title" className="flex flex-col gap-2 px-5">
          <h3 id="needs-title" className="text-sm font-semibold text-ink">
            What the position needs
          </h3>
          <ul className="grid gap-2 sm:grid-cols-2">
            {results.derived.map((need) => (
              <li key={need.key} data-need={need.key} className="flex flex-col gap-0.5 rounded-md border border-rule bg-paper/40 px-3 py-2">
                <span className="flex items-baseline justify-between gap-2">
                  <span className="text-sm font-semibold text-ink">{need.label}</span>
                  <span className="font-semibold text-copper-deep tabular-nums">{formatNeed(need)}</span>
                </span>
                <span className="font-mono text-xs text-ink-soft">{need.formula}</span>
                <span className="text-xs text-ink-soft">{need.explanation}</span>
              </li>
            ))}
          </ul>
        </section>
      )}
      <p role="status" className="px-5 text-sm text-ink-soft">
        {results.items.length === 0
          ? `None of the ${results.considered} parts considered meets the requirements.`
          : `${results.items.length} of ${results.considered} considered, best first. Margins are against the needs above.`}
      </p>
      {results.items.length === 0 ? (
        <div className="px-5">
          <EmptyState title="No part fits this position">Relax a requirement, or include obsolete parts; the parts ruled out are listed below.</EmptyState>
        </div>
      ) : (
        <ExpandableTable
          data={results.items}
          columns={columns}
          caption="Parts ranked against the position, best first"
          getRowId={(m) => m.part.id}
          rowName={(m) => m.part.partNumber}
          renderDetails={(m) => <MarginsTable match={m} needs={results.derived} />}
          meta={{ partNumbers } satisfies TableMeta}
          busy={busy}
          isRowHighlighted={(m) => m.equivalentOf.length > 0}
        />
      )}
      <div className="px-5 pb-1">
        <UnsuitableList items={results.unsuitable} />
      </div>
    </div>
  );
}
