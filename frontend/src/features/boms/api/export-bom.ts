import { apiUrl } from '../../../lib/api-client';

/** The checked BOM as CSV: the original columns untouched, then the check's own. A plain download link. */
export function bomExportUrl(id: string): string {
  return apiUrl(`/boms/${encodeURIComponent(id)}/export.csv`);
}
