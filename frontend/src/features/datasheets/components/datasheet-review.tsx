import type { DatasheetDto, ExtractionSource, ParameterValue, PartDto, ProposalReviewBody } from '@understudy/shared-types';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { Link } from 'react-router';
import {
  Alert,
  Button,
  CadmiumCaution,
  Card,
  EmptyState,
  ErrorState,
  LoadingState,
  SectionHeading,
  Spinner,
  buttonClasses,
} from '../../../components/ui';
import { Can, useAppAbility } from '../../../lib/ability';
import { isApiClientError } from '../../../lib/api-client';
import { formatDate, formatDateTime } from '../../../lib/format';
import { datasheetFileUrl } from '../api/datasheet-file';
import { useDatasheet } from '../api/get-datasheet';
import { useRetryDatasheet } from '../api/retry-datasheet';
import { useReviewProposal } from '../api/review-proposal';
import { formatBytes } from '../lib/format-bytes';
import { groupProposals, suggestsCadmium } from '../lib/proposals';
import { ApplyPanel } from './apply-panel';
import { DatasheetStatusBadge } from './datasheet-status-badge';
import { IdentityPanel } from './identity-panel';
import { PdfViewer } from './pdf-viewer';
import { ProposalList } from './proposal-list';

const LINK = 'font-semibold text-copper-deep underline-offset-2 hover:underline';

function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

function ParserProgress({ sheet }: { sheet: DatasheetDto }) {
  return (
    <Alert tone="info" title={sheet.status === 'queued' ? 'Waiting for the parser' : 'Reading the datasheet'}>
      <span className="flex items-center gap-2">
        <Spinner className="text-copper" />
        {sheet.status === 'queued'
          ? 'It is in the queue and will be read shortly.'
          : `Reading ${sheet.pageCount} ${sheet.pageCount === 1 ? 'page' : 'pages'} for tables and values.`}{' '}
        This page updates by itself.
      </span>
    </Alert>
  );
}

function RetryButton({ id }: { id: string }) {
  const retry = useRetryDatasheet();
  return (
    <div className="mt-2 flex flex-col items-start gap-2">
      <Button variant="secondary" size="sm" loading={retry.isPending} onClick={() => retry.mutate(id)}>
        Retry
      </Button>
      {retry.isError && <p className="text-sm text-danger">{retry.error.message}</p>}
    </div>
  );
}

