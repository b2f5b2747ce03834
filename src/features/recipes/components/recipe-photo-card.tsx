import { useId, useState } from 'react';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { useToast } from '../../../components/ui/toast';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { PHOTO_TYPES, photoFileProblem, useRemovePhoto, useUploadPhoto } from '../api/upload-photo';

/** The words under the file field when the server sent them ("This file is not a photo…"), else the whole message. */
function photoErrorWords(error: unknown) {
  return (isApiError(error) && error.fieldErrors.file) || errorMessage(error);
}

function PlateSketch() {
  return (
    <svg aria-hidden="true" viewBox="0 0 64 64" className="size-16 text-oat-400" fill="none">
      <circle cx="32" cy="34" r="20" stroke="currentColor" strokeWidth="3" />
      <circle cx="32" cy="34" r="11" stroke="currentColor" strokeWidth="2.5" strokeDasharray="3 4" />
      <path d="M24 12c0-3 3-3 3-6M32 12c0-3 3-3 3-6M40 12c0-3 3-3 3-6" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" />
    </svg>
  );
}

/** The dish's photo, with a way to add or replace it and how far the upload has come. */
export function RecipePhotoCard({ recipe }: { recipe: RecipeDetail }) {
  const inputId = useId();
  const toast = useToast();
  const upload = useUploadPhoto(recipe.id, recipe.revision);
  const remove = useRemovePhoto(recipe.id, recipe.revision);
  const [problem, setProblem] = useState<string | null>(null);

  function send(file: File | undefined) {
    if (!file) return;
    upload.reset();
    remove.reset();
    const reason = photoFileProblem(file);
    setProblem(reason);
    if (reason) return;
    upload.mutate(file, {
      onSuccess: () => toast.show('Photo saved.', 'success'),
      onError: (error) => {
        if (error instanceof DOMException && error.name === 'AbortError') toast.show('Upload cancelled.');
      },
    });
  }

  const failed = upload.isError && !(upload.error instanceof DOMException && upload.error.name === 'AbortError');

  return (
    <section aria-labelledby={`${inputId}-heading`} className="flex flex-col gap-3 rounded-card border border-line bg-surface p-4 shadow-card">
      <h2 id={`${inputId}-heading`} className="sr-only">
        Photo
      </h2>
      <div className={cx('relative overflow-hidden rounded-field bg-oat-100', recipe.photoUrl ? 'aspect-[4/3]' : 'h-36 lg:h-auto lg:aspect-[4/3]')}>
        {recipe.photoUrl ? (
          <img src={recipe.photoUrl} alt={`The dish: ${recipe.title}`} className="size-full object-cover" />
        ) : (
          <div className="flex size-full flex-col items-center justify-center gap-2 p-4 text-center text-ink-soft">
            <PlateSketch />
            <span className="text-sm">No photo yet</span>
          </div>
        )}
      </div>

      {upload.progress !== null ? (
        <div className="flex flex-col gap-2">
          <ProgressBar value={upload.progress} label="Uploading the photo" />
          <div className="flex items-center justify-between gap-2 text-sm text-ink-soft">
            <span aria-live="polite">{upload.progress >= 1 ? 'Sent; saving…' : 'Uploading…'}</span>
            <Button variant="quiet" size="sm" onClick={upload.cancel}>
              Cancel
            </Button>
          </div>
        </div>
      ) : (
        <div className="flex flex-col gap-1.5">
          <input
            id={inputId}
            type="file"
            accept={PHOTO_TYPES.join(',')}
            className="peer sr-only"
            aria-describedby={`${inputId}-hint`}
            onChange={(e) => {
              send(e.target.files?.[0]);
              e.target.value = '';
            }}
          />
          {/* The input stays focusable (Enter or Space opens the picker); its label is what shows. */}
          <label
            htmlFor={inputId}
            className="inline-flex min-h-9 cursor-pointer items-center justify-center gap-1.5 self-start rounded-pill border border-line-strong bg-surface px-3 text-sm font-bold text-ink hover:bg-oat-100 peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-focus"
          >
            {recipe.photoUrl ? 'Replace the photo' : 'Add a photo'}
          </label>
          {recipe.photoUrl && (
            <Button
              variant="quiet"
              size="sm"
              className="self-start"
              loading={remove.isPending}
              loadingLabel="Removing…"
              onClick={() => {
                upload.reset();
                setProblem(null);
                remove.mutate(undefined, { onSuccess: () => toast.show('Photo removed.', 'success') });
              }}
            >
              Remove the photo
            </Button>
          )}
          <p id={`${inputId}-hint`} className="text-sm text-ink-soft">
            JPEG, PNG or WebP, up to 5 MB.
          </p>
        </div>
      )}

      {problem && (
        <Alert tone="caution" title="That photo can't be used" assertive>
          {problem}
        </Alert>
      )}
      {failed && (
        <Alert tone="danger" title="The photo wasn't saved">
          {photoErrorWords(upload.error)}
        </Alert>
      )}
      {remove.isError && (
        <Alert tone="danger" title="The photo wasn't removed">
          {errorMessage(remove.error)}
        </Alert>
      )}
    </section>
  );
}
