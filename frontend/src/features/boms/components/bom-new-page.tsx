import {
  BOM_DELIMITERS,
  BOM_DELIMITER_LABELS,
  BOM_LIMITS,
  BomCreateBodySchema,
  type BomDelimiter,
  type BomPreview,
} from '@understudy/shared-types';
import { useEffect, useId, useRef, useState } from 'react';
import { Link, useNavigate } from 'react-router';
import {
  Alert,
  Button,
  Card,
  FileDropZone,
  PageHeader,
  ProgressBar,
  SectionHeading,
  SelectField,
  TextField,
  buttonClasses,
} from '../../../components/ui';
import { useCreateBom } from '../api/create-bom';
import { usePreviewBom, type BomPreviewInput } from '../api/preview-bom';
import { plural } from '../lib/lines';
import { chooseColumn, choicesFrom, encodingLabel, mappingFrom, nameFromFile, type ColumnChoice } from '../lib/mapping';
import { ColumnMapping } from './column-mapping';
import { RejectionNotice } from './rejection-notice';

const ACCEPT = '.csv,.tsv,.txt,text/csv,text/tab-separated-values,text/plain';
const PASTE_NAME = 'Pasted BOM';

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

function looksLikeText(file: File): boolean {
  return /\.(csv|tsv|txt)$/i.test(file.name) || file.type.startsWith('text/');
}

/**
 * Check a BOM in two steps: read the rows (a paste or a file), then say what each column holds. Nothing is saved
 * until the last button, and nothing the person pasted or chose is thrown away when the server refuses it.
 */