function Review({ sheet, onApplied }: { sheet: DatasheetDto; onApplied?: (part: PartDto) => void }) {
  const ability = useAppAbility();
  const canReview = ability.can('review', 'Datasheet');
  const canApply = canReview && ability.can('update', 'Part');
  const extraction = sheet.extraction;
  const reviewable = !!extraction && (sheet.status === 'ready' || sheet.status === 'applied');
  const editable = canReview && reviewable;
  const family = extraction?.identity.family?.value;

  const groups = useMemo(() => groupProposals(family, extraction?.proposals ?? []), [family, extraction]);
  const ordered = useMemo(() => groups.flatMap((g) => g.proposals.map((p) => ({ proposal: p, def: g.def }))), [groups]);

  const [chosenId, setChosenId] = useState<string | undefined>(undefined);
  const selected = ordered.find((o) => o.proposal.id === chosenId) ?? ordered[0];
  const selectedId = selected?.proposal.id;
  // The source in view: the selected proposal's unless an identity finding was asked for since.
  const [shownSource, setShownSource] = useState<ExtractionSource | null>(null);
  const source = shownSource ?? selected?.proposal.source ?? null;
  const [manualPage, setManualPage] = useState<number | null>(null);
  const page = manualPage ?? source?.page ?? 1;
  const highlights = source && source.page === page ? source.boxes : [];

  const [editingId, setEditingId] = useState<string | null>(null);
  const [saveErrors, setSaveErrors] = useState<Record<string, string>>({});
  const { mutateAsync: saveDecision } = useReviewProposal(sheet.id);

  const listRef = useRef<HTMLDivElement>(null);
  const itemRefs = useRef(new Map<string, HTMLElement>());
  // One stable ref callback per proposal, so React does not detach and reattach them on every render.
  const refCallbacks = useRef(new Map<string, (el: HTMLElement | null) => void>());
  const itemRef = useCallback((id: string) => {
    let callback = refCallbacks.current.get(id);
    if (!callback) {
      callback = (el) => {
        if (el) itemRefs.current.set(id, el);
        else itemRefs.current.delete(id);
      };
      refCallbacks.current.set(id, callback);
    }
    return callback;
  }, []);

  const select = useCallback((id: string) => {
    setChosenId(id);
    setShownSource(null);
    setManualPage(null);
  }, []);

  const showSource = useCallback((s: ExtractionSource) => {
    setShownSource(s);
    setManualPage(null);
  }, []);

  const decide = useCallback(
    (id: string, body: ProposalReviewBody) => {
      setSaveErrors(({ [id]: _gone, ...rest }) => rest);
      saveDecision({ proposalId: id, body }).catch((error: unknown) => {
        setSaveErrors((e) => ({ ...e, [id]: error instanceof Error ? error.message : 'The decision was not saved.' }));
      });
    },
    [saveDecision],
  );

  const move = useCallback(
    (by: number) => {
      if (ordered.length === 0) return;
      const at = ordered.findIndex((o) => o.proposal.id === selectedId);
      const next = ordered[Math.min(ordered.length - 1, Math.max(0, at + by))]!;
      select(next.proposal.id);
      itemRefs.current.get(next.proposal.id)?.focus();
    },
    [ordered, selectedId, select],
  );

  useEffect(() => {
    function onKeyDown(event: KeyboardEvent) {
      if (event.defaultPrevented || event.altKey || event.ctrlKey || event.metaKey || isTyping(event.target)) return;
      if (document.querySelector('dialog[open]')) return;
      const inList = event.target instanceof Node && !!listRef.current?.contains(event.target);
      const key = event.key;
      if (key === 'j' || (inList && key === 'ArrowDown')) {
        event.preventDefault();
        move(1);
      } else if (key === 'k' || (inList && key === 'ArrowUp')) {
        event.preventDefault();
        move(-1);
      } else if (editable && selected && (key === 'a' || key === 'r')) {
        event.preventDefault();
        decide(selected.proposal.id, { decision: key === 'a' ? 'accepted' : 'rejected' });
        // Reviewing by keyboard walks down the list.
        move(1);
      } else if (editable && selected && key === 'u' && selected.proposal.decision !== 'pending') {
        event.preventDefault();
        decide(selected.proposal.id, { decision: 'pending' });
      } else if (editable && selected?.def && key === 'e') {
        event.preventDefault();
        setEditingId(selected.proposal.id);
      }
    }
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, [move, decide, editable, selected]);

  const fileUrl = datasheetFileUrl(sheet.id);
  const cadmium = extraction ? suggestsCadmium(extraction) : false;

  return (
    <div className="flex flex-col gap-6">
      <title>{`${sheet.fileName} · Datasheets · Understudy`}</title>
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to="/datasheets" className={LINK}>
          ← Datasheets
        </Link>
      </nav>
      <header className="flex flex-wrap items-start justify-between gap-4 border-b border-rule pb-5">
        <div className="flex min-w-0 flex-col gap-1.5">
          <p className="text-xs font-semibold tracking-wider text-copper-deep uppercase">Datasheet review</p>
          <h1 className="text-2xl font-bold tracking-tight break-all text-ink">{sheet.fileName}</h1>
          <p className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm text-ink-soft">
            <DatasheetStatusBadge status={sheet.status} />
            <span>
              {formatBytes(sheet.byteSize)} · {sheet.pageCount} {sheet.pageCount === 1 ? 'page' : 'pages'} · uploaded{' '}
              {sheet.uploadedBy ? `by ${sheet.uploadedBy.name} ` : ''}
              <time dateTime={sheet.createdAt}>{formatDate(sheet.createdAt)}</time>
            </span>
            {sheet.part && (
              <span>
                · for{' '}
                <Link to={`/parts/${sheet.part.id}`} className={LINK}>
                  {sheet.part.partNumber}
                </Link>
              </span>
            )}
          </p>
        </div>
        <a href={datasheetFileUrl(sheet.id, { download: true })} className={buttonClasses('secondary', 'sm')}>
          Download PDF
        </a>
      </header>

      {(sheet.status === 'queued' || sheet.status === 'parsing') && <ParserProgress sheet={sheet} />}
      {sheet.status === 'failed' && (
        <Alert tone="error" title="This datasheet could not be read">
          {sheet.failureReason ?? 'The parser gave no reason.'}
          <Can I="update" a="Datasheet">
            <RetryButton id={sheet.id} />
          </Can>
        </Alert>
      )}
      {sheet.status === 'applied' && sheet.part && (
        <Alert tone="success" title="Applied">
          The reviewed values went into{' '}
          <Link to={`/parts/${sheet.part.id}`} className={LINK}>
            {sheet.part.partNumber}
          </Link>{' '}
          {sheet.appliedAt ? `on ${formatDateTime(sheet.appliedAt)}` : ''}. Decisions can still be changed and applied again.
        </Alert>
      )}
      {extraction && extraction.warnings.length > 0 && (
        <Alert tone="warning" title="The parser noticed">
          <ul className="list-disc pl-5">
            {extraction.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Alert>
      )}
      {cadmium && <CadmiumCaution />}

      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <Card className="min-w-0 overflow-hidden lg:sticky lg:top-20" aria-labelledby="document-title">
          <h2 id="document-title" className="sr-only">
            Document
          </h2>
          <PdfViewer
            url={fileUrl}
            fileName={sheet.fileName}
            page={page}
            onPageChange={setManualPage}
            pageCount={extraction?.pageCount ?? sheet.pageCount}
            pageSizes={extraction?.pages}
            highlights={highlights}
          />
        </Card>

        <div className="flex min-w-0 flex-col gap-6">
          {extraction && (
            <Card aria-labelledby="identity-title">
              <SectionHeading id="identity-title">What the document is about</SectionHeading>
              <IdentityPanel identity={extraction.identity} onShowSource={showSource} />
            </Card>
          )}
          {extraction && (
            <Card aria-labelledby="proposals-title">
              <SectionHeading
                id="proposals-title"
                aside={<span className="text-xs text-ink-faint">{extraction.proposals.length} proposed</span>}
              >
                Proposed values
              </SectionHeading>
              {ordered.length === 0 ? (
                <EmptyState className="m-5" title="No values were found">
                  The parser read the document but found no parameter it could place. Enter the values on the part by hand.
                </EmptyState>
              ) : (
                <>
                  <p className="border-b border-rule px-5 py-2 text-xs text-ink-faint">
                    Keys: j / k or ↓ / ↑ move between values
                    {editable ? ' · a accept · r reject · e edit · u undo' : ''}. Selecting a value shows where it was read.
                  </p>
                  <ProposalList
                    ref={listRef}
                    groups={groups}
                    selectedId={selectedId}
                    editingId={editingId}
                    editable={editable}
                    saveErrors={saveErrors}
                    itemRef={itemRef}
                    onSelect={select}
                    onDecide={(id, decision) => decide(id, { decision })}
                    onStartEdit={setEditingId}
                    onSaveEdit={(id: string, value: ParameterValue) => {
                      decide(id, { decision: 'edited', value });
                      setEditingId(null);
                      itemRefs.current.get(id)?.focus();
                    }}
                    onCancelEdit={() => {
                      const id = editingId;
                      setEditingId(null);
                      if (id) itemRefs.current.get(id)?.focus();
                    }}
                  />
                </>
              )}
            </Card>
          )}
          {canApply && reviewable && extraction && (
            <Card aria-labelledby="apply-title">
              <SectionHeading id="apply-title">Apply to the catalog</SectionHeading>
              <ApplyPanel sheet={{ ...sheet, extraction }} onApplied={onApplied} />
            </Card>
          )}
        </div>
      </div>
    </div>
  );
}

/**
 * Review one datasheet: the PDF on the left with the selected value's source marked, what the parser proposed on the
 * right. `onApplied` lets the page tell other parts of the app that a part changed.
 */
export function DatasheetReview({ id, onApplied }: { id: string; onApplied?: (part: PartDto) => void }) {
  const sheet = useDatasheet(id);
  if (sheet.isPending) return <LoadingState label="Loading datasheet…" />;
  if (sheet.isError) {
    if (isApiClientError(sheet.error) && sheet.error.status === 404) {
      return (
        <EmptyState
          title="There is no such datasheet"
          action={
            <Link to="/datasheets" className={buttonClasses('secondary')}>
              Back to datasheets
            </Link>
          }
        >
          It may have been mistyped, or the link may be from another catalog.
        </EmptyState>
      );
    }
    return <ErrorState message={sheet.error.message} onRetry={() => void sheet.refetch()} />;
  }
  return <Review sheet={sheet.data} onApplied={onApplied} />;
}
