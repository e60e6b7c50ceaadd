import { BOM_FIELD_LABELS, BOM_LIMITS, type BomLineDto, type BomPart, type RankedAlternate } from '@understudy/shared-types';
import { useId, useState, type ReactNode } from 'react';
import { Link } from 'react-router';
import { Button, CadmiumCaution, CadmiumMark, cx, EquivalentFlag, LifecycleBadge, RohsBadge, ScoreBar, Spinner } from '../../../components/ui';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';
import { formatDateTime } from '../../../lib/format';
import { containsCadmium } from '../../../lib/part-display';
import { useLineOptions } from '../api/get-line-options';
import { usePartSearch } from '../../../hooks/use-part-search';
import { useUpdateBomLine } from '../api/update-bom-line';
import { matchKindText } from '../lib/lines';

function Section({ title, children, className }: { title: string; children: ReactNode; className?: string }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={cx('flex flex-col gap-2', className)}>
      <h3 id={id} className="text-xs font-semibold tracking-wider text-ink-soft uppercase">
        {title}
      </h3>
      {children}
    </section>
  );
}

function PartName({ part }: { part: Pick<BomPart, 'id' | 'partNumber' | 'manufacturer'> & { cadmium?: boolean } }) {
  return (
    <span className="flex min-w-0 flex-col">
      <span className="inline-flex items-center gap-1.5">
        <Link to={`/parts/${part.id}`} className="font-semibold text-ink underline-offset-2 hover:text-copper-deep hover:underline">
          {part.partNumber}
        </Link>
        {part.cadmium && <CadmiumMark />}
      </span>
      <span className="text-xs text-ink-soft">{part.manufacturer}</span>
    </span>
  );
}

