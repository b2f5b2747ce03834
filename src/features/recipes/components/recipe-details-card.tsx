import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import { isRevisionConflict, useUpdateRecipe } from '../api/update-recipe';
import { SERVINGS_MAX, recipeServingsField, recipeTitleField } from '../recipe-fields';

const detailsSchema = z.object({
  title: recipeTitleField,
  servings: recipeServingsField,
  notes: z.string().max(20_000, { error: 'Keep the notes under 20,000 characters.' }),
  method: z.string().max(20_000, { error: 'Keep the method under 20,000 characters.' }),
});
type Details = z.infer<typeof detailsSchema>;
const FIELDS = ['title', 'servings', 'notes', 'method'] as const;
const FIELD_LABELS: Record<Field, string> = { title: 'title', servings: 'servings', notes: 'notes', method: 'method' };

function detailsOf(recipe: RecipeDetail): Details {
  return { title: recipe.title, servings: recipe.servings, notes: recipe.notes, method: recipe.method };
}

function sameDetails(a: Details, b: Details): boolean {
  return FIELDS.every((f) => a[f] === b[f]);
}

function Prose({ text, empty }: { text: string; empty: string }) {
  return text.trim() ? <p className="leading-relaxed whitespace-pre-line text-ink">{text}</p> : <p className="text-ink-soft italic">{empty}</p>;
}

/** What the saved copy now says, under a field that changed elsewhere. */
function SavedElsewhere({ value }: { value: string }) {
  return (
    <details className="rounded-field border border-honey-200 bg-honey-50 px-3 py-2 text-sm text-honey-800">
      <summary className="cursor-pointer font-bold">Changed elsewhere: see the saved text</summary>
      <p className="mt-1.5 whitespace-pre-line">{value || '(empty)'}</p>
    </details>
  );
}

type Field = (typeof FIELDS)[number];
type Conflict = null | { stage: 'refused' } | { stage: 'reloaded'; saved: Details; clashes: Field[]; taken: Field[] };

export interface RecipeDetailsCardProps {
  recipe: RecipeDetail;
  /** fetches the recipe again and resolves with the fresh copy; rejects when that fails */
  onReload: () => Promise<RecipeDetail | undefined>;
}

/**
 * Title, servings, notes and method, edited against the revision the cook opened. When the
 * recipe changed elsewhere meanwhile the save is refused; what was typed stays in the form.
 */
