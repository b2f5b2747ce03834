import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ROLES } from '../../../../shared/food';
import type { LabelScanResponse, MyFood, SavedFoodResponse } from '../../../../shared/schemas/foods';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select-field';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import { formatNumber } from '../../../lib/format';
import { useSaveLabelFood } from '../api/save-label-food';
import { roleWords } from '../food-words';
import { EMPTY_LABEL_FORM, labelFormSchema, valuesFromFood, valuesFromScan, type LabelFormField, type LabelFormValues } from '../label-form';
import { LabelPhotoButton } from './label-photo-button';

const AMOUNTS: { field: LabelFormField; label: string; optional?: boolean; indent?: boolean }[] = [
  { field: 'fatG', label: 'Total fat (g)' },
  { field: 'satFatG', label: 'Saturated fat (g)', optional: true, indent: true },
  { field: 'sodiumMg', label: 'Sodium (mg)', optional: true },
  { field: 'carbsG', label: 'Total carbohydrate (g)' },
  { field: 'fiberG', label: 'Dietary fiber (g)', optional: true, indent: true },
  { field: 'sugarG', label: 'Total sugars (g)', optional: true, indent: true },
  { field: 'proteinG', label: 'Protein (g)' },
];

const FIELDS = Object.keys(EMPTY_LABEL_FORM) as LabelFormField[];

export interface LabelFoodFormProps {
  /** the food being edited, or null for a new one */
  food: MyFood | null;
  onSaved: (saved: SavedFoodResponse) => void;
  onCancel: () => void;
}

/** A packaged food from its Nutrition Facts panel: typed in, or read from a photo and then checked. */
export function LabelFoodForm({ food, onSaved, onCancel }: LabelFoodFormProps) {
  const save = useSaveLabelFood();
  const [scan, setScan] = useState<LabelScanResponse | null>(null);
  const [formLevelError, setFormLevelError] = useState(false);
  const {
    register,
    handleSubmit,
    getValues,
    reset,
    setError,
    formState: { errors },
  } = useForm<LabelFormValues, unknown, ReturnType<typeof labelFormSchema.parse>>({
    resolver: zodResolver(labelFormSchema),
    defaultValues: food ? valuesFromFood(food) : EMPTY_LABEL_FORM,
  });

  const submit = handleSubmit((input) => {
    setFormLevelError(false);
    save.mutate(
      { id: food?.id ?? null, input },
      {
        onSuccess: onSaved,
        onError: (error) => {
          const shown = applyServerFieldErrors(error, setError, FIELDS);
          if (isApiError(error) && error.fieldErrors.roles) setError('role', { type: 'server', message: error.fieldErrors.roles });
          setFormLevelError(!shown);
        },
      },
    );
  });

  function filled(result: LabelScanResponse) {
    reset(valuesFromScan(getValues(), result.fields), { keepDefaultValues: true });
    setScan(result);
  }

  const num = { inputMode: 'decimal' as const, autoComplete: 'off', spellCheck: false };

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6" aria-label={food ? `Edit ${food.name}` : 'Add a food from its label'}>
      <LabelPhotoButton onRead={filled} />
      {scan && (
        <Alert tone="caution" title="Check every number against the package before you save">
          <p>The photo filled the form (read with {formatNumber(scan.confidence * 100)} % confidence). Nothing is saved until you press Save.</p>
          {scan.notes.length > 0 && (
            <ul className="mt-2 list-disc pl-5">
              {scan.notes.map((note) => (
                <li key={note}>{note}</li>
              ))}
            </ul>
          )}
        </Alert>
      )}
      {formLevelError && save.isError && (
        <Alert tone="danger" title="The food wasn't saved" assertive>
          {errorMessage(save.error)}
        </Alert>
      )}
      <TextField
        label="Name"
        hint="As you will write it in recipes, e.g. “Cloudmeadow carb-smart tortilla”."
        autoComplete="off"
        error={errors.name?.message}
        {...register('name')}
      />
      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="mb-2 font-bold text-ink">Serving size, as printed</legend>
        <TextField
          label="Household measure"
          hint="“1 tortilla”, “17 slices”, “1/4 cup”"
          optional
          error={errors.servingLabel?.message}
          {...register('servingLabel')}
        />
        <TextField label="Grams" {...num} error={errors.servingSizeG?.message} {...register('servingSizeG')} />
        <TextField label="Millilitres" optional {...num} error={errors.servingSizeMl?.message} {...register('servingSizeMl')} />
      </fieldset>
      <TextField
        label="Calories"
        optional
        hint="Blank if the label has none: it is then worked out at 4 kcal per g of protein and carbohydrate, 9 per g of fat."
        {...num}
        error={errors.kcal?.message}
        {...register('kcal')}
      />
      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="mb-2 font-bold text-ink">Per serving</legend>
        {AMOUNTS.map((a) => (
          <TextField
            key={a.field}
            label={a.label}
            optional={a.optional}
            containerClassName={a.indent ? 'sm:pl-4' : undefined}
            {...num}
            error={errors[a.field]?.message}
            {...register(a.field)}
          />
        ))}
      </fieldset>
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField
          label="Part it plays in a dish"
          hint="Rewrites offer it as a swap for foods playing this part."
          error={errors.role?.message}
          {...register('role')}
        >
          <option value="">Judge from the name</option>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {roleWords(role)}
            </option>
          ))}
        </SelectField>
        <TextField label="Barcode" optional inputMode="numeric" autoComplete="off" error={errors.barcode?.message} {...register('barcode')} />
      </div>
      <p className="text-sm text-ink-soft">Check the package for allergens: Hearthswap only knows what the name tells it.</p>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" loading={save.isPending} loadingLabel="Saving…">
          {food ? 'Save changes' : 'Save the food'}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel} disabled={save.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
