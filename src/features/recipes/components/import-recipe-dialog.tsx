import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { errorMessage } from '../../../lib/api-client';
import type { ImportedRecipe } from '../../../lib/api/recipes';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import { cx } from '../../../lib/cx';
import { useCreateRecipe } from '../api/create-recipe';
import { IMPORT_EXTENSIONS, importFileProblem, useImportRecipe } from '../api/import-recipe';
import { SERVINGS_MAX, recipeServingsField, recipeTitleField } from '../recipe-fields';

type ImportMode = 'file' | 'paste';

const pastedRecipeSchema = z.object({
  title: recipeTitleField,
  servings: recipeServingsField,
  text: z
    .string()
    .max(20_000, { error: 'Keep the ingredients under 20,000 characters.' })
    .refine((text) => text.split(/\r?\n/).some((line) => line.trim().length > 0), { error: 'Paste at least one ingredient line.' }),
  method: z.string().max(20_000, { error: 'Keep the method under 20,000 characters.' }),
});
type PastedRecipe = z.infer<typeof pastedRecipeSchema>;

function ModeSwitch({ mode, onChange }: { mode: ImportMode; onChange: (mode: ImportMode) => void }) {
  const name = useId();
  const options: { value: ImportMode; label: string }[] = [
    { value: 'file', label: 'Upload a file' },
    { value: 'paste', label: 'Paste the text' },
  ];
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="sr-only">How to bring the recipe in</legend>
      <div className="grid grid-cols-2 gap-1 rounded-pill bg-oat-100 p-1">
        {options.map((option) => (
          <label
            key={option.value}
            className={cx(
              'cursor-pointer rounded-pill px-3 py-2 text-center text-sm font-bold transition-colors',
              'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus',
              mode === option.value ? 'bg-surface text-ink shadow-sm' : 'text-ink-soft hover:text-ink',
            )}
          >
            <input type="radio" name={name} value={option.value} checked={mode === option.value} onChange={() => onChange(option.value)} className="sr-only" />
            {option.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

function FileImportForm({ onImported, onCancel }: { onImported: (recipe: ImportedRecipe) => void; onCancel: () => void }) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const importing = useImportRecipe();

  function choose(next: File | null) {
    importing.reset();
    setFile(next);
    setProblem(next ? importFileProblem(next) : null);
  }

  return (
    <form
      noValidate
      className="flex flex-col gap-4"
      onSubmit={(event) => {
        event.preventDefault();
        if (!file) {
          setProblem('Choose a file first.');
          input.current?.focus();
          return;
        }
        const reason = importFileProblem(file);
        if (reason) return setProblem(reason);
        importing.mutate(file, { onSuccess: onImported });
      }}
    >
      <div className="flex flex-col gap-1.5">
        <label htmlFor={inputId} className="font-bold text-ink">
          Recipe file
        </label>
        <p id={`${inputId}-hint`} className="text-sm text-ink-soft">
          Plain text or Markdown with a title, an ingredient list and the method, or a recipe saved as JSON or JSON-LD (a Hearthswap export works, a whole-book
          one brings every recipe). Up to 1 MB.
        </p>
        <input
          ref={input}
          id={inputId}
          type="file"
          accept={[...IMPORT_EXTENSIONS, 'text/plain', 'text/markdown', 'application/json', 'application/ld+json'].join(',')}
          aria-describedby={`${inputId}-hint${problem ? ` ${inputId}-error` : ''}`}
          aria-invalid={problem ? true : undefined}
          onChange={(e) => choose(e.target.files?.[0] ?? null)}
          className="block w-full rounded-field border border-line-strong bg-surface text-sm text-ink file:mr-3 file:cursor-pointer file:rounded-l-field file:border-0 file:bg-oat-100 file:px-4 file:py-2.5 file:font-bold file:text-ink hover:file:bg-oat-200"
        />
        {problem && (
          <p id={`${inputId}-error`} className="flex items-start gap-1.5 text-sm font-semibold text-beet-700">
            <span aria-hidden="true">●</span>
            <span>{problem}</span>
          </p>
        )}
      </div>
      {importing.isError && (
        <Alert tone="danger" title="That file couldn't be imported">
          {errorMessage(importing.error)}
        </Alert>
      )}
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={importing.isPending}>
          Cancel
        </Button>
        <Button type="submit" loading={importing.isPending} loadingLabel="Importing…">
          Import the file
        </Button>
      </div>
    </form>
  );
}

function PasteImportForm({ onImported, onCancel }: { onImported: (recipe: RecipeDetail) => void; onCancel: () => void }) {
  const creating = useCreateRecipe();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<PastedRecipe>({
    resolver: zodResolver(pastedRecipeSchema),
    defaultValues: { title: '', servings: 4, text: '', method: '' },
  });
  const [formProblem, setFormProblem] = useState<unknown>(null);

  const submit = handleSubmit((values) => {
    setFormProblem(null);
    creating.mutate(
      { title: values.title, servings: values.servings, text: values.text, ...(values.method.trim() ? { method: values.method } : {}) },
      {
        onSuccess: onImported,
        onError: (error) => {
          if (!applyServerFieldErrors(error, setError, ['title', 'servings', 'text', 'method'])) setFormProblem(error);
        },
      },
    );
  });

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-4">
      <TextField label="Title" autoComplete="off" error={errors.title?.message} {...register('title')} />
      <TextField
        label="Servings"
        type="number"
        inputMode="numeric"
        min={1}
        max={SERVINGS_MAX}
        step={1}
        containerClassName="w-40"
        error={errors.servings?.message}
        {...register('servings', { valueAsNumber: true })}
      />
      <TextAreaField
        label="Ingredients"
        hint="One ingredient a line, as the recipe writes it."
        rows={7}
        spellCheck={false}
        placeholder={'1 lb ziti\n24 oz marinara sauce\n2 cups shredded mozzarella'}
        className="min-h-36"
        error={errors.text?.message}
        {...register('text')}
      />
      <TextAreaField label="Method" optional rows={4} className="min-h-24" error={errors.method?.message} {...register('method')} />
      {formProblem != null && (
        <Alert tone="danger" title="The recipe wasn't saved">
          {errorMessage(formProblem)}
        </Alert>
      )}
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={creating.isPending}>
          Cancel
        </Button>
        <Button type="submit" loading={creating.isPending} loadingLabel="Saving…">
          Save to the book
        </Button>
      </div>
    </form>
  );
}

export interface ImportRecipeDialogProps {
  open: boolean;
  onClose: () => void;
  onImported: (recipe: ImportedRecipe) => void;
}

/** Brings a recipe into the book from a file or from pasted text; the ingredients become version 1. */
export function ImportRecipeDialog({ open, onClose, onImported }: ImportRecipeDialogProps) {
  const [mode, setMode] = useState<ImportMode>('file');
  return (
    <Dialog open={open} onClose={onClose} title="Import a recipe">
      {/* Unmounted while closed so the next opening starts from empty forms. */}
      {open && (
        <div className="flex max-h-[70dvh] flex-col gap-5 overflow-y-auto px-1 pb-1 text-ink">
          <ModeSwitch mode={mode} onChange={setMode} />
          {mode === 'file' ? <FileImportForm onImported={onImported} onCancel={onClose} /> : <PasteImportForm onImported={onImported} onCancel={onClose} />}
        </div>
      )}
    </Dialog>
  );
}
