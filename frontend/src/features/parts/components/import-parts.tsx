import type { ImportReport } from '@understudy/shared-types';
import { useId, useRef, useState, type DragEvent } from 'react';
import { Link } from 'react-router';
import { Alert, Button, Card, SectionHeading, buttonClasses, cx } from '../../../components/ui';
import { rejectedImportReport, useImportParts, type ImportFileKind } from '../api/import-parts';

export const MAX_IMPORT_BYTES = 20 * 1024 * 1024;

interface ChosenFile {
  name: string;
  kind: ImportFileKind;
  text: string;
}

function fileKind(file: File): ImportFileKind | undefined {
  const name = file.name.toLowerCase();
  if (name.endsWith('.csv')) return 'csv';
  if (name.endsWith('.json')) return 'json';
  return undefined;
}

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** "12 rows: 10 new, 2 updates" */
export function reportSummary(report: ImportReport): string {
  return `${plural(report.total, 'row')}: ${report.created} new, ${plural(report.updated, 'update')}`;
}

function ImportErrors({ report, applied }: { report: ImportReport; applied: boolean }) {
  const captionId = useId();
  return (
    <div className="flex flex-col gap-3">
      <Alert tone="error" title={`${plural(report.errors.length, 'row needs', 'rows need')} fixing — nothing was changed`}>
        {reportSummary(report)}. {applied ? 'The import was refused as a whole.' : 'Correct the rows below in the file and check it again.'}
      </Alert>
      <div className="overflow-x-auto rounded-md border border-rule">
        <table aria-labelledby={captionId} className="w-full border-collapse text-left text-sm">
          <caption id={captionId} className="sr-only">
            Rows that need fixing
          </caption>
          <thead>
            <tr className="border-b border-rule bg-paper/60">
              {['Row', 'Part number', 'Reason'].map((h) => (
                <th key={h} scope="col" className="px-4 py-2.5 text-xs font-semibold tracking-wider whitespace-nowrap text-ink-soft uppercase">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {report.errors.map((e, i) => (
              <tr key={`${e.row}-${i}`} className="border-b border-rule align-top last:border-b-0">
                <td className="px-4 py-2.5 font-semibold text-ink tabular-nums">{e.row}</td>
                <td className="px-4 py-2.5 font-mono text-ink">{e.partNumber ?? <span className="text-ink-faint">—</span>}</td>
                <td className="px-4 py-2.5 text-ink-soft">{e.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function errorMessage(error: unknown): string {
  return error instanceof Error ? error.message : 'The file could not be sent. Try again.';
}

/** Choose a file, check it (dry run), then apply it: every row or none. */
export function ImportParts() {
  const inputId = useId();
  const hintId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<ChosenFile | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);
  const check = useImportParts();
  const apply = useImportParts();

  async function choose(picked: File | undefined) {
    check.reset();
    apply.reset();
    setFile(null);
    setFileError(null);
    if (!picked) return;
    const kind = fileKind(picked);
    if (!kind) {
      setFileError(`“${picked.name}” is not a .csv or .json file. Export from the catalog to get a file in the right shape.`);
      return;
    }
    if (picked.size > MAX_IMPORT_BYTES) {
      setFileError(`“${picked.name}” is ${megabytes(picked.size)}; files can be at most 20 MB. Split it and import the parts in turn.`);
      return;
    }
    try {
      setFile({ name: picked.name, kind, text: await picked.text() });
    } catch {
      setFileError(`“${picked.name}” could not be read.`);
    }
  }

  function onDrop(event: DragEvent<HTMLDivElement>) {
    event.preventDefault();
    setDragging(false);
    void choose(event.dataTransfer.files[0]);
  }

  const dry = check.data;
  const count = dry ? dry.created + dry.updated : 0;
  const rejected = rejectedImportReport(apply.error);
  const clean = !!dry && dry.errors.length === 0 && count > 0;
  const canImport = !!file && clean && !apply.isSuccess && !apply.isError;

  return (
    <div className="flex flex-col gap-5">
      <Card aria-labelledby="import-file-title">
        <SectionHeading id="import-file-title">1. Choose a file</SectionHeading>
        <div className="flex flex-col gap-4 p-5">
          <p id={hintId} className="max-w-prose text-sm text-ink-soft">
            Use the same columns as Export CSV — family, manufacturer, partNumber, description and the rest, then one{' '}
            <code className="font-mono text-ink">param:&lt;key&gt;.&lt;slot&gt;</code> column per value, in SI base units or
            engineering notation (4k7, 100n) — or a JSON array shaped like the JSON export. A row with the same manufacturer and
            part number as an existing part updates that part. All rows are applied together, or none are.
          </p>
          <div
            onDragOver={(event) => {
              event.preventDefault();
              setDragging(true);
            }}
            onDragLeave={() => setDragging(false)}
            onDrop={onDrop}
            className={cx(
              'flex flex-col items-center gap-2 rounded-lg border-2 border-dashed px-6 py-8 text-center transition-colors focus-within:border-copper',
              dragging ? 'border-copper bg-copper-wash/50' : 'border-rule-strong bg-paper/40',
            )}
          >
            <svg aria-hidden="true" viewBox="0 0 24 24" className="size-7 text-copper">
              <path d="M12 16V4m0 0-4.5 4.5M12 4l4.5 4.5M4 15v4a1 1 0 0 0 1 1h14a1 1 0 0 0 1-1v-4" fill="none" stroke="currentColor" strokeWidth="1.7" strokeLinecap="round" strokeLinejoin="round" />
            </svg>
            <p className="text-sm font-semibold text-ink">Drop a .csv or .json file here</p>
            <p className="text-xs text-ink-faint">or</p>
            <label htmlFor={inputId} className={buttonClasses('secondary', 'sm', 'cursor-pointer')}>
              Choose a file
            </label>
            <input
              ref={inputRef}
              id={inputId}
              type="file"
              accept=".csv,.json,text/csv,application/json"
              aria-describedby={hintId}
              className="sr-only"
              onChange={(event) => {
                void choose(event.target.files?.[0]);
                // Choosing the same file again after fixing it should read it afresh.
                event.target.value = '';
              }}
            />
            <p className="text-xs text-ink-faint">Up to 20 MB.</p>
          </div>
          {fileError && <Alert tone="error">{fileError}</Alert>}
          {file && (
            <div className="flex flex-wrap items-center justify-between gap-3">
              <p className="text-sm text-ink">
                <span className="font-semibold">{file.name}</span>{' '}
                <span className="text-ink-soft">({file.kind === 'csv' ? 'CSV' : 'JSON'})</span>
              </p>
              <Button
                variant="secondary"
                loading={check.isPending}
                disabled={apply.isPending}
                onClick={() => {
                  apply.reset();
                  check.mutate({ text: file.text, kind: file.kind, dryRun: true });
                }}
              >
                Check file
              </Button>
            </div>
          )}
        </div>
      </Card>

      <Card aria-labelledby="import-apply-title">
        <SectionHeading id="import-apply-title">2. Check and import</SectionHeading>
        <div className="flex flex-col gap-4 p-5">
          {!dry && !check.isError && (
            <p className="text-sm text-ink-soft">Check the file first; nothing changes until you import it.</p>
          )}
          {check.isError && (
            <Alert tone="error" title="The file could not be checked">
              {errorMessage(check.error)}
            </Alert>
          )}
          {dry && dry.errors.length > 0 && <ImportErrors report={dry} applied={false} />}
          {dry && dry.errors.length === 0 && !apply.isSuccess && !apply.isError && (
            <Alert tone={count > 0 ? 'success' : 'warning'} title={count > 0 ? 'The file is ready to import' : 'The file has no parts in it'}>
              {reportSummary(dry)}. Nothing has been changed yet.
            </Alert>
          )}
          {rejected && <ImportErrors report={rejected} applied />}
          {apply.isError && !rejected && (
            <Alert tone="error" title="The import did not go through — nothing was changed">
              {errorMessage(apply.error)}
            </Alert>
          )}
          {apply.data && (
            <Alert tone="success" title={`Imported ${plural(apply.data.created + apply.data.updated, 'part')}`}>
              {apply.data.created} new, {plural(apply.data.updated, 'part')} updated.{' '}
              <Link to="/parts" className="font-semibold text-copper-deep underline">
                Back to the catalog
              </Link>
            </Alert>
          )}
          <div>
            <Button
              disabled={!canImport}
              loading={apply.isPending}
              onClick={() => file && apply.mutate({ text: file.text, kind: file.kind, dryRun: false })}
            >
              {clean ? `Import ${plural(count, 'part')}` : 'Import parts'}
            </Button>
          </div>
        </div>
      </Card>
    </div>
  );
}
