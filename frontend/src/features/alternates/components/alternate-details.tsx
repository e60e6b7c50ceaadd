import type { BreakdownLine, CandidatePart, RankedAlternate } from '@understudy/shared-types';
import { PinoutDiagram, cx } from '../../../components/ui';
import { effectivePins, packageLabel } from '../../../lib/part-display';
import { formatScore } from '../../../components/ui';
import { formatPoints } from '../lib/display';
import { PinoutClassBadge } from './pinout-class-badge';

/** Where a candidate's points went, criterion by criterion, against the original. */
export function BreakdownTable({
  original,
  name,
  score,
  breakdown,
}: {
  original: CandidatePart;
  /** What the candidate column is headed with: a part number, or "LED + cell" for a pair. */
  name: string;
  score: number;
  breakdown: readonly BreakdownLine[];
}) {
  return (
    <div className="overflow-x-auto rounded-md border border-rule bg-card">
      <table className="w-full min-w-[40rem] border-collapse text-left text-sm">
        <caption className="px-3 py-2 text-left text-sm font-semibold text-ink">
          Why {name} scores {formatScore(score)}
        </caption>
        <thead>
          <tr className="border-y border-rule bg-paper/60 text-xs font-semibold tracking-wider text-ink-soft uppercase">
            <th scope="col" className="px-3 py-2">
              Criterion
            </th>
            <th scope="col" className="px-3 py-2">
              {original.partNumber} <span className="font-normal normal-case">(original)</span>
            </th>
            <th scope="col" className="px-3 py-2">
              {name}
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Points
            </th>
            <th scope="col" className="px-3 py-2">
              Reason
            </th>
          </tr>
        </thead>
        <tbody>
          {breakdown.map((line) => {
            const lost = line.points < 0;
            return (
              <tr key={line.criterion} data-criterion={line.criterion} className="border-b border-rule last:border-b-0">
                <th scope="row" className="px-3 py-2 font-semibold whitespace-nowrap text-ink">
                  {line.label}
                </th>
                <td className="px-3 py-2 whitespace-nowrap text-ink-soft tabular-nums">{line.original ?? '—'}</td>
                <td className="px-3 py-2 whitespace-nowrap text-ink tabular-nums">{line.candidate ?? '—'}</td>
                <td className={cx('px-3 py-2 text-right whitespace-nowrap tabular-nums', lost ? 'font-semibold text-danger' : 'text-ink-soft')}>
                  {formatPoints(line.points)}
                  {line.maxPoints !== 0 && <span className="font-normal text-ink-faint"> of {Math.round(Math.abs(line.maxPoints) * 10) / 10}</span>}
                </td>
                <td className="px-3 py-2 text-ink">{line.reason}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

function PinoutComparison({ original, item }: { original: CandidatePart; item: RankedAlternate }) {
  const { pinout } = item;
  const originalPins = effectivePins(original);
  const candidatePins = effectivePins(item.part);
  return (
    <section aria-label={`Pinout of ${item.part.partNumber} against ${original.partNumber}`} className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <PinoutClassBadge pinoutClass={pinout.class} />
        <span className="text-ink">{pinout.summary}</span>
      </div>
      {pinout.packageChange && (
        <p className="text-sm text-ink">
          <span className="font-semibold">Package change:</span> {packageLabel(pinout.packageChange.from)} →{' '}
          {packageLabel(pinout.packageChange.to)}
        </p>
      )}
      {pinout.differingPins.length > 0 && (
        <p className="text-sm text-ink-soft">
          Pins that differ: <span className="font-semibold text-ink tabular-nums">{pinout.differingPins.join(', ')}</span> (marked on both)
        </p>
      )}
      <div className="grid gap-4 sm:grid-cols-2">
        {[
          { part: original, pins: originalPins, role: 'original' },
          { part: item.part, pins: candidatePins, role: 'candidate' },
        ].map(({ part, pins, role }) => (
          <figure key={role} className="flex flex-col gap-1 rounded-md border border-rule bg-card p-3">
            <figcaption className="text-xs font-semibold tracking-wider text-ink-soft uppercase">
              {part.partNumber} {role === 'original' ? '(original)' : ''} · {part.package ? packageLabel(part.package) : 'package not given'}
            </figcaption>
            {pins ? (
              <PinoutDiagram
                pins={pins}
                title={`Pinout of ${part.partNumber}${part.package ? `, ${part.package}` : ''}, top view`}
                highlightPins={pinout.differingPins}
              />
            ) : (
              <p className="py-4 text-sm text-ink-soft">No pinout recorded.</p>
            )}
          </figure>
        ))}
      </div>
    </section>
  );
}

/** The opened row of a ranking: where the points went, and how the pins line up. */
export function AlternateDetails({ original, item }: { original: CandidatePart; item: RankedAlternate }) {
  return (
    <div className="flex flex-col gap-5 bg-paper/50 px-4 py-4" data-testid="alternate-details">
      <BreakdownTable original={original} name={item.part.partNumber} score={item.score} breakdown={item.breakdown} />
      {item.equivalent?.note && (
        <p className="text-sm text-ink">
          <span className="font-semibold">Editor’s note{item.equivalent.decidedBy ? ` (${item.equivalent.decidedBy.name})` : ''}:</span>{' '}
          {item.equivalent.note}
        </p>
      )}
      <PinoutComparison original={original} item={item} />
    </div>
  );
}
