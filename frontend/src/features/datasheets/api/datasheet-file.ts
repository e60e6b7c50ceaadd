import { apiUrl } from '../../../lib/api-client';

/** The PDF itself: inline for the viewer, as an attachment for the Download button. */
export function datasheetFileUrl(id: string, { download = false }: { download?: boolean } = {}): string {
  return apiUrl(`/datasheets/${encodeURIComponent(id)}/file`, download ? { download: '1' } : undefined);
}
