import { formatStamp } from '../../../lib/dates';
import { Fragment, useState } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { Button } from '../../../components/ui/button';
import { LoadingState } from '../../../components/ui/spinner';
import { isApiError } from '../../../lib/api-client';
import { useOutbox, type OutboxMessage } from '../api/outbox';
import { splitLinks } from '../text-links';
import { countOf } from '../../../lib/words';

function MailText({ text }: { text: string }) {
  return (
    <p className="font-sans whitespace-pre-wrap break-words text-ink">
      {splitLinks(text).map((part, i) =>
        part.kind === 'link' ? (
          <a key={i} href={part.href} className="font-bold break-all text-accent-strong underline underline-offset-2">
            {part.text}
          </a>
        ) : (
          <Fragment key={i}>{part.text}</Fragment>
        ),
      )}
    </p>
  );
}

function Message({ message, open }: { message: OutboxMessage; open: boolean }) {
  const received = formatStamp(message.receivedAt);
  return (
    <details open={open} className="group rounded-card border border-line bg-surface shadow-card open:border-line-strong">
      <summary className="flex cursor-pointer list-none items-start justify-between gap-4 rounded-card p-5 hover:bg-oat-50 [&::-webkit-details-marker]:hidden">
        <span className="flex min-w-0 flex-col gap-0.5">
          <h2 className="text-lg font-extrabold break-words text-ink">{message.subject || '(no subject)'}</h2>
          <span className="text-sm break-all text-ink-soft">
            To {message.to.join(', ')} · <time dateTime={message.receivedAt}>{received}</time>
          </span>
        </span>
        <span aria-hidden="true" className="mt-1 shrink-0 text-ink-soft transition-transform group-open:rotate-180">
          ▾
        </span>
      </summary>
      <div className="flex flex-col gap-3 px-5 pb-5">
        <p className="text-sm break-all text-ink-soft">
          <span className="font-bold">From</span> {message.from}
        </p>
        <div className="rounded-field border border-line bg-oat-50 px-4 py-3">
          <MailText text={message.text || '(This message has no plain-text part.)'} />
        </div>
      </div>
    </details>
  );
}

/** The development outbox, newest mail first. */
export function OutboxList() {
  const outbox = useOutbox();
  // The spinner is for the check the admin asked for, not the quiet one every 10 seconds.
  const [checking, setChecking] = useState(false);
  if (outbox.isPending) return <LoadingState label="Opening the outbox…" />;
  if (outbox.isError) {
    if (isApiError(outbox.error) && outbox.error.status === 404) {
      return (
        <EmptyState title="No outbox on this server">
          The outbox only runs in development, where Hearthswap keeps mail on this machine instead of sending it. Here mail goes out for real.
        </EmptyState>
      );
    }
    return <ErrorState title="The outbox didn't load" error={outbox.error} onRetry={() => void outbox.refetch()} retrying={outbox.isFetching} />;
  }
  const messages = outbox.data;
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-ink-soft" aria-live="polite">
          {messages.length === 0 ? '' : `${countOf(messages.length, 'message')}, newest first; open one to read it. Checks for new mail every 10 seconds.`}
        </p>
        <Button
          variant="secondary"
          size="sm"
          onClick={() => {
            setChecking(true);
            void outbox.refetch().finally(() => setChecking(false));
          }}
          loading={checking}
          loadingLabel="Checking…"
        >
          Check now
        </Button>
      </div>
      {messages.length === 0 ? (
        <EmptyState title="The outbox is empty">
          Nothing has been sent since the server started. Invitations a coach sends and password-reset links land here.
        </EmptyState>
      ) : (
        <ol aria-label="Messages, newest first" className="flex flex-col gap-4">
          {messages.map((message, index) => (
            <li key={message.id}>
              <Message message={message} open={index === 0} />
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
