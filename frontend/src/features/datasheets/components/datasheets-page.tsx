import { DATASHEET_STATUSES, DATASHEET_STATUS_LABELS, DatasheetStatusSchema, type DatasheetStatus } from '@understudy/shared-types';
import { useState } from 'react';
import { Card, EmptyState, ErrorState, InlineSelect, LoadingState, PageHeader, SectionHeading } from '../../../components/ui';
import { Can } from '../../../lib/ability';
import { LIST_LIMIT, useDatasheets } from '../api/get-datasheets';
import { DatasheetUploader } from './datasheet-uploader';
import { DatasheetsTable } from './datasheets-table';

const STATUS_OPTIONS = [
  { value: '', label: 'All statuses' },
  ...DATASHEET_STATUSES.map((s) => ({ value: s, label: DATASHEET_STATUS_LABELS[s] })),
];

function DatasheetList({ status }: { status: DatasheetStatus | undefined }) {
  const list = useDatasheets(status ? { status } : {});
  if (list.isPending) return <LoadingState label="Loading datasheets…" />;
  if (list.isError) return <ErrorState className="m-5" message={list.error.message} onRetry={() => void list.refetch()} />;
  if (list.data.length === 0) {
    return (
      <EmptyState className="m-5" title={status ? `No datasheets are “${DATASHEET_STATUS_LABELS[status]}”` : 'No datasheets yet'}>
        {status ? 'Choose another status to see the rest.' : 'Uploaded PDFs appear here while they are read, ready for review.'}
      </EmptyState>
    );
  }
  return (
    <>
      <DatasheetsTable items={list.data} />
      {list.data.length >= LIST_LIMIT && (
        <p className="border-t border-rule px-5 py-2 text-xs text-ink-faint">Showing the newest {LIST_LIMIT}.</p>
      )}
    </>
  );
}

/** Upload PDFs and follow them through the parser; every datasheet, newest first. */
export function DatasheetsPage() {
  const [status, setStatus] = useState<DatasheetStatus | undefined>(undefined);
  return (
    <>
      <PageHeader
        title="Datasheets"
        description="Upload manufacturers’ PDFs; Understudy reads the parameters out of them for you to check before they go into the catalog."
      />
      <div className="flex flex-col gap-6">
        <Can I="create" a="Datasheet">
          <Card aria-labelledby="upload-title">
            <SectionHeading id="upload-title">Upload</SectionHeading>
            <div className="p-5">
              <DatasheetUploader />
            </div>
          </Card>
        </Can>
        <Card aria-labelledby="all-datasheets-title">
          <SectionHeading
            id="all-datasheets-title"
            aside={
              <div className="w-44">
                <InlineSelect
                  aria-label="Show datasheets with status"
                  value={status ?? ''}
                  options={STATUS_OPTIONS}
                  onValueChange={(v) => setStatus(v === '' ? undefined : DatasheetStatusSchema.parse(v))}
                />
              </div>
            }
          >
            All datasheets
          </SectionHeading>
          <DatasheetList status={status} />
        </Card>
      </div>
    </>
  );
}