export function BomNewPage() {
  const navigate = useNavigate();
  const pasteId = useId();
  const pasteHintId = useId();
  const mappingHeadingRef = useRef<HTMLHeadingElement>(null);

  const [text, setText] = useState('');
  const [file, setFile] = useState<File | null>(null);
  const [localError, setLocalError] = useState<string | null>(null);
  const [preview, setPreview] = useState<BomPreview | null>(null);
  /** A file's encoding, kept while the delimiter or header is changed (those re-reads send the decoded text). */
  const [fileEncoding, setFileEncoding] = useState<string | null>(null);
  const [choices, setChoices] = useState<ColumnChoice[]>([]);
  const [name, setName] = useState('');
  const [nameEdited, setNameEdited] = useState(false);
  const [submitted, setSubmitted] = useState(false);
  const [focusMapping, setFocusMapping] = useState(false);

  const read = usePreviewBom();
  const create = useCreateBom();

  useEffect(() => {
    if (focusMapping && preview) {
      mappingHeadingRef.current?.focus();
      setFocusMapping(false);
    }
  }, [focusMapping, preview]);

  function accept(next: BomPreview, from: 'paste' | 'file', chosen: File | null) {
    setPreview(next);
    setChoices(choicesFrom(next));
    setFileEncoding(from === 'file' ? next.encoding : null);
    setSubmitted(false);
    create.reset();
    if (!nameEdited) setName(chosen ? nameFromFile(chosen.name) : PASTE_NAME);
    setFocusMapping(true);
  }

  function start(input: BomPreviewInput, from: 'paste' | 'file', chosen: File | null) {
    setLocalError(null);
    create.reset();
    read.mutate(input, { onSuccess: (next) => accept(next, from, chosen) });
  }

  function readPaste() {
    if (!text.trim()) {
      setLocalError('Paste some rows first: select them in the spreadsheet, copy, and paste them here.');
      return;
    }
    setFile(null);
    start({ kind: 'text', text }, 'paste', null);
  }

  function chooseFile(files: File[]) {
    const picked = files[0];
    if (!picked) return;
    read.reset();
    if (!looksLikeText(picked)) {
      setLocalError(`“${picked.name}” is not a .csv, .tsv or .txt file. Save the sheet as CSV from the spreadsheet, or paste the rows.`);
      return;
    }
    if (picked.size > BOM_LIMITS.maxBytes) {
      setLocalError(
        `“${picked.name}” is ${megabytes(picked.size)}; a BOM can be at most ${megabytes(BOM_LIMITS.maxBytes)}. Split it and check the parts in turn.`,
      );
      return;
    }
    setFile(picked);
    start({ kind: 'file', file: picked }, 'file', picked);
  }

  /** A new delimiter or header choice reads the same text again; the mapping is guessed afresh. */
  function reread(change: { delimiter?: BomDelimiter; hasHeader?: boolean }) {
    if (!preview) return;
    const delimiter = change.delimiter ?? preview.delimiter;
    const hasHeader = change.hasHeader ?? preview.hasHeader;
    setLocalError(null);
    read.mutate(
      { kind: 'text', text: preview.text, delimiter, hasHeader },
      {
        onSuccess: (next) => {
          setPreview(next);
          setChoices(choicesFrom(next));
          create.reset();
        },
      },
    );
  }

  const mapping = mappingFrom(choices);
  const nameCheck = BomCreateBodySchema.shape.name.safeParse(name);
  const nameError = submitted && !nameCheck.success ? 'Give the BOM a name (up to 120 characters).' : undefined;

  function save() {
    setSubmitted(true);
    if (!preview || !mapping || !nameCheck.success) return;
    create.mutate(
      {
        name: nameCheck.data,
        text: preview.text,
        fileName: file && fileEncoding ? file.name : null,
        encoding: fileEncoding ?? preview.encoding,
        delimiter: preview.delimiter,
        hasHeader: preview.hasHeader,
        mapping,
      },
      { onSuccess: (bom) => void navigate(`/boms/${bom.id}`) },
    );
  }

  const busy = read.isPending || create.isPending;

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title="Check a BOM"
        description="Paste or upload a design's parts list. Each line is matched to the catalog and checked for lifecycle, RoHS and cadmium, with what may replace it."
        actions={
          <Link to="/boms" className={buttonClasses('secondary')}>
            All BOMs
          </Link>
        }
      />

      <Card aria-labelledby="bom-source-title">
        <SectionHeading id="bom-source-title">1. Your parts list</SectionHeading>
        <div className="grid gap-5 p-5 lg:grid-cols-2">
          <div className="flex flex-col gap-2">
            <label htmlFor={pasteId} className="text-sm font-semibold text-ink">
              Paste rows from a spreadsheet
            </label>
            <textarea
              id={pasteId}
              value={text}
              onChange={(event) => setText(event.target.value)}
              rows={8}
              spellCheck={false}
              aria-describedby={pasteHintId}
              placeholder={'Part number\tQty\tReference\nNW4580\t2\tU1, U2'}
              className="block w-full rounded-md border border-rule-strong bg-card px-3 py-2 font-mono text-xs text-ink placeholder:text-ink-faint hover:border-ink-soft"
            />
            <p id={pasteHintId} className="text-xs text-ink-soft">
              Copy the cells straight from the sheet, header row included if it has one. Up to{' '}
              {BOM_LIMITS.maxLines.toLocaleString()} lines.
            </p>
            <Button variant="secondary" className="self-start" onClick={readPaste} disabled={busy}>
              Read the pasted rows
            </Button>
          </div>
          <div className="flex flex-col gap-2">
            <FileDropZone
              onFiles={chooseFile}
              accept={ACCEPT}
              multiple={false}
              title="Drop a .csv, .tsv or .txt file here"
              buttonLabel="Choose a file"
              hint={`Any encoding a spreadsheet saves in; up to ${megabytes(BOM_LIMITS.maxBytes)}.`}
              disabled={busy}
              className="h-full"
            />
            {file && (
              <p className="flex flex-wrap items-center gap-2 text-sm text-ink">
                <span>
                  Chosen: <span className="font-semibold">{file.name}</span>
                </span>
                {read.isError && !preview && (
                  <Button variant="ghost" size="sm" onClick={() => start({ kind: 'file', file }, 'file', file)}>
                    Read it again
                  </Button>
                )}
              </p>
            )}
          </div>
        </div>

        <div className="flex flex-col gap-4 border-t border-rule px-5 py-4">
          {read.isPending && (
            <div className="flex flex-col gap-1.5">
              <ProgressBar label="Reading the rows" valueText={file ? `Reading ${file.name}…` : 'Reading the pasted rows…'} />
              <p className="text-sm text-ink-soft">{file && !preview ? `Uploading and reading ${file.name}…` : 'Reading the rows…'}</p>
            </div>
          )}
          {localError && <Alert tone="error">{localError}</Alert>}
          {read.isError && <RejectionNotice error={read.error} fallbackTitle="The rows could not be read" />}
          {preview ? (
            <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
              <p className="text-sm text-ink" data-testid="read-as">
                Read {plural(preview.lineCount, 'line')} as <span className="font-semibold">{encodingLabel(fileEncoding ?? preview.encoding)}</span>,
                separated by <span className="font-semibold">{BOM_DELIMITER_LABELS[preview.delimiter].toLowerCase()}</span>.
              </p>
              <SelectField
                label="Columns separated by"
                value={preview.delimiter}
                onValueChange={(value) => reread({ delimiter: value as BomDelimiter })}
                options={BOM_DELIMITERS.map((d) => ({ value: d, label: BOM_DELIMITER_LABELS[d] }))}
                disabled={busy}
                className="w-48"
              />
              <label className="flex h-10 items-center gap-2 text-sm font-semibold text-ink">
                <input
                  type="checkbox"
                  checked={preview.hasHeader}
                  onChange={(event) => reread({ hasHeader: event.target.checked })}
                  disabled={busy}
                  className="size-4 accent-copper"
                />
                First row is a header
              </label>
            </div>
          ) : (
            !read.isPending && <p className="text-sm text-ink-soft">Nothing is saved until you check the BOM in step 2.</p>
          )}
        </div>
      </Card>

      <Card aria-labelledby="bom-mapping-title">
        <SectionHeading>
          <span id="bom-mapping-title" ref={mappingHeadingRef} tabIndex={-1} className="outline-none">
            2. What each column holds
          </span>
        </SectionHeading>
        <div className="flex flex-col gap-4 p-5">
          {!preview ? (
            <p className="text-sm text-ink-soft">Read the rows first; the columns show up here with a guess of what each holds.</p>
          ) : (
            <>
              <p className="max-w-prose text-sm text-ink-soft">
                Only the part number is needed. Columns left as “Ignore” are kept and come back in the export untouched.
              </p>
              <ColumnMapping
                preview={preview}
                choices={choices}
                onChoose={(index, choice) => setChoices((current) => chooseColumn(current, index, choice))}
                missingPartNumber={submitted && !mapping}
              />
              {submitted && !mapping && <Alert tone="error">Choose the column that holds the part numbers.</Alert>}
              <TextField
                label="Name"
                value={name}
                onValueChange={(value) => {
                  setName(value);
                  setNameEdited(true);
                }}
                error={nameError}
                hint="What the BOM is called in your list, e.g. the design and its revision."
                maxLength={BOM_LIMITS.maxNameLength}
                className="max-w-md"
              />
              {create.isPending && (
                <div className="flex flex-col gap-1.5">
                  <ProgressBar label="Checking the BOM" valueText={`Checking ${plural(preview.lineCount, 'line')} against the catalog…`} />
                  <p className="text-sm text-ink-soft">
                    Matching {plural(preview.lineCount, 'line')} against the catalog… a large BOM takes a few seconds.
                  </p>
                </div>
              )}
              {create.isError && <RejectionNotice error={create.error} fallbackTitle="The BOM could not be saved" />}
              <div>
                <Button onClick={save} loading={create.isPending} disabled={read.isPending}>
                  Check and save
                </Button>
              </div>
            </>
          )}
        </div>
      </Card>
    </div>
  );
}
