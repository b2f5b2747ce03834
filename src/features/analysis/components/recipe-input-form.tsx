import { useRef, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { MAX_LINES } from '../../../../shared/recipe-limits';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { countOf } from '../../../lib/words';
import { ingredientLines, SERVINGS_MAX } from '../recipe-input';
import type { RecipeInputErrors } from '../recipe-input-schema';

type CheckRecipeInput = (values: { text: string; servings: number }) => RecipeInputErrors | null;

/** The form's checks (and zod with them), fetched at the first submit rather than with the Kitchen. */
function loadChecks(): Promise<CheckRecipeInput> {
  return import('../recipe-input-schema').then((m) => m.recipeInputErrors);
}

/** What an `<input type="number">` holds, as a number: NaN when empty. */
function servingsNumber(raw: string): number {
  return raw.trim() === '' ? Number.NaN : Number(raw);
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
  const [text, setText] = useState(defaultText);
  const [servings, setServings] = useState(String(defaultServings));
  const [errors, setErrors] = useState<RecipeInputErrors>({});
  const [checking, setChecking] = useState(false);
  // after the first submit, every change is checked again (and its message cleared once it is right)
  const check = useRef<CheckRecipeInput | null>(null);
  const textRef = useRef<HTMLTextAreaElement>(null);
  const servingsRef = useRef<HTMLInputElement>(null);
  const lineCount = ingredientLines(text).length;

  const recheck = (values: { text: string; servings: string }) => {
    if (check.current) setErrors(check.current({ text: values.text, servings: servingsNumber(values.servings) }) ?? {});
  };

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setChecking(true);
    // Read the fields themselves: text typed or pasted before the page finished loading is in them
    // (the fields are uncontrolled so that hydration never resets what the cook already wrote).
    const typed = { text: textRef.current?.value ?? text, servings: servingsRef.current?.value ?? servings };
    setText(typed.text);
    setServings(typed.servings);
    try {
      check.current ??= await loadChecks();
      const values = { text: typed.text, servings: servingsNumber(typed.servings) };
      const found = check.current(values);
      setErrors(found ?? {});
      if (found) {
        (found.text ? textRef : servingsRef).current?.focus();
        return;
      }
      await onSubmit(values.text, values.servings);
    } finally {
      setChecking(false);
    }
  };

  return (
    <form onSubmit={(event) => void submit(event)} noValidate className="flex flex-col gap-5">
      <TextAreaField
        label="Ingredients"
        hint="Paste the ingredient list as the recipe writes it, one per line: cups, spoons, ounces, grams or counts all work. A whole recipe page works too; its title, headings and method are set aside."
        placeholder={PLACEHOLDER}
        rows={10}
        spellCheck={false}
        error={errors.text}
        name="text"
        ref={textRef}
        defaultValue={defaultText}
        onChange={(event) => {
          setText(event.target.value);
          recheck({ text: event.target.value, servings });
        }}
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
          error={errors.servings}
          name="servings"
          ref={servingsRef}
          defaultValue={String(defaultServings)}
          onChange={(event) => {
            setServings(event.target.value);
            recheck({ text, servings: event.target.value });
          }}
        />
        <Button type="submit" size="lg" loading={submitting || checking} loadingLabel={submittingLabel}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
