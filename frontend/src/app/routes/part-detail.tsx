import { useParams } from 'react-router';
import { AlternatesLink } from '../../features/alternates/components/alternates-link';
import { PartDatasheets } from '../../features/datasheets/components/part-datasheets';
import { PartView } from '../../features/parts/components/part-view';
import { Can } from '../../lib/ability';
import { RequireAbility } from './require-ability';

export function PartDetailRoute() {
  const { id = '' } = useParams();
  return (
    <RequireAbility action="read" subject="Part">
      <title>Part · Understudy</title>
      <PartView
        key={id}
        id={id}
        actions={(part) => <AlternatesLink partId={part.id} partNumber={part.partNumber} family={part.family} />}
        aside={(part) => (
          <Can I="read" a="Datasheet">
            <PartDatasheets partId={part.id} allowUpload={!part.archived} />
          </Can>
        )}
      />
    </RequireAbility>
  );
}
