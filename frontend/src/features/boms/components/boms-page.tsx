import { subject } from '@casl/ability';
import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import type { BomDto } from '@understudy/shared-types';
import { Link, useSearchParams } from 'react-router';
import { Badge, Card, DataTable, EmptyState, ErrorState, LoadingState, PageHeader, buttonClasses, cx } from '../../../components/ui';
import { useAppAbility } from '../../../lib/ability';
import { formatDateTime } from '../../../lib/format';
import { useBoms } from '../api/get-boms';
import type { BomScope } from '../keys';
import { SummaryCounts } from './summary-counts';

const SCOPE_LABELS: Record<BomScope, string> = { mine: 'Mine', shared: 'Shared with me', all: 'All' };

const column = createColumnHelper<BomDto>();

function columnsFor(myId: string): ColumnDef<BomDto, any>[] {
  return [
    column.accessor('name', {
      header: 'Name',
      cell: ({ row }) => (
        <span className="flex flex-col">
          <Link to={`/boms/${row.original.id}`} className="font-semibold text-ink underline-offset-2 hover:text-copper-deep hover:underline">
            {row.original.name}
          </Link>
          {row.original.fileName && <span className="text-xs text-ink-faint">{row.original.fileName}</span>}
        </span>
      ),
    }),
    column.accessor((b) => b.owner.name, {
      id: 'owner',
      header: 'Owner',
      cell: ({ row }) => (row.original.owner.id === myId ? 'You' : row.original.owner.name),
    }),
    column.accessor('lineCount', {
      header: 'Lines',
      cell: ({ getValue }) => <span className="tabular-nums">{(getValue() as number).toLocaleString()}</span>,
    }),
    column.display({ id: 'summary', header: 'Summary', cell: ({ row }) => <SummaryCounts summary={row.original.summary} /> }),
    column.accessor((b) => b.lastCheckedAt ?? '', {
      id: 'lastChecked',
      header: 'Last checked',
      cell: ({ row }) => <span className="whitespace-nowrap text-ink-soft">{formatDateTime(row.original.lastCheckedAt, 'Not yet')}</span>,
    }),
    column.display({
      id: 'shared',
      header: () => <span className="sr-only">Sharing</span>,
      cell: ({ row }) => {
        const bom = row.original;
        if (bom.sharedWith.some((p) => p.id === myId)) return <Badge tone="accent">Shared with you</Badge>;
        if (bom.owner.id === myId && bom.sharedWith.length > 0) return <Badge>Shared with {bom.sharedWith.length}</Badge>;
        return null;
      },
    }),
  ];
}

function scopeFrom(value: string | null, allowAll: boolean): BomScope {
  if (value === 'shared' || value === 'mine') return value;
  if (value === 'all' && allowAll) return 'all';
  return 'mine';
}

/** Saved BOMs: one's own, those shared with one, and (for editors and admins) everyone's. */
export function BomsPage({ currentUserId }: { currentUserId: string }) {
  const ability = useAppAbility();
  const [params, setParams] = useSearchParams();
  // Reading a stranger's BOM is what "All" adds; the rule decides, not the role name.
  const allowAll = ability.can('read', subject('Bom', { ownerId: '', sharedWith: [] }));
  const scope = scopeFrom(params.get('scope'), allowAll);
  const scopes: BomScope[] = allowAll ? ['mine', 'shared', 'all'] : ['mine', 'shared'];
  const boms = useBoms(scope);

  const newLink = (
    <Link to="/boms/new" className={buttonClasses('primary')}>
      Check a BOM
    </Link>
  );

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title="BOMs"
        description="Check a design's parts list before ordering: which lines are at risk, and what may stand in for them."
        actions={newLink}
      />
      <div role="group" aria-label="Which BOMs" className="inline-flex self-start rounded-md border border-rule-strong bg-card p-0.5">
        {scopes.map((s) => (
          <button
            key={s}
            type="button"
            aria-pressed={scope === s}
            onClick={() => setParams(s === 'mine' ? {} : { scope: s }, { replace: true })}
            className={cx(
              'h-8 rounded px-3 text-sm font-semibold transition-colors',
              scope === s ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-deep hover:text-ink',
            )}
          >
            {SCOPE_LABELS[s]}
          </button>
        ))}
      </div>
      {boms.isPending ? (
        <LoadingState label="Loading BOMs…" />
      ) : boms.isError ? (
        <ErrorState message={boms.error.message} onRetry={() => void boms.refetch()} />
      ) : boms.data.length === 0 ? (
        scope === 'shared' ? (
          <EmptyState title="Nothing is shared with you yet">When a colleague shares a BOM with you, it shows up here, read-only.</EmptyState>
        ) : (
          <EmptyState title="No BOMs checked yet" action={newLink}>
            Paste rows from a spreadsheet or upload a CSV: each line is matched to the catalog, with its risks and what may
            replace it.
          </EmptyState>
        )
      ) : (
        <Card>
          <DataTable
            data={boms.data}
            columns={columnsFor(currentUserId)}
            caption={`BOMs: ${SCOPE_LABELS[scope]}`}
            getRowId={(b) => b.id}
          />
        </Card>
      )}
    </div>
  );
}
