import { Alert } from '../../../components/ui';
import { BOM_REJECTION_TITLES, bomRejectionOf } from '../api/bom-rejection';

/**
 * Why the BOM could not be read or saved: the reason, the server's words, and the rows it names. What the person
 * pasted or chose stays where it was, so they can fix it and try again.
 */
export function RejectionNotice({ error, fallbackTitle }: { error: unknown; fallbackTitle: string }) {
  const details = bomRejectionOf(error);
  const message = error instanceof Error ? error.message : 'Something went wrong. Try again.';
  return (
    <div className="flex flex-col gap-3">
      <Alert tone="error" title={details ? BOM_REJECTION_TITLES[details.reason] : fallbackTitle}>
        {message} Your rows are still here: fix them and try again.
      </Alert>
      {details && details.rows.length > 0 && (
        <div className="max-h-64 overflow-auto rounded-md border border-danger/30">
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">
              Rows to fix
            </caption>
            <thead>
              <tr className="border-b border-rule bg-danger-wash/50">
                <th scope="col" className="px-4 py-2 text-xs font-semibold tracking-wider text-ink-soft uppercase">
                  Row
                </th>
                <th scope="col" className="px-4 py-2 text-xs font-semibold tracking-wider text-ink-soft uppercase">
                  What is wrong
                </th>
              </tr>
            </thead>
            <tbody>
              {details.rows.map((r, i) => (
                <tr key={`${r.row}-${i}`} className="border-b border-rule last:border-b-0">
                  <td className="px-4 py-2 font-semibold text-ink tabular-nums">{r.row}</td>
                  <td className="px-4 py-2 text-ink">{r.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
