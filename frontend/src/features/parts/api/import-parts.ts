import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ImportReportSchema, type ImportReport } from '@understudy/shared-types';
import { apiRequest, isApiClientError } from '../../../lib/api-client';
import { partKeys } from '../keys';

export type ImportFileKind = 'csv' | 'json';

export interface ImportPartsInput {
  /** The file's text, sent as is. */
  text: string;
  kind: ImportFileKind;
  /** Check every row and report, changing nothing. */
  dryRun: boolean;
}

const CONTENT_TYPES: Record<ImportFileKind, string> = { csv: 'text/csv', json: 'application/json' };

export function importParts({ text, kind, dryRun }: ImportPartsInput): Promise<ImportReport> {
  return apiRequest('/parts/import', {
    method: 'POST',
    rawBody: { text, contentType: CONTENT_TYPES[kind] },
    query: dryRun ? { dryRun: '1' } : undefined,
    schema: ImportReportSchema,
  });
}

/** The report a refused import (422 import_rejected) carries, so its bad rows can be listed. */
export function rejectedImportReport(error: unknown): ImportReport | undefined {
  if (!isApiClientError(error) || error.status !== 422) return undefined;
  const parsed = ImportReportSchema.safeParse((error.payload as { report?: unknown } | undefined)?.report);
  return parsed.success ? parsed.data : undefined;
}

export function useImportParts() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importParts,
    onSuccess: (report) => {
      // A real import can create parts and update existing ones: every list and detail may be stale.
      if (!report.dryRun) void queryClient.invalidateQueries({ queryKey: partKeys.all });
    },
  });
}
