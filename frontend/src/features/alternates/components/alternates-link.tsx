import type { FamilyKey } from '@understudy/shared-types';
import { Link } from 'react-router';
import { buttonClasses } from '../../../components/ui';

/** The way from a part to its stand-ins; optocouplers are ranked as their LED and cell, so they have none. */
export function AlternatesLink({ partId, partNumber, family }: { partId: string; partNumber: string; family: FamilyKey }) {
  if (family === 'optocoupler') return null;
  return (
    <Link to={`/parts/${partId}/alternates`} className={buttonClasses('secondary', 'sm')} aria-label={`Alternates for ${partNumber}`}>
      Alternates
    </Link>
  );
}
