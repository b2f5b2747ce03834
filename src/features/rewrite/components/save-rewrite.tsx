import { useState } from 'react';
import { Link } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { TextField } from '../../../components/ui/field';
import type { RewriteDraft } from '../save-draft';

/** What saving can be for this visitor; the page decides and does the saving. */
export type RewriteSaveAction =
  | {
      kind: 'save';
      save: (draft: RewriteDraft) => Promise<void>;
      /** the Kitchen holds a saved recipe: the rewrite becomes its next version, under its title */
      into?: { title: string; nextNumber: number };
      /** a title read from the pasted recipe, offered in the empty title field */
      suggestedTitle?: string;
    }
  | { kind: 'sign-in'; signInHref: string; signUpHref: string }
  | { kind: 'unavailable'; reason: string };

export interface SaveRewriteProps {
  action: RewriteSaveAction;
  /** the draft for a title; null while there is nothing to save */
  draftFor: (title: string) => RewriteDraft | null;
  /** the rewrite on screen was made for an older version of the recipe */
  stale: boolean;
}

const TITLE_MAX = 200;

/** Keep the rewrite: as written becomes version 1 in the recipe book, the rewrite version 2. */
export function SaveRewrite({ action, draftFor, stale }: SaveRewriteProps) {
  const [title, setTitle] = useState(action.kind === 'save' ? (action.suggestedTitle ?? '').slice(0, TITLE_MAX) : '');
  const [titleError, setTitleError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const [error, setError] = useState<unknown>(null);

  if (action.kind === 'sign-in') {
    return (
      <Alert
        tone="info"
        title="Sign in to keep this rewrite"
        announce={false}
        action={
          <div className="flex flex-wrap gap-2">
            <Link to={action.signInHref} className={buttonClasses({ size: 'sm' })}>
              Sign in
            </Link>
            <Link to={action.signUpHref} className={buttonClasses({ size: 'sm', variant: 'secondary' })}>
              Create an account
            </Link>
          </div>
        }
      >
        Saving puts the recipe as written and this rewrite side by side in your recipe book. The recipe, your targets and this rewrite stay here while you sign
        in.
      </Alert>
    );
  }
  if (action.kind === 'unavailable') {
    return <p className="text-sm text-ink-soft">{action.reason}</p>;
  }

  const into = action.into;
  const save = async () => {
    const trimmed = (into?.title ?? title).trim();
    if (!trimmed) return setTitleError('Give the recipe a title.');
    if (trimmed.length > TITLE_MAX) return setTitleError(`Keep the title under ${TITLE_MAX} characters.`);
    const draft = draftFor(trimmed);
    if (!draft) return;
    setTitleError(null);
    setError(null);
    setSaving(true);
    try {
      await action.save(draft);
    } catch (e) {
      setError(e);
    } finally {
      setSaving(false);
    }
  };

  return (
    <form
      noValidate
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        void save();
      }}
    >
      {stale && (
        <Alert tone="caution" announce={false}>
          The recipe has changed since this rewrite. Saving keeps the recipe and the rewrite as they were when you pressed Rewrite.
        </Alert>
      )}
      {into ? (
        <div className="flex flex-wrap items-center gap-3">
          <p className="min-w-0 flex-1 basis-64 text-ink-soft">
            This rewrite becomes version {into.nextNumber} of “{into.title}”; the versions already saved stay as they are.
          </p>
          <Button type="submit" loading={saving} loadingLabel="Saving…">
            Save as version {into.nextNumber}
          </Button>
        </div>
      ) : (
        <div className="flex flex-wrap items-end gap-3">
          <TextField
            label="Recipe title"
            hint="As written becomes version 1, this rewrite version 2."
            placeholder="e.g. Sunday lasagna"
            value={title}
            maxLength={TITLE_MAX + 20}
            onChange={(event) => setTitle(event.target.value)}
            error={titleError ?? undefined}
            containerClassName="min-w-0 flex-1 basis-64"
          />
          <Button type="submit" loading={saving} loadingLabel="Saving…">
            Save to my recipe book
          </Button>
        </div>
      )}
      {error != null && <ErrorState title="The rewrite wasn’t saved" error={error} />}
    </form>
  );
}
