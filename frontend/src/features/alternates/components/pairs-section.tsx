import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import { formatQuantity, type CandidatePart, type RankedPair, type RankedPairs } from '@understudy/shared-types';
import { useId, type ReactNode } from 'react';
import { Card, type ColumnMeta, EmptyState, ExpandableTable, LifecycleBadge, RohsBadge, ScoreBar, SectionHeading } from '../../../components/ui';
import { BreakdownTable } from './alternate-details';
import { PartCell } from './part-cell';

const ohms = (v: number) => (Number.isFinite(v) ? formatQuantity(v, 'Ω', { digits: 2 }) : 'open circuit');
// Light is read in plain lux (1600 lx), as meters and datasheets give it, not klx.
const lux = (v: number) => `${Number(v.toPrecision(2))} lx`;

const column = createColumnHelper<RankedPair>();

// Defined once at module level: flexRender mounts each cell as a component, so identities must not change.
const COLUMNS: ColumnDef<RankedPair, any>[] = [
  column.display({
    id: 'rank',
    header: 'Rank',
    meta: { align: 'end' } satisfies ColumnMeta,
    cell: ({ row }) => <span className="font-semibold text-ink-soft tabular-nums">{row.index + 1}</span>,
  }),
  column.display({
    id: 'parts',
    header: 'LED + photoresistor',
    cell: ({ row }) => (
      <span className="flex items-start gap-2">
        <PartCell part={row.original.led} />
        <span aria-hidden="true" className="pt-0.5 font-semibold text-ink-faint">
          +
        </span>
        <PartCell part={row.original.cell} />
      </span>
    ),
  }),
  column.display({
    id: 'score',
    header: 'Score',
    cell: ({ row }) => <ScoreBar score={row.original.score} />,
  }),
  column.display({
    id: 'onResistance',
    header: 'On resistance (estimate)',
    cell: ({ row }) => {
      const { estimate, driveCurrentA } = row.original;
      const r = estimate.resistanceOhms;
      return (
        <span className="flex flex-col">
          <span className="font-semibold text-ink tabular-nums">{ohms(r.typical)}</span>
          <span className="text-xs text-ink-soft tabular-nums">
            {ohms(r.low)} to {ohms(r.high)} at {formatQuantity(driveCurrentA, 'A', { displayUnit: 'mA' })}
          </span>
        </span>
      );
    },
  }),
  column.display({
    id: 'lifecycle',
    header: 'Lifecycle',
    cell: ({ row }) => <LifecycleBadge lifecycle={row.original.lifecycle} short />,
  }),
  column.display({
    id: 'rohs',
    header: 'RoHS',
    cell: ({ row }) => <RohsBadge status={row.original.rohsStatus} short />,
  }),
];

function Figure({ label, children, hint }: { label: string; children: ReactNode; hint?: ReactNode }) {
  return (
    <div className="rounded-md border border-rule bg-card px-3 py-2">
      <dt className="text-xs text-ink-faint">{label}</dt>
      <dd className="text-lg font-bold text-ink tabular-nums">{children}</dd>
      {hint && <dd className="text-xs text-ink-soft tabular-nums">{hint}</dd>}
    </div>
  );
}

/** The opened row of a pair: where the points went, what the estimate rests on, and that it is only an estimate. */
function PairDetails({ original, pair }: { original: CandidatePart; pair: RankedPair }) {
  const { estimate } = pair;
  const r = estimate.resistanceOhms;
  return (
    <div className="flex flex-col gap-5 bg-paper/50 px-4 py-4" data-testid="pair-details">
      <BreakdownTable original={original} name={pair.partNumber} score={pair.score} breakdown={pair.breakdown} />
      <p className="text-sm text-ink">
        <span className="font-semibold">Layout:</span> {pair.pinout.summary} Mount the LED facing the cell,{' '}
        {formatQuantity(pair.spacingM, 'm', { displayUnit: 'mm' })} apart, and shield both from outside light.
      </p>
      <section aria-label={`Estimate for ${pair.partNumber}`} className="flex flex-col gap-3">
        <dl className="grid gap-3 sm:grid-cols-3">
          <Figure label="Typical on resistance" hint={`range ${ohms(r.low)} to ${ohms(r.high)}`}>
            {ohms(r.typical)}
          </Figure>
          <Figure label="Light at the cell" hint={`${Math.round(estimate.spectralFactor * 100)} % of it in the cell’s band`}>
            {lux(estimate.illuminanceLux)}
          </Figure>
          <Figure label="LED current · spacing">
            {formatQuantity(pair.driveCurrentA, 'A', { displayUnit: 'mA' })} · {formatQuantity(pair.spacingM, 'm', { displayUnit: 'mm' })}
          </Figure>
        </dl>
        <div className="rounded-md border border-rule bg-card text-sm">
          <h4 className="border-b border-rule px-3 py-2 font-semibold text-ink">Assumptions ({estimate.assumptions.length})</h4>
          <ul className="flex list-disc flex-col gap-1 py-2 pr-3 pl-8 text-ink">
            {estimate.assumptions.map((a) => (
              <li key={a}>{a}</li>
            ))}
          </ul>
        </div>
        <p className="text-sm font-semibold text-warn">{estimate.note}</p>
      </section>
    </div>
  );
}

/**
 * For a resistive optocoupler: an LED and a photoresistor that together could stand in for it, each pair scored as
 * the optocoupler it would make. Its on resistance is an estimate, and the section says so.
 */
export function PairsSection({
  original,
  pairs,
  busy,
  emptyAction,
}: {
  original: CandidatePart;
  pairs: RankedPairs;
  busy?: boolean;
  /** Offered in the empty state, e.g. to switch off "drop-in only". */
  emptyAction?: ReactNode;
}) {
  const headingId = useId();
  return (
    <Card aria-labelledby={headingId}>
      <SectionHeading id={headingId}>LED + photoresistor pairs</SectionHeading>
      {pairs.items.length === 0 ? (
        <div className="px-5 py-4">
          <EmptyState title="No LED + photoresistor pairs" action={emptyAction}>
            {pairs.note}
          </EmptyState>
        </div>
      ) : (
        <>
          <div className="flex flex-col gap-1 px-5 pt-3 text-sm text-ink-soft">
            <p>
              Best {pairs.items.length} of {pairs.considered} pairs considered, each scored out of 100 as the optocoupler it would make. Two
              parts in place of one package: the board layout changes.
            </p>
            <p>{pairs.note}</p>
          </div>
          <div className="py-3">
            <ExpandableTable
              data={pairs.items}
              columns={COLUMNS}
              caption={`LED + photoresistor pairs for ${original.partNumber}, best first`}
              getRowId={(pair) => pair.id}
              rowName={(pair) => pair.partNumber}
              renderDetails={(pair) => <PairDetails original={original} pair={pair} />}
              busy={busy}
            />
          </div>
        </>
      )}
    </Card>
  );
}
