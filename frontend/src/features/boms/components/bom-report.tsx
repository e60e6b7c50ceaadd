import { LIFECYCLE_LABELS, type BomDetailDto } from '@understudy/shared-types';
import { useMemo } from 'react';
import { Link } from 'react-router';
import { Button, buttonClasses, CadmiumCaution, RecordQueryState } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { NO_SUCH_BOM, useBom } from '../api/get-bom';
import { RISK_CATEGORIES, compareWorstFirst } from '../lib/lines';
import { LineStatusBadge } from './line-status-badge';

const HEADINGS = ['Row', 'Part number', 'Matched part', 'Qty', 'Designators', 'Status', 'Risk', 'Replacement', 'Note'];

function Report({ bom }: { bom: BomDetailDto }) {
  const lines = useMemo(() => [...bom.lines].sort(compareWorstFirst), [bom.lines]);
  const cadmium = bom.summary.cadmium > 0 || bom.lines.some((l) => l.replacement?.part.cadmium);
  const printedAt = useMemo(() => new Date().toISOString(), []);

  return (
    <article className="flex flex-col gap-5 text-ink print:gap-3 print:text-[10pt]">
      <title>{`Report: ${bom.name} · Understudy`}</title>
      <div className="flex flex-wrap items-center justify-between gap-2 print:hidden">
        <Link to={`/boms/${bom.id}`} className={buttonClasses('ghost')}>
          ← Back to the BOM
        </Link>
        <Button onClick={() => window.print()}>Print</Button>
      </div>

      <header className="flex flex-col gap-1 border-b-2 border-ink pb-3">
        <p className="text-xs font-semibold tracking-wider text-copper-deep uppercase print:text-ink">Understudy · BOM check report</p>
        <h1 className="text-2xl font-bold tracking-tight">{bom.name}</h1>
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-sm">
          <dt className="text-ink-soft">Owner</dt>
          <dd>{bom.owner.name}</dd>
          {bom.fileName && (
            <>
              <dt className="text-ink-soft">File</dt>
              <dd>{bom.fileName}</dd>
            </>
          )}
          <dt className="text-ink-soft">Last checked</dt>
          <dd>{formatDateTime(bom.lastCheckedAt, 'Not yet')}</dd>
          <dt className="text-ink-soft">Printed</dt>
          <dd>{formatDateTime(printedAt)}</dd>
        </dl>
      </header>

      <section aria-labelledby="report-summary-title" className="flex flex-col gap-2 break-inside-avoid">
        <h2 id="report-summary-title" className="text-lg font-semibold">
          Summary
        </h2>
        <p className="text-sm">{bom.summary.text}</p>
        <ul aria-label="Counts" className="flex flex-wrap gap-x-5 gap-y-1 text-sm">
          <li>
            <span className="font-bold tabular-nums">{bom.summary.lines.toLocaleString()}</span> lines
          </li>
          {RISK_CATEGORIES.map((c) => (
            <li key={c.key}>
              <span className="font-bold tabular-nums">{bom.summary[c.key].toLocaleString()}</span> {c.label}
            </li>
          ))}
          <li>
            <span className="font-bold tabular-nums">{bom.summary.replaced.toLocaleString()}</span> replacements chosen
          </li>
        </ul>
      </section>

      {cadmium && <CadmiumCaution />}

      <section aria-labelledby="report-lines-title" className="flex flex-col gap-2">
        <h2 id="report-lines-title" className="text-lg font-semibold">
          Lines, worst first
        </h2>
        <table className="w-full border-collapse text-left text-xs print:text-[8.5pt]">
          <caption className="sr-only">Lines of {bom.name}</caption>
          <thead className="print:table-header-group">
            <tr className="border-b-2 border-ink">
              {HEADINGS.map((h) => (
                <th key={h} scope="col" className="px-2 py-1.5 font-semibold whitespace-nowrap">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {lines.map((line) => (
              <tr key={line.id} className="border-b border-rule align-top break-inside-avoid">
                <td className="px-2 py-1 tabular-nums">{line.row}</td>
                <td className="px-2 py-1 font-mono break-all">{line.partNumber}</td>
                <td className="px-2 py-1">
                  {line.match.part ? (
                    <>
                      <span className="font-semibold">{line.match.part.partNumber}</span>
                      <span className="block text-ink-soft">
                        {line.match.part.manufacturer} · {LIFECYCLE_LABELS[line.match.part.lifecycle]}
                      </span>
                    </>
                  ) : (
                    '—'
                  )}
                </td>
                <td className="px-2 py-1 tabular-nums">{line.quantity ?? '—'}</td>
                <td className="px-2 py-1 break-words">{line.designators.join(', ')}</td>
                <td className="px-2 py-1">
                  <LineStatusBadge status={line.status} className="print:border-ink print:bg-transparent print:text-ink" />
                </td>
                <td className="px-2 py-1">{line.risk}</td>
                <td className="px-2 py-1">
                  {line.replacement ? (
                    <>
                      <span className="font-semibold">{line.replacement.part.partNumber}</span>
                      <span className="block text-ink-soft">{line.replacement.part.manufacturer}</span>
                    </>
                  ) : (
                    '—'
                  )}
                </td>
                <td className="px-2 py-1">{line.replacement?.note ?? ''}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
    </article>
  );
}

/** The BOM as a document to print or save as PDF: the app around it is hidden on paper. */
export function BomReport({ bomId }: { bomId: string }) {
  const bom = useBom(bomId);
  return (
    <RecordQueryState query={bom} loadingLabel="Loading the report…" missing={NO_SUCH_BOM}>
      {(bom) => <Report bom={bom} />}
    </RecordQueryState>
  );
}