/** A catalog search to match the line to any part, for when the automatic match missed or chose wrongly. */
function PickAnyPart({ row, disabled, onPick }: { row: number; disabled: boolean; onPick: (partId: string) => void }) {
  const inputId = useId();
  const [q, setQ] = useState('');
  const debounced = useDebouncedValue(q, 250);
  const results = usePartSearch(debounced);
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={inputId} className="text-sm font-semibold text-ink">
        Match row {row} to another catalog part
      </label>
      <input
        id={inputId}
        type="search"
        value={q}
        onChange={(event) => setQ(event.target.value)}
        placeholder="Part number, maker or description"
        autoComplete="off"
        className="block h-9 w-full max-w-md rounded-md border border-rule-strong bg-card px-3 text-sm text-ink placeholder:text-ink-faint hover:border-ink-soft"
      />
      {debounced.trim() && (
        <ul aria-label={`Parts found for row ${row}`} aria-busy={results.isFetching || undefined} className="flex max-h-56 max-w-md flex-col overflow-y-auto rounded-md border border-rule bg-card">
          {results.isPending && (
            <li className="px-3 py-2 text-sm text-ink-soft">
              <Spinner className="mr-2 inline text-copper" />
              Searching…
            </li>
          )}
          {results.isError && <li className="px-3 py-2 text-sm text-danger">{results.error.message}</li>}
          {results.data?.length === 0 && <li className="px-3 py-2 text-sm text-ink-soft">Nothing in the catalog matches “{debounced}”.</li>}
          {results.data?.map((part) => (
            <li key={part.id} className="flex items-center justify-between gap-2 border-b border-rule px-3 py-1.5 last:border-b-0">
              <span className="flex min-w-0 flex-col">
                <span className="inline-flex items-center gap-1.5 font-semibold text-ink">
                  {part.partNumber}
                  {containsCadmium(part.parameters) && <CadmiumMark />}
                </span>
                <span className="truncate text-xs text-ink-soft">{part.manufacturer.name}</span>
              </span>
              <span className="flex items-center gap-2">
                {part.lifecycle !== 'active' && <LifecycleBadge lifecycle={part.lifecycle} short />}
                <Button variant="secondary" size="sm" disabled={disabled} onClick={() => onPick(part.id)}>
                  Match<span className="sr-only"> row {row}</span> to {part.partNumber}
                </Button>
              </span>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

function OptionRow({
  part,
  children,
  canEdit,
  chosen,
  disabled,
  onUse,
}: {
  part: BomPart | RankedAlternate['part'];
  children?: ReactNode;
  canEdit: boolean;
  chosen: boolean;
  disabled: boolean;
  onUse: () => void;
}) {
  const cadmium = 'cadmium' in part ? part.cadmium : containsCadmium(part.parameters);
  const manufacturer = typeof part.manufacturer === 'string' ? part.manufacturer : part.manufacturer.name;
  return (
    <li className="flex flex-wrap items-center justify-between gap-3 border-b border-rule px-3 py-2 last:border-b-0">
      <span className="flex min-w-0 flex-wrap items-center gap-3">
        <PartName part={{ id: part.id, partNumber: part.partNumber, manufacturer, cadmium }} />
        {part.lifecycle !== 'active' && <LifecycleBadge lifecycle={part.lifecycle} short />}
        {part.rohsStatus === 'non-compliant' && <RohsBadge status={part.rohsStatus} short />}
        {children}
      </span>
      {canEdit &&
        (chosen ? (
          <span className="text-sm font-semibold text-ok">Chosen</span>
        ) : (
          <Button variant="secondary" size="sm" disabled={disabled} onClick={onUse}>
            Use as replacement<span className="sr-only"> ({part.partNumber})</span>
          </Button>
        ))}
    </li>
  );
}

/** What may take the line's place, approved equivalents first, and the replacement chosen with its note. */
function ReplacementOptions({
  bomId,
  line,
  canEdit,
  busy,
  onChoose,
}: {
  bomId: string;
  line: BomLineDto;
  canEdit: boolean;
  busy: boolean;
  onChoose: (partId: string) => void;
}) {
  const options = useLineOptions(bomId, line.id, { enabled: !!line.match.part });
  if (!line.match.part) {
    return <p className="text-sm text-ink-soft">Match the line to a catalog part first; its approved equivalents and closest alternates then show here.</p>;
  }
  if (options.isPending) return <p className="text-sm text-ink-soft"><Spinner className="mr-2 inline text-copper" />Looking for what may replace {line.match.part.partNumber}…</p>;
  if (options.isError) {
    return (
      <p role="alert" className="text-sm text-danger">
        {options.error.message}{' '}
        <button type="button" className="font-semibold underline" onClick={() => void options.refetch()}>
          Try again
        </button>
      </p>
    );
  }
  const { approvedEquivalents, alternates } = options.data;
  const chosenId = line.replacement?.part.id;
  if (approvedEquivalents.length === 0 && alternates.length === 0) {
    return <p className="text-sm text-ink-soft">The catalog has no approved equivalent or close alternate for {line.match.part.partNumber}.</p>;
  }
  return (
    <div className="flex flex-col gap-3">
      {approvedEquivalents.length > 0 && (
        <div className="flex flex-col gap-1">
          <p className="text-sm font-semibold text-ink">Approved equivalents</p>
          <ul aria-label={`Approved equivalents for row ${line.row}`} className="rounded-md border border-ok/30 bg-card">
            {approvedEquivalents.map((eq) => (
              <OptionRow key={eq.part.id} part={eq.part} canEdit={canEdit} chosen={eq.part.id === chosenId} disabled={busy} onUse={() => onChoose(eq.part.id)}>
                <EquivalentFlag equivalent={{ status: 'approved', use: eq.use, note: eq.note }} />
              </OptionRow>
            ))}
          </ul>
        </div>
      )}
      {alternates.length > 0 && (
        <div className="flex flex-col gap-1">
          <p className="text-sm font-semibold text-ink">
            Closest alternates{' '}
            <Link to={`/parts/${line.match.part.id}/alternates`} className="text-xs font-normal text-copper-deep underline-offset-2 hover:underline">
              see the full ranking
            </Link>
          </p>
          <ul aria-label={`Closest alternates for row ${line.row}`} className="rounded-md border border-rule bg-card">
            {alternates.map((alt) => (
              <OptionRow key={alt.part.id} part={alt.part} canEdit={canEdit} chosen={alt.part.id === chosenId} disabled={busy} onUse={() => onChoose(alt.part.id)}>
                <ScoreBar score={alt.score} />
                {alt.equivalent && <EquivalentFlag equivalent={alt.equivalent} />}
                <span className="text-xs text-ink-soft">{alt.pinout.summary}</span>
              </OptionRow>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}

/** One line opened: its problems in plain words, how it was matched (and a way to correct that), and what may replace it. */
export function LineDetails({ bomId, line, canEdit }: { bomId: string; line: BomLineDto; canEdit: boolean }) {
  const noteId = useId();
  const update = useUpdateBomLine();
  const [note, setNote] = useState(line.replacement?.note ?? '');
  const busy = update.isPending;
  const part = line.match.part;
  const cadmium = !!part?.cadmium || !!line.replacement?.part.cadmium;

  const send = (body: Parameters<typeof update.mutate>[0]['body']) => update.mutate({ bomId, lineId: line.id, body });

  return (
    <div className="flex flex-col gap-5 px-5 py-4" data-testid={`line-details-${line.row}`}>
      {line.problems.length > 0 && (
        <Section title="Problems on this line">
          <ul className="flex flex-col gap-1 text-sm text-ink">
            {line.problems.map((p, i) => (
              <li key={i} className="flex items-start gap-2">
                <span aria-hidden="true" className="mt-1.5 size-1.5 shrink-0 rounded-full bg-warn" />
                <span>
                  {p.field !== 'row' && <span className="font-semibold">{BOM_FIELD_LABELS[p.field]}: </span>}
                  {p.message}
                </span>
              </li>
            ))}
          </ul>
        </Section>
      )}

      {cadmium && <CadmiumCaution />}

      <div className="grid gap-5 lg:grid-cols-2">
        <Section title="Catalog match">
          {part ? (
            <div className="flex flex-wrap items-center gap-3">
              <PartName part={part} />
              <LifecycleBadge lifecycle={part.lifecycle} short />
              <RohsBadge status={part.rohsStatus} short />
              <span className="text-sm text-ink-soft">{matchKindText(line, canEdit)}</span>
            </div>
          ) : (
            <p className="text-sm text-ink-soft">
              “{line.partNumber}” is not in the catalog{line.match.candidates.length > 0 ? '; these are close:' : ', and nothing close is.'}
            </p>
          )}
          {part?.description && <p className="text-sm text-ink-soft">{part.description}</p>}
          {line.match.candidates.length > 0 && (
            <ul aria-label={`Close matches for row ${line.row}`} className="rounded-md border border-copper/30 bg-card">
              {line.match.candidates.map((c) => (
                <li key={c.part.id} className="flex flex-wrap items-center justify-between gap-3 border-b border-rule px-3 py-2 last:border-b-0">
                  <span className="flex items-center gap-3">
                    <PartName part={c.part} />
                    <span className="text-xs text-ink-soft tabular-nums">{Math.round(c.similarity * 100)} % alike</span>
                    {c.part.lifecycle !== 'active' && <LifecycleBadge lifecycle={c.part.lifecycle} short />}
                  </span>
                  {canEdit && (
                    <Button size="sm" disabled={busy} onClick={() => send({ partId: c.part.id })}>
                      This one<span className="sr-only"> ({c.part.partNumber})</span>
                    </Button>
                  )}
                </li>
              ))}
            </ul>
          )}
          {canEdit && line.match.kind === 'confirmed' && (
            <Button variant="ghost" size="sm" className="self-start" disabled={busy} onClick={() => send({ partId: null })}>
              Undo my match
            </Button>
          )}
          {canEdit && <PickAnyPart row={line.row} disabled={busy} onPick={(partId) => send({ partId })} />}
        </Section>

        <Section title="Replacement">
          {line.replacement ? (
            <div className="flex flex-col gap-1 rounded-md border border-ok/30 bg-ok-wash/40 px-3 py-2">
              <div className="flex flex-wrap items-center justify-between gap-2">
                <PartName part={line.replacement.part} />
                {canEdit && (
                  <Button variant="ghost" size="sm" disabled={busy} onClick={() => send({ replacementPartId: null })}>
                    Clear the replacement
                  </Button>
                )}
              </div>
              {line.replacement.note && <p className="text-sm text-ink">{line.replacement.note}</p>}
              <p className="text-xs text-ink-faint">
                Chosen{line.replacement.chosenBy ? ` by ${line.replacement.chosenBy.name}` : ''} on {formatDateTime(line.replacement.chosenAt)}
              </p>
            </div>
          ) : (
            <p className="text-sm text-ink-soft">No replacement chosen.</p>
          )}
          {canEdit && part && (
            <div className="flex flex-col gap-1.5">
              <label htmlFor={noteId} className="text-sm font-semibold text-ink">
                Replacement note <span className="font-normal text-ink-faint">(optional, sent with the replacement)</span>
              </label>
              <textarea
                id={noteId}
                value={note}
                onChange={(event) => setNote(event.target.value)}
                rows={2}
                maxLength={BOM_LIMITS.maxNoteLength}
                placeholder="e.g. fits the same footprint; checked on the bench"
                className="block w-full rounded-md border border-rule-strong bg-card px-3 py-2 text-sm text-ink placeholder:text-ink-faint hover:border-ink-soft"
              />
              {line.replacement && note !== line.replacement.note && (
                <Button variant="secondary" size="sm" className="self-start" disabled={busy} onClick={() => send({ replacementNote: note })}>
                  Save the note
                </Button>
              )}
            </div>
          )}
          <ReplacementOptions
            bomId={bomId}
            line={line}
            canEdit={canEdit}
            busy={busy}
            onChoose={(partId) => send({ replacementPartId: partId, replacementNote: note })}
          />
        </Section>
      </div>

      {update.isError && (
        <p role="alert" className="rounded-md border border-danger/30 bg-danger-wash px-3 py-2 text-sm text-danger">
          {update.error.message}
        </p>
      )}
      {line.notes && (
        <p className="text-sm text-ink-soft">
          <span className="font-semibold text-ink">Notes in the BOM: </span>
          {line.notes}
        </p>
      )}
    </div>
  );
}
