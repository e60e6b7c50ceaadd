import type { CandidatePart } from '@understudy/shared-types';
import { Link } from 'react-router';
import { containsCadmium, packageLabel } from '../../../lib/part-display';
import { CadmiumMark } from '../../../components/ui';

/** A ranked part as both result tables show it: number (linked), a cadmium mark, manufacturer and package. */
export function PartCell({ part }: { part: CandidatePart }) {
  return (
    <span className="flex flex-col">
      <span className="inline-flex items-center gap-1.5 whitespace-nowrap">
        <Link to={`/parts/${part.id}`} className="font-semibold text-ink underline-offset-2 hover:text-copper-deep hover:underline">
          {part.partNumber}
        </Link>
        {containsCadmium(part.parameters) && <CadmiumMark />}
      </span>
      <span className="text-xs text-ink-soft">{part.manufacturer.name}</span>
      {part.package && <span className="text-xs text-ink-faint">{packageLabel(part.package)}</span>}
    </span>
  );
}
