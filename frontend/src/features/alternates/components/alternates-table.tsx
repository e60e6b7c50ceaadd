import { createColumnHelper, type ColumnDef, type Table } from '@tanstack/react-table';
import { MAX_COMPARE, type CandidatePart, type RankedAlternate } from '@understudy/shared-types';
import { PartCell } from './part-cell';
import { type ColumnMeta, ExpandableTable, LifecycleBadge, ScoreBar } from '../../../components/ui';
import { AlternateDetails } from './alternate-details';
import { PinoutClassBadge } from './pinout-class-badge';
import { RulingControls } from './ruling-controls';

interface TableMeta {
  original: CandidatePart;
  isSelected: (id: string) => boolean;
  /** The original takes one of the comparison's places. */
  selectionFull: boolean;
  onToggle: (id: string) => void;
}

const metaOf = (table: Table<RankedAlternate>) => table.options.meta as TableMeta;
const column = createColumnHelper<RankedAlternate>();

// Defined once at module level: flexRender mounts each cell as a component, so identities must not change.
const COLUMNS: ColumnDef<RankedAlternate, any>[] = [
  column.display({
    id: 'select',
    header: () => <span className="sr-only">Compare</span>,
    cell: ({ row, table }) => {
      const { isSelected, selectionFull, onToggle } = metaOf(table);
      const part = row.original.part;
      const selected = isSelected(part.id);
      return (
        <input
          type="checkbox"
          aria-label={`Compare ${part.partNumber}`}
          title={!selected && selectionFull ? `Up to ${MAX_COMPARE} parts, the original included, can be compared` : undefined}
          checked={selected}
          disabled={!selected && selectionFull}
          onChange={() => onToggle(part.id)}
          className="size-4 accent-copper"
        />
      );
    },
  }),
  column.display({
    id: 'rank',
    header: 'Rank',
    meta: { align: 'end' } satisfies ColumnMeta,
    cell: ({ row }) => <span className="font-semibold text-ink-soft tabular-nums">{row.index + 1}</span>,
  }),
  column.display({
    id: 'part',
    header: 'Part · manufacturer',
    cell: ({ row }) => <PartCell part={row.original.part} />,
  }),
  column.display({
    id: 'score',
    header: 'Score',
    cell: ({ row }) => <ScoreBar score={row.original.score} />,
  }),
  column.display({
    id: 'pinout',
    header: 'Pinout',
    cell: ({ row }) => <PinoutClassBadge pinoutClass={row.original.pinout.class} />,
  }),
  column.display({
    id: 'lifecycle',
    header: 'Lifecycle',
    cell: ({ row }) => <LifecycleBadge lifecycle={row.original.part.lifecycle} short />,
  }),
  column.display({
    id: 'ruling',
    header: 'Equivalent',
    cell: ({ row, table }) => (
      <RulingControls original={metaOf(table).original} candidate={row.original.part} equivalent={row.original.equivalent} />
    ),
  }),
];

export function AlternatesTable({
  original,
  items,
  busy,
  isSelected,
  selectionFull,
  onToggle,
}: {
  original: CandidatePart;
  items: RankedAlternate[];
  busy?: boolean;
  isSelected: (id: string) => boolean;
  selectionFull: boolean;
  onToggle: (id: string) => void;
}) {
  return (
    <ExpandableTable
      data={items}
      columns={COLUMNS}
      caption={`Alternates for ${original.partNumber}, best first`}
      getRowId={(item) => item.part.id}
      rowName={(item) => item.part.partNumber}
      renderDetails={(item) => <AlternateDetails original={original} item={item} />}
      meta={{ original, isSelected, selectionFull, onToggle } satisfies TableMeta}
      busy={busy}
      isRowHighlighted={(item) => item.equivalent?.status === 'approved'}
    />
  );
}
