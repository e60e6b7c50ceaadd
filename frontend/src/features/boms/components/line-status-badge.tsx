import { LINE_STATUS_LABELS, type LineStatus } from '@understudy/shared-types';
import { Badge } from '../../../components/ui';
import { LINE_STATUS_TONES } from '../lib/lines';

export function LineStatusBadge({ status, className }: { status: LineStatus; className?: string }) {
  return (
    <Badge tone={LINE_STATUS_TONES[status]} className={className}>
      {LINE_STATUS_LABELS[status]}
    </Badge>
  );
}
