import type { OutboxMessage } from '@understudy/shared-types';
import { useState } from 'react';
import { Button, EmptyState, ErrorState, LoadingState, SectionHeading, Spinner, cx } from '../../../components/ui';
import { isApiClientError } from '../../../lib/api-client';
import { formatDateTime, formatRelative } from '../../../lib/format';
import { OUTBOX_REFRESH_MS, useOutbox } from '../api/get-outbox';
import { LinkifiedText } from './linkified-text';

function MessageList({
  messages,
  selectedId,
  onSelect,
}: {
  messages: OutboxMessage[];
  selectedId: string | undefined;
  onSelect: (id: string) => void;
}) {
  return (
    <ul aria-label="Captured messages" className="divide-y divide-rule">
      {messages.map((message) => {
        const selected = message.id === selectedId;
        return (
          <li key={message.id}>
            <button
              type="button"
              aria-current={selected || undefined}
              onClick={() => onSelect(message.id)}
              className={cx(
                'flex w-full flex-col gap-0.5 border-l-4 px-4 py-3 text-left transition-colors',
                selected ? 'border-copper bg-copper-wash/60' : 'border-transparent hover:bg-paper',
              )}
            >
              <span className="truncate text-sm font-semibold text-ink">{message.subject || '(no subject)'}</span>
              <span className="truncate text-xs text-ink-soft">To {message.to.join(', ')}</span>
              <time dateTime={message.receivedAt} title={formatDateTime(message.receivedAt)} className="text-xs text-ink-faint">
                {formatRelative(message.receivedAt)}
              </time>
            </button>
          </li>
        );
      })}
    </ul>
  );
}

function MessageDetail({ message }: { message: OutboxMessage }) {
  return (
    <article aria-labelledby="outbox-message-subject" className="flex min-w-0 flex-col">
      <header className="border-b border-rule px-5 py-4">
        <h2 id="outbox-message-subject" className="text-lg font-semibold text-ink">
          {message.subject || '(no subject)'}
        </h2>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
          <dt className="text-ink-faint">From</dt>
          <dd className="break-all text-ink-soft">{message.from}</dd>
          <dt className="text-ink-faint">To</dt>
          <dd className="break-all text-ink-soft">{message.to.join(', ')}</dd>
          <dt className="text-ink-faint">Received</dt>
          <dd className="text-ink-soft">
            <time dateTime={message.receivedAt}>{formatDateTime(message.receivedAt)}</time>
          </dd>
        </dl>
      </header>
      <div data-testid="outbox-message-body" className="px-5 py-4 font-mono text-[0.8125rem] leading-relaxed whitespace-pre-wrap text-ink">
        <LinkifiedText text={message.text} />
      </div>
    </article>
  );
}

export function OutboxView() {
  const outbox = useOutbox();
  const [selectedId, setSelectedId] = useState<string>();

  const refreshButton = (
    <div className="flex items-center gap-3">
      <span className="hidden text-xs text-ink-faint sm:inline">Checks every {OUTBOX_REFRESH_MS / 1000} s</span>
      <Button variant="secondary" size="sm" onClick={() => void outbox.refetch()} disabled={outbox.isFetching}>
        {outbox.isFetching ? <Spinner /> : null}
        Refresh
      </Button>
    </div>
  );

  if (outbox.isPending) return <LoadingState label="Loading the outbox…" />;
  if (outbox.isError) {
    if (isApiClientError(outbox.error) && outbox.error.status === 404) {
      return (
        <EmptyState title="The outbox is off here">
          Captured mail is only kept in development. In production, Understudy sends real e-mail.
        </EmptyState>
      );
    }
    const message = outbox.error instanceof Error ? outbox.error.message : 'Try again.';
    return <ErrorState message={message} onRetry={() => void outbox.refetch()} />;
  }

  const messages = outbox.data;
  if (messages.length === 0) {
    return (
      <div className="flex flex-col gap-4">
        <div className="flex justify-end">{refreshButton}</div>
        <EmptyState title="No mail yet">
          In development, every e-mail Understudy sends — invitations, password resets — lands here instead of a real
          inbox. Invite someone or request a password reset and it appears within a few seconds.
        </EmptyState>
      </div>
    );
  }

  const selected = messages.find((message) => message.id === selectedId) ?? messages[0];

  return (
    <div className="grid overflow-hidden rounded-lg border border-rule bg-card md:grid-cols-[minmax(16rem,22rem)_1fr]">
      <div className="border-b border-rule md:border-r md:border-b-0">
        <SectionHeading aside={refreshButton}>
          {messages.length} {messages.length === 1 ? 'message' : 'messages'}
        </SectionHeading>
        <div className="max-h-[32rem] overflow-y-auto md:max-h-[calc(100dvh-16rem)]">
          <MessageList messages={messages} selectedId={selected?.id} onSelect={setSelectedId} />
        </div>
      </div>
      {selected && <MessageDetail message={selected} />}
    </div>
  );
}
