import type { OutboxMessage } from '@chuckkey/core';
import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { cn } from '../../../components/ui/cn';
import { EmptyState } from '../../../components/ui/empty-state';
import { MailIcon } from '../../../components/ui/icons';
import { Pagination } from '../../../components/ui/pagination';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { formatDateTime } from '../../../lib/format';
import { useOutbox } from '../api/get-outbox';
import { useOutboxSelection } from '../hooks/use-outbox-selection';
import { MessageAttachments } from './message-attachments';
import { MessageBody } from './message-body';

const OUTBOX_PAGE_SIZE = 25;

function MessageDetail({ message, timeZone }: { message: OutboxMessage; timeZone: string | undefined }) {
  const headingRef = useRef<HTMLHeadingElement>(null);

  // On a phone the message opens below the list; moving focus there scrolls to it and tells
  // screen readers what changed.
  useEffect(() => {
    headingRef.current?.focus();
  }, [message.id]);

  return (
    <article aria-labelledby="outbox-message-subject" className="flex flex-col gap-4 rounded-lg border border-neutral-300 bg-white p-4 md:p-6">
      <h2 id="outbox-message-subject" ref={headingRef} tabIndex={-1} className="text-xl font-bold break-words text-neutral-900">
        {message.subject || '(no subject)'}
      </h2>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="font-bold text-neutral-800">From</dt>
        <dd className="break-all">{message.from}</dd>
        <dt className="font-bold text-neutral-800">To</dt>
        <dd className="break-all">{message.to.join(', ')}</dd>
        <dt className="font-bold text-neutral-800">Caught</dt>
        <dd>
          <time dateTime={message.receivedAt}>{formatDateTime(message.receivedAt, timeZone)}</time>
        </dd>
      </dl>
      <MessageBody text={message.text} />
      <MessageAttachments messageId={message.id} attachments={message.attachments} />
    </article>
  );
}

export function OutboxView({ timeZone }: { timeZone: string | undefined }) {
  const { page, messageId, hrefFor, goToPage } = useOutboxSelection();
  const outbox = useOutbox({ page, pageSize: OUTBOX_PAGE_SIZE });

  if (outbox.isPending) return <Spinner label="Loading the outbox…" />;
  if (outbox.isError) {
    return <QueryError error={outbox.error} what="the outbox" onRetry={() => void outbox.refetch()} retrying={outbox.isFetching} />;
  }
  if (outbox.data.total === 0) {
    return (
      <EmptyState title="No mail caught yet">
        Mail lands here when Chuckkey sends some: invite someone under People, or ask for a password link on the
        sign-in page, and the message appears.
      </EmptyState>
    );
  }

  const selected = outbox.data.items.find((message) => message.id === messageId);

  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
      <section aria-labelledby="outbox-list-heading" className="flex flex-col gap-3">
        <h2 id="outbox-list-heading" className="sr-only">
          Caught mail, newest first
        </h2>
        <ul className="divide-y divide-neutral-200 overflow-hidden rounded-lg border border-neutral-300 bg-white">
          {outbox.data.items.map((message) => {
            const current = message.id === selected?.id;
            return (
              <li key={message.id}>
                <Link
                  to={hrefFor(message.id)}
                  aria-current={current ? 'true' : undefined}
                  className={cn(
                    'flex min-h-11 flex-col gap-0.5 px-4 py-3 hover:bg-neutral-100',
                    current && 'border-l-4 border-brand bg-brand-soft hover:bg-brand-soft',
                  )}
                >
                  <span className="font-bold break-words text-neutral-900">{message.subject || '(no subject)'}</span>
                  <span className="break-all text-neutral-800">To {message.to.join(', ')}</span>
                  <span className="text-sm text-neutral-700">
                    <time dateTime={message.receivedAt}>{formatDateTime(message.receivedAt, timeZone)}</time>
                  </span>
                </Link>
              </li>
            );
          })}
        </ul>
        <Pagination page={page} pageSize={OUTBOX_PAGE_SIZE} total={outbox.data.total} nouns={['message', 'messages']} onPageChange={goToPage} />
      </section>

      {selected ? (
        <MessageDetail message={selected} timeZone={timeZone} />
      ) : (
        <div className="hidden flex-col items-center justify-center gap-2 rounded-lg border border-dashed border-neutral-400 p-8 text-center text-neutral-700 lg:flex">
          <MailIcon className="size-8 text-neutral-500" />
          <p>{messageId ? 'That message is not on this page. Pick one from the list.' : 'Pick a message to read it.'}</p>
        </div>
      )}
    </div>
  );
}
