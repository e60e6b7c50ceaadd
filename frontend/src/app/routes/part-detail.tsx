import { useParams } from 'react-router';
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
        aside={(part) => (
          <Can I="read" a="Datasheet">
            <PartDatasheets partId={part.id} allowUpload={!part.archived} />
          </Can>
        )}
      />
    </RequireAbility>
  );
}
