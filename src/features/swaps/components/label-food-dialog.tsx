import { useId, useState, type FormEvent } from 'react';
import { ROLES } from '../../../../shared/food';
import type { FoodDetail } from '../../../../shared/schemas/analyze';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select-field';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { useCreateCustomFood } from '../api/custom-food';
import type { RoleLabel } from '../../../lib/swap-words';
import { emptyLabelFood, labelFoodErrorsFrom, labelFoodInput, type LabelFoodErrors, type LabelFoodField, type LabelFoodValues } from '../label-food-form';

export interface LabelFoodDialogProps {
  open: boolean;
  onClose: () => void;
  onCreated: (food: FoodDetail) => void;
  roleLabel: RoleLabel;
}

const AMOUNTS: { field: LabelFoodField; label: string; unit: string; optional?: boolean }[] = [
  { field: 'proteinG', label: 'Protein', unit: 'g' },
  { field: 'fatG', label: 'Total fat', unit: 'g' },
  { field: 'satFatG', label: 'Saturated fat', unit: 'g', optional: true },
  { field: 'carbsG', label: 'Total carbohydrate', unit: 'g' },
  { field: 'fiberG', label: 'Dietary fiber', unit: 'g', optional: true },
  { field: 'sugarG', label: 'Total sugars', unit: 'g', optional: true },
  { field: 'sodiumMg', label: 'Sodium', unit: 'mg', optional: true },
];

/** A food the catalogue lacks, typed in from its package's nutrition label, per serving as printed. */
export function LabelFoodDialog({ open, onClose, onCreated, roleLabel }: LabelFoodDialogProps) {
  const formId = useId();
  const create = useCreateCustomFood();
  const [values, setValues] = useState<LabelFoodValues>(emptyLabelFood);
  const [errors, setErrors] = useState<LabelFoodErrors>({});

  const set = (field: LabelFoodField) => (event: { target: { value: string } }) => {
    const value = event.target.value;
    setValues((v) => ({ ...v, [field]: value }));
    if (errors[field]) setErrors((e) => ({ ...e, [field]: undefined }));
  };

  function close() {
    if (create.isPending) return;
    setValues(emptyLabelFood());
    setErrors({});
    create.reset();
    onClose();
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    const result = labelFoodInput(values);
    if (!result.ok) {
      setErrors(result.errors);
      const first = Object.keys(result.errors)[0];
      if (first) document.getElementById(`${formId}-${first}`)?.focus();
      return;
    }
    create.mutate(result.input, {
      onSuccess: (food) => {
        onCreated(food);
        setValues(emptyLabelFood());
        setErrors({});
        create.reset();
      },
      onError: (error) => {
        if (isApiError(error)) setErrors(labelFoodErrorsFrom(error.fieldErrors));
      },
    });
  }

  const numberProps = { inputMode: 'decimal' as const, autoComplete: 'off', spellCheck: false };
  const shownFieldErrors = Object.values(errors).some(Boolean);

  return (
    <Dialog
      open={open}
      onClose={close}
      title="Add a food from a label"
      footer={
        <>
          <Button variant="secondary" onClick={close} disabled={create.isPending}>
            Cancel
          </Button>
          <Button type="submit" form={formId} loading={create.isPending} loadingLabel="Adding…">
            Add the food
          </Button>
        </>
      }
    >
      <form id={formId} onSubmit={submit} noValidate className="flex flex-col gap-5 text-ink">
        <p className="text-ink-soft">
          Copy the numbers for one serving exactly as the package prints them. Hearthswap keeps them per 100 g; you and your clients can then use the food in
          swaps and recipes.
        </p>
        {create.isError && !shownFieldErrors && (
          <Alert tone="danger" title="The food wasn't added" assertive>
            {errorMessage(create.error)}
          </Alert>
        )}
        <TextField id={`${formId}-name`} label="Name" autoComplete="off" value={values.name} onChange={set('name')} error={errors.name} />
        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 font-bold text-ink">Serving size</legend>
          <p className="-mt-1 text-sm text-ink-soft">Labels often give both, e.g. “1/4 cup (28 g)”. With both, Hearthswap knows how much a cup of it weighs.</p>
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField
              id={`${formId}-servingSizeG`}
              label="Grams"
              {...numberProps}
              value={values.servingSizeG}
              onChange={set('servingSizeG')}
              error={errors.servingSizeG}
            />
            <TextField
              id={`${formId}-servingSizeMl`}
              label="Millilitres"
              optional
              {...numberProps}
              value={values.servingSizeMl}
              onChange={set('servingSizeMl')}
              error={errors.servingSizeMl}
            />
          </div>
        </fieldset>
        <TextField
          id={`${formId}-kcal`}
          label="Calories (kcal)"
          optional
          hint="Leave blank if the label has none: Hearthswap then works it out from protein and carbohydrate at 4 kcal per gram and fat at 9 kcal per gram."
          {...numberProps}
          value={values.kcal}
          onChange={set('kcal')}
          error={errors.kcal}
        />
        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 font-bold text-ink">Per serving</legend>
          <div className="grid gap-3 sm:grid-cols-2">
            {AMOUNTS.map((a) => (
              <TextField
                key={a.field}
                id={`${formId}-${a.field}`}
                label={`${a.label} (${a.unit})`}
                optional={a.optional}
                {...numberProps}
                value={values[a.field]}
                onChange={set(a.field)}
                error={errors[a.field]}
              />
            ))}
          </div>
        </fieldset>
        <SelectField
          id={`${formId}-role`}
          label="Part it plays in a dish"
          hint="Swaps and rewrites look for foods sharing a role. Leave it to Hearthswap to judge from the name if unsure."
          value={values.role}
          onChange={set('role')}
          error={errors.role}
        >
          <option value="">Judge from the name</option>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {roleLabel(role)}
            </option>
          ))}
        </SelectField>
      </form>
    </Dialog>
  );
}
