import { LIFECYCLE_LABELS, ROHS_LABELS, type Lifecycle, type RohsStatus } from '@understudy/shared-types';
import { Badge } from './badge';
import { cx } from './cx';

const LIFECYCLE_TONES = {
  active: 'ok',
  nrnd: 'warning',
  'last-time-buy': 'warning',
  obsolete: 'danger',
} as const satisfies Record<Lifecycle, string>;

/** Short forms for tight cells; the full label rides along as the accessible name. */
const LIFECYCLE_SHORT: Record<Lifecycle, string> = {
  active: 'Active',
  nrnd: 'NRND',
  'last-time-buy': 'Last-time buy',
  obsolete: 'Obsolete',
};

export function LifecycleBadge({ lifecycle, short = false, className }: { lifecycle: Lifecycle; short?: boolean; className?: string }) {
  const label = LIFECYCLE_LABELS[lifecycle];
  return (
    <Badge tone={LIFECYCLE_TONES[lifecycle]} className={className}>
      {short && LIFECYCLE_SHORT[lifecycle] !== label ? (
        <abbr title={label} className="no-underline">
          {LIFECYCLE_SHORT[lifecycle]}
        </abbr>
      ) : (
        label
      )}
    </Badge>
  );
}

const ROHS_TONES = {
  compliant: 'ok',
  exempt: 'accent',
  'non-compliant': 'danger',
  unknown: 'neutral',
} as const satisfies Record<RohsStatus, string>;

const ROHS_SHORT: Record<RohsStatus, string> = {
  compliant: 'RoHS',
  exempt: 'RoHS exempt',
  'non-compliant': 'Not RoHS',
  unknown: 'RoHS ?',
};

export function RohsBadge({ status, short = false, className }: { status: RohsStatus; short?: boolean; className?: string }) {
  const label = ROHS_LABELS[status];
  return (
    <Badge tone={ROHS_TONES[status]} className={className}>
      {short ? (
        <abbr title={label} className="no-underline">
          <span aria-hidden="true">{ROHS_SHORT[status]}</span>
          <span className="sr-only">{label}</span>
        </abbr>
      ) : (
        label
      )}
    </Badge>
  );
}

/** A warning triangle with "Cd" for parts with a cadmium cell; its name is read out in full. */
export function CadmiumMark({ className }: { className?: string }) {
  return (
    <span role="img" aria-label="Contains cadmium" title="Contains cadmium" className={cx('inline-flex shrink-0 text-warn', className)}>
      <svg aria-hidden="true" viewBox="0 0 20 18" className="h-4 w-[1.1rem]">
        <path d="M10 1.2 19 16.8H1z" fill="currentColor" stroke="currentColor" strokeWidth="1.2" strokeLinejoin="round" />
        <text x="10" y="14.6" textAnchor="middle" fontSize="7.2" fontWeight="700" fill="#fffdf9">
          Cd
        </text>
      </svg>
    </span>
  );
}
