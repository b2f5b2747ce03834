import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { MAX_LINES } from '../../../../shared/schemas/analyze';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { countOf } from '../../../lib/words';
import { readRecipeText } from '../../../../shared/recipe-text';

export const RECIPE_TEXT_MAX_LENGTH = 10_000;
export const SERVINGS_MAX = 50;

export const recipeInputSchema = z.object({
  text: z
    .string()
    .max(RECIPE_TEXT_MAX_LENGTH, { error: `Keep the recipe under ${RECIPE_TEXT_MAX_LENGTH.toLocaleString('en-US')} characters.` })
    .refine((text) => ingredientLines(text).length > 0, { error: 'Paste at least one ingredient line.' })
    .refine((text) => ingredientLines(text).length <= MAX_LINES, {
      error: (issue) =>
        `A recipe has at most ${MAX_LINES} ingredient lines; this has ${ingredientLines(String(issue.input)).length}. Split it or leave out the lines that aren’t ingredients.`,
    }),
  servings: z
    .number({ error: 'Enter how many servings the recipe makes.' })
    .int({ error: 'Use a whole number of servings.' })
    .min(1, { error: 'A recipe makes at least 1 serving.' })
    .max(SERVINGS_MAX, { error: `Up to ${SERVINGS_MAX} servings at a time.` }),
});

export type RecipeInput = z.infer<typeof recipeInputSchema>;

/** The ingredient lines of pasted text, as the server will read them (title, headings and method set aside). */
export function ingredientLines(text: string): string[] {
  return readRecipeText(text).ingredients;
}

const PLACEHOLDER = [
  'For example:',
  '8 oz elbow macaroni',
  '2 cups shredded sharp cheddar',
  '1 1/2 cups whole milk',
  '3 tbsp butter',
  '2 tbsp all-purpose flour',
  '1/2 tsp salt',
].join('\n');

export interface RecipeInputFormProps {
  /** called with the pasted text as typed and the number of servings */
  onSubmit: (text: string, servings: number) => void | Promise<void>;
  submitting?: boolean;
  defaultText?: string;
  defaultServings?: number;
  submitLabel?: string;
  submittingLabel?: string;
}

export function RecipeInputForm({
  onSubmit,
  submitting = false,
  defaultText = '',
  defaultServings = 4,
  submitLabel = 'Analyse recipe',
  submittingLabel = 'Analysing…',
}: RecipeInputFormProps) {
  const {
    register,
    handleSubmit,
    control,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(recipeInputSchema),
    defaultValues: { text: defaultText, servings: defaultServings },
  });
  const text = useWatch({ control, name: 'text' }) ?? '';
  const lineCount = ingredientLines(text).length;

  const submit = handleSubmit(async (values: RecipeInput) => {
    await onSubmit(values.text, values.servings);
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      <TextAreaField
        label="Ingredients"
        hint="Paste the ingredient list as the recipe writes it, one per line: cups, spoons, ounces, grams or counts all work. A whole recipe page works too; its title, headings and method are set aside."
        placeholder={PLACEHOLDER}
        rows={10}
        spellCheck={false}
        error={errors.text?.message}
        {...register('text')}
      />
      <p className="-mt-3 text-sm text-ink-soft" aria-live="polite">
        {lineCount === 0
          ? 'No ingredient lines yet.'
          : `${countOf(lineCount, 'ingredient line')}${lineCount > MAX_LINES ? ` — at most ${MAX_LINES} lines` : ''}.`}
      </p>
      <div className="flex flex-wrap items-end gap-4">
        <TextField
          label="Servings"
          hint="Plates the recipe makes."
          type="number"
          inputMode="numeric"
          min={1}
          max={SERVINGS_MAX}
          step={1}
          containerClassName="w-48"
          error={errors.servings?.message}
          {...register('servings', { valueAsNumber: true })}
        />
        <Button type="submit" size="lg" loading={submitting || isSubmitting} loadingLabel={submittingLabel}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
