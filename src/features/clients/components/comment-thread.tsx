import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/field';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { useAddVersionComment, useMarkCommentsRead, useUnreadComments, useVersionComments } from '../api/version-comments';
import { formatDateTime } from '../../../lib/dates';

const MAX_COMMENT_CHARS = 4_000;

export interface CommentThreadProps {
  recipeId: number;
  number: number;
  viewerId: number;
  otherName: string;
  /** the version's owner is reading: once the thread is on screen its unread comments count as read */
  ownerView?: boolean;
}

/**
 * The comments on one saved version, oldest first, and a box to add one. `otherName` is who reads
 * along: the client's name on the coach's review page, "your coach" on the client's own recipe page.
 */
export function CommentThread({ recipeId, number, viewerId, otherName, ownerView = false }: CommentThreadProps) {
  const id = useId();
  const comments = useVersionComments(recipeId, number);
  const add = useAddVersionComment(recipeId, number);
  const unread = useUnreadComments(ownerView);
  const unreadHere = unread.data?.recipes.find((r) => r.recipeId === recipeId)?.versions.find((v) => v.number === number)?.unread ?? 0;
  const { mutate: markRead, isPending: marking } = useMarkCommentsRead(recipeId, number);
  const listRef = useRef<HTMLOListElement>(null);
  const loaded = comments.isSuccess;

  // Read means seen: the badge clears when the comments are on screen, not when the page opens.
  useEffect(() => {
    const list = listRef.current;
    if (!ownerView || unreadHere === 0 || !loaded || marking || !list) return;
    if (typeof IntersectionObserver === 'undefined') {
      markRead();
      return;
    }
    const observer = new IntersectionObserver((entries) => {
      if (!entries.some((entry) => entry.isIntersecting)) return;
      observer.disconnect();
      markRead();
    });
    observer.observe(list);
    return () => observer.disconnect();
  }, [ownerView, unreadHere, loaded, marking, markRead]);
  const [body, setBody] = useState('');
  const [error, setError] = useState<string | undefined>();

  function submit(event: FormEvent) {
    event.preventDefault();
    const text = body.trim();
    if (!text) {
      setError('Write a comment first.');
      return;
    }
    setError(undefined);
    add.mutate(text, {
      onSuccess: () => setBody(''),
      onError: (e) => setError(isApiError(e) ? e.fieldErrors.body : undefined),
    });
  }

  return (
    <div className="flex flex-col gap-5">
      {comments.isPending ? (
        <LoadingState label="Loading the comments…" />
      ) : comments.isError ? (
        <ErrorState title="The comments didn't load" error={comments.error} onRetry={() => void comments.refetch()} retrying={comments.isFetching} />
      ) : comments.data.length === 0 ? (
        <p className="text-ink-soft">No comments yet. What you write here, {otherName} reads beside this version.</p>
      ) : (
        <ol ref={listRef} aria-label="Comments" className="flex flex-col gap-3">
          {comments.data.map((comment) => {
            const mine = comment.author.id === viewerId;
            return (
              <li
                key={comment.id}
                className={mine ? 'rounded-card border border-ember-200 bg-ember-50 p-4 sm:ml-10' : 'rounded-card border border-line bg-surface p-4 sm:mr-10'}
              >
                <p className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm">
                  <span className="font-bold text-ink">{mine ? 'You' : comment.author.displayName}</span>
                  {comment.author.role === 'coach' && <Badge tone="ember">Coach</Badge>}
                  <time dateTime={comment.createdAt} className="text-ink-soft">
                    {formatDateTime(comment.createdAt)}
                  </time>
                </p>
                <p className="mt-1.5 whitespace-pre-line text-ink">{comment.body}</p>
              </li>
            );
          })}
        </ol>
      )}
      <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-labelledby={`${id}-label`}>
        <span id={`${id}-label`} className="sr-only">
          Leave a comment
        </span>
        {add.isError && !error && (
          <Alert tone="danger" title="The comment wasn't posted" assertive>
            {errorMessage(add.error)}
          </Alert>
        )}
        <TextAreaField
          label="Your comment"
          hint={`Only ${otherName} and you can read it.`}
          maxLength={MAX_COMMENT_CHARS}
          value={body}
          onChange={(e) => {
            setBody(e.target.value);
            if (error) setError(undefined);
          }}
          error={error}
          className="min-h-28"
        />
        <Button type="submit" loading={add.isPending} loadingLabel="Posting…" className="self-start">
          Post the comment
        </Button>
      </form>
    </div>
  );
}
