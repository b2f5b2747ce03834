import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ChoiceCards, TextField } from '../../../components/ui/field';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import { formatWeight } from '../../../lib/format';
import { unitSystemOf, type User } from '../../../lib/user';
import { useUpdateMe } from '../api/update-me';
import { accountSchema, type AccountInput } from '../schemas';
import { FormErrorAlert } from './form-error-alert';

// The examples are worked out by the same formatter the rest of the app uses.
const EXAMPLE_GRAMS = [227, 1250];

const UNIT_CHOICES = [
  {
    value: 'us' as const,
    label: 'US measures',
    description: `Ounces and pounds beside the grams: ${EXAMPLE_GRAMS.map((g) => formatWeight(g, 'us')).join(', ')}.`,
  },
  {
    value: 'metric' as const,
    label: 'Metric',
    description: `Grams, with kilograms for big batches: ${EXAMPLE_GRAMS.map((g) => formatWeight(g, 'metric')).join(', ')}.`,
  },
];

export function AccountSettingsForm({ user, onSaved }: { user: User; onSaved?: (user: User) => void }) {
  const updateMe = useUpdateMe();
  const [fieldsShown, setFieldsShown] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm({
    resolver: zodResolver(accountSchema),
    defaultValues: { displayName: user.displayName, unitSystem: unitSystemOf(user) },
  });

  const submit = handleSubmit((values: AccountInput) => {
    updateMe.mutate(values, {
      onSuccess: (saved) => {
        reset({ displayName: saved.displayName ?? values.displayName, unitSystem: saved.unitSystem ?? values.unitSystem });
        onSaved?.(saved);
      },
      onError: (error) => setFieldsShown(applyServerFieldErrors(error, setError, ['displayName', 'unitSystem'])),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6">
      <FormErrorAlert error={updateMe.error} fieldsShown={fieldsShown} />
      {updateMe.isSuccess && !isDirty && <Alert tone="success">Your changes are saved.</Alert>}
      <TextField
        label="Display name"
        hint="Shown to your coach or clients."
        autoComplete="nickname"
        maxLength={80}
        error={errors.displayName?.message}
        {...register('displayName')}
      />
      <ChoiceCards
        legend="Measures beside grams"
        hint="Hearthswap always weighs in grams, the way a kitchen scale reads. Pick what you would like to see next to them."
        options={UNIT_CHOICES}
        error={errors.unitSystem?.message}
        inputProps={register('unitSystem')}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" loading={updateMe.isPending} loadingLabel="Saving…" disabled={!isDirty}>
          Save changes
        </Button>
        {isDirty && (
          <Button variant="quiet" onClick={() => reset()} disabled={updateMe.isPending}>
            Undo changes
          </Button>
        )}
      </div>
    </form>
  );
}