export function RecipeDetailsCard({ recipe, onReload }: RecipeDetailsCardProps) {
  const toast = useToast();
  const update = useUpdateRecipe();
  const [editing, setEditing] = useState(false);
  const [baseRevision, setBaseRevision] = useState(recipe.revision);
  const [conflict, setConflict] = useState<Conflict>(null);
  const [reloading, setReloading] = useState(false);
  const startedFrom = useRef<Details>(detailsOf(recipe));
  const titleRef = useRef<HTMLInputElement | null>(null);
  const editButtonId = useId();
  const [formProblem, setFormProblem] = useState<unknown>(null);

  const {
    register,
    handleSubmit,
    reset,
    setError,
    setValue,
    getValues,
    control,
    formState: { errors },
  } = useForm<Details>({ resolver: zodResolver(detailsSchema), defaultValues: detailsOf(recipe) });
  const typed = useWatch({ control }) as Details;

  // Our own photo upload also moves the revision on. When the fields being edited are still as
  // they were when editing began, nobody else's words would be overwritten: carry on from it.
  useEffect(() => {
    if (!editing || conflict || recipe.revision === baseRevision) return;
    if (sameDetails(detailsOf(recipe), startedFrom.current)) setBaseRevision(recipe.revision);
  }, [editing, conflict, recipe, baseRevision]);

  function startEditing() {
    const now = detailsOf(recipe);
    startedFrom.current = now;
    reset(now);
    setBaseRevision(recipe.revision);
    setConflict(null);
    setFormProblem(null);
    update.reset();
    setEditing(true);
    requestAnimationFrame(() => titleRef.current?.focus());
  }

  function stopEditing() {
    setEditing(false);
    setConflict(null);
    requestAnimationFrame(() => document.getElementById(editButtonId)?.focus());
  }

  /**
   * Fetches the saved copy and merges it with the form: a field only the other save changed takes
   * the saved text; a field only the cook changed keeps what was typed; a field both changed keeps
   * what was typed and shows the saved text under it.
   */
  async function reload() {
    setReloading(true);
    setFormProblem(null);
    try {
      const fresh = await onReload();
      if (!fresh) return;
      const original = startedFrom.current;
      const typedNow = getValues();
      const saved = detailsOf(fresh);
      const taken: Field[] = [];
      const clashes: Field[] = [];
      for (const field of FIELDS) {
        const cookChanged = typedNow[field] !== original[field];
        const savedChanged = saved[field] !== original[field];
        if (savedChanged && !cookChanged) {
          setValue(field, saved[field], { shouldDirty: true });
          taken.push(field);
        } else if (savedChanged && typedNow[field] !== saved[field]) clashes.push(field);
      }
      setBaseRevision(fresh.revision);
      startedFrom.current = saved;
      setConflict({ stage: 'reloaded', saved, clashes, taken });
    } catch (error) {
      setFormProblem(error);
    } finally {
      setReloading(false);
    }
  }

  const save = handleSubmit((values) => {
    setFormProblem(null);
    update.mutate(
      { id: recipe.id, revision: baseRevision, ...values },
      {
        onSuccess: () => {
          toast.show('Saved.', 'success');
          stopEditing();
        },
        onError: (error) => {
          if (isRevisionConflict(error)) setConflict({ stage: 'refused' });
          else if (!applyServerFieldErrors(error, setError, FIELDS)) setFormProblem(error);
        },
      },
    );
  });

  if (!editing) {
    return (
      <Card
        title="About this recipe"
        actions={
          <Button id={editButtonId} variant="secondary" size="sm" onClick={startEditing}>
            Edit details
          </Button>
        }
      >
        <div className="flex flex-col gap-5">
          <section aria-labelledby="recipe-notes-heading" className="flex flex-col gap-1.5">
            <h3 id="recipe-notes-heading" className="font-extrabold text-ink">
              Notes
            </h3>
            <Prose text={recipe.notes} empty="No notes yet: where it came from, what to serve with it, how it keeps." />
          </section>
          <section aria-labelledby="recipe-method-heading" className="flex flex-col gap-1.5">
            <h3 id="recipe-method-heading" className="font-extrabold text-ink">
              Method
            </h3>
            <Prose text={recipe.method} empty="No method written down yet." />
          </section>
        </div>
      </Card>
    );
  }

  const saved = conflict?.stage === 'reloaded' ? conflict.saved : null;
  // Fields the other save changed and that now differ from what the cook typed.
  const changedElsewhere = conflict?.stage === 'reloaded' ? conflict.clashes.filter((f) => String(conflict.saved[f]) !== String(typed[f] ?? '')) : [];
  const titleField = register('title');

  return (
    <Card title="Edit the details" description="Title, servings, notes and method. The ingredients live in the versions below.">
      <form noValidate onSubmit={save} className="flex flex-col gap-4">
        {conflict?.stage === 'refused' && (
          <Alert
            tone="caution"
            assertive
            title="This recipe changed elsewhere — reload"
            action={
              <Button variant="secondary" size="sm" onClick={() => void reload()} loading={reloading} loadingLabel="Reloading…">
                Reload the latest
              </Button>
            }
          >
            It was saved from another tab or device after you opened it, so nothing was changed. What you typed is still here: reload to see the saved copy,
            then save again to keep your words.
          </Alert>
        )}
        {conflict?.stage === 'reloaded' && (
          <Alert tone="info" title={`Loaded the saved copy (revision ${baseRevision})`}>
            {[
              conflict.taken.length > 0 && `What changed elsewhere is now in the form (${conflict.taken.map((f) => FIELD_LABELS[f]).join(', ')}).`,
              changedElsewhere.length > 0
                ? `You and the other save both changed the ${changedElsewhere.map((f) => FIELD_LABELS[f]).join(' and ')}: your text is kept, the saved text is under the field. Save to keep yours, or discard your changes.`
                : 'Your edits are kept. Save to keep both.',
            ]
              .filter(Boolean)
              .join(' ')}
          </Alert>
        )}
        <TextField
          label="Title"
          autoComplete="off"
          error={errors.title?.message}
          {...titleField}
          ref={(el) => {
            titleField.ref(el);
            titleRef.current = el;
          }}
        />
        {saved && changedElsewhere.includes('title') && <SavedElsewhere value={saved.title} />}
        <TextField
          label="Servings"
          hint="Plates the recipe makes; a version keeps the servings it was saved with."
          type="number"
          inputMode="numeric"
          min={1}
          max={SERVINGS_MAX}
          step={1}
          containerClassName="max-w-64"
          error={errors.servings?.message}
          {...register('servings', { valueAsNumber: true })}
        />
        {saved && changedElsewhere.includes('servings') && <SavedElsewhere value={String(saved.servings)} />}
        <TextAreaField label="Notes" optional rows={4} className="min-h-28" error={errors.notes?.message} {...register('notes')} />
        {saved && changedElsewhere.includes('notes') && <SavedElsewhere value={saved.notes} />}
        <TextAreaField
          label="Method"
          optional
          hint="One step a line reads best on the printed card."
          rows={8}
          error={errors.method?.message}
          {...register('method')}
        />
        {saved && changedElsewhere.includes('method') && <SavedElsewhere value={saved.method} />}
        {formProblem != null && (
          <Alert tone="danger" title="Not saved">
            {errorMessage(formProblem)}
          </Alert>
        )}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" loading={update.isPending} loadingLabel="Saving…">
            Save details
          </Button>
          <Button variant="secondary" onClick={stopEditing} disabled={update.isPending}>
            {conflict ? 'Discard my changes' : 'Cancel'}
          </Button>
        </div>
      </form>
    </Card>
  );
}
