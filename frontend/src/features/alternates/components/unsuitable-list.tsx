import type { EquivalentDto, Unsuitable } from '@understudy/shared-types';
import { useId, useState } from 'react';
import { Link } from 'react-router';
import { Button, CadmiumMark, Card, EquivalentFlag, LifecycleBadge, SectionHeading } from '../../../components/ui';
import { containsCadmium } from '../../../lib/part-display';

const SHOWN_AT_FIRST = 8;

/** Candidates ruled out before scoring (wrong supply, obsolete, not a drop-in), each with what ruled it out. */
export function UnsuitableList({
  items,
  rulingOf,
  title = 'Not suitable',
}: {
  items: Unsuitable[];
  rulingOf?: (partId: string) => EquivalentDto | undefined;
  title?: string;
}) {
  const headingId = useId();
  const [all, setAll] = useState(false);
  if (items.length === 0) return null;
  const shown = all ? items : items.slice(0, SHOWN_AT_FIRST);
  return (
    <Card aria-labelledby={headingId}>
      <SectionHeading id={headingId} aside={<span className="text-xs text-ink-faint">{items.length} ruled out</span>}>
        {title}
      </SectionHeading>
      <ul aria-labelledby={headingId} className="divide-y divide-rule">
        {shown.map(({ part, reasons }) => {
          const ruling = rulingOf?.(part.id);
          return (
            <li key={part.id} className="flex flex-col gap-1 px-5 py-3 sm:flex-row sm:items-start sm:gap-4" data-part={part.id}>
              <div className="flex min-w-44 flex-col gap-1">
                <span className="inline-flex items-center gap-1.5">
                  <Link to={`/parts/${part.id}`} className="font-semibold text-ink underline-offset-2 hover:text-copper-deep hover:underline">
                    {part.partNumber}
                  </Link>
                  {containsCadmium(part.parameters) && <CadmiumMark />}
                </span>
                <span className="text-xs text-ink-soft">{part.manufacturer.name}</span>
                <span className="flex flex-wrap gap-1">
                  {part.lifecycle !== 'active' && <LifecycleBadge lifecycle={part.lifecycle} short />}
                  {ruling && <EquivalentFlag equivalent={ruling} />}
                </span>
              </div>
              <ul aria-label={`Why ${part.partNumber} is not suitable`} className="flex list-disc flex-col gap-0.5 pl-5 text-sm text-ink marker:text-danger sm:pl-4">
                {reasons.map((reason) => (
                  <li key={reason}>{reason}</li>
                ))}
              </ul>
            </li>
          );
        })}
      </ul>
      {items.length > SHOWN_AT_FIRST && (
        <div className="border-t border-rule px-5 py-2">
          <Button variant="ghost" size="sm" onClick={() => setAll((v) => !v)} aria-expanded={all}>
            {all ? 'Show fewer' : `Show all ${items.length}`}
          </Button>
        </div>
      )}
    </Card>
  );
}
