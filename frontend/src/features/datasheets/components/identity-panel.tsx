import { FAMILIES, type DatasheetIdentity, type ExtractionSource } from '@understudy/shared-types';
import type { ReactNode } from 'react';
import { Button } from '../../../components/ui';
import { packageLabel } from '../../../lib/part-display';
import { ConfidenceMeter } from './confidence-meter';

interface Finding {
  confidence: number;
  source: ExtractionSource | null;
}

function Row({
  label,
  finding,
  children,
  onShowSource,
}: {
  label: string;
  finding: Finding | null;
  children: ReactNode;
  onShowSource: (source: ExtractionSource) => void;
}) {
  return (
    <div className="flex flex-col gap-1 px-5 py-2.5 sm:grid sm:grid-cols-[9rem_minmax(0,1fr)] sm:gap-x-4" data-identity={label}>
      <dt className="text-sm text-ink-faint">{label}</dt>
      <dd className="flex min-w-0 flex-col gap-1">
        {finding ? (
          <>
            <span className="text-sm font-semibold break-words text-ink">{children}</span>
            <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <ConfidenceMeter confidence={finding.confidence} />
              {finding.source && (
                <Button variant="ghost" size="sm" className="-ml-2 text-copper-deep" onClick={() => onShowSource(finding.source!)}>
                  Show source, page {finding.source.page}
                  <span className="sr-only"> for the {label.toLowerCase()}</span>
                </Button>
              )}
            </span>
          </>
        ) : (
          <span className="text-sm text-ink-faint">Not found in the document</span>
        )}
      </dd>
    </div>
  );
}

/** What the document says it is about, each finding with how sure the parser is and where it read it. */
export function IdentityPanel({
  identity,
  onShowSource,
}: {
  identity: DatasheetIdentity;
  onShowSource: (source: ExtractionSource) => void;
}) {
  const pins = identity.pinMap
    ? Object.entries(identity.pinMap.value).sort(([a], [b]) => Number(a) - Number(b))
    : [];
  return (
    <dl className="divide-y divide-rule">
      <Row label="Family" finding={identity.family} onShowSource={onShowSource}>
        {identity.family && FAMILIES[identity.family.value].label}
      </Row>
      <Row label="Part number" finding={identity.partNumber} onShowSource={onShowSource}>
        {identity.partNumber?.value}
      </Row>
      <Row label="Manufacturer" finding={identity.manufacturer} onShowSource={onShowSource}>
        {identity.manufacturer?.value}
      </Row>
      <Row label="Package" finding={identity.package} onShowSource={onShowSource}>
        {identity.package && packageLabel(identity.package.value)}
      </Row>
      {identity.pinMap && (
        <Row label="Pinout" finding={identity.pinMap} onShowSource={onShowSource}>
          <ol aria-label="Pins" className="flex flex-wrap gap-x-3 gap-y-0.5 font-normal">
            {pins.map(([n, fn]) => (
              <li key={n} className="whitespace-nowrap">
                <span className="text-ink-faint tabular-nums">{n}</span> {fn}
              </li>
            ))}
          </ol>
        </Row>
      )}
    </dl>
  );
}
