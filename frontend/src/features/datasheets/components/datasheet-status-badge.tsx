import { DATASHEET_STATUS_LABELS, type DatasheetStatus } from '@understudy/shared-types';
import { Badge, Spinner } from '../../../components/ui';

const TONES = {
  queued: 'neutral',
  parsing: 'neutral',
  ready: 'accent',
  applied: 'ok',
  failed: 'danger',
} as const satisfies Record<DatasheetStatus, string>;

export function DatasheetStatusBadge({ status, className }: { status: DatasheetStatus; className?: string }) {
  return (
    <Badge tone={TONES[status]} className={className}>
      {status === 'parsing' && <Spinner className="mr-1 size-3" />}
      {DATASHEET_STATUS_LABELS[status]}
    </Badge>
  );
}
