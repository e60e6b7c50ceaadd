import { PINOUT_CLASS_LABELS, type PinoutClass } from '@understudy/shared-types';
import { Badge } from '../../../components/ui';

const TONES = {
  'drop-in': 'ok',
  adapter: 'warning',
  incompatible: 'danger',
  unknown: 'neutral',
} as const satisfies Record<PinoutClass, string>;

export function PinoutClassBadge({ pinoutClass }: { pinoutClass: PinoutClass }) {
  return (
    <Badge tone={TONES[pinoutClass]} className="gap-1">
      <span aria-hidden="true">{pinoutClass === 'drop-in' ? '●' : pinoutClass === 'adapter' ? '◐' : pinoutClass === 'incompatible' ? '○' : '?'}</span>
      {PINOUT_CLASS_LABELS[pinoutClass]}
    </Badge>
  );
}
