import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { PasswordField } from '../../../components/ui/password-field';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import { useChangePassword } from '../api/change-password';
import { changePasswordSchema, PASSWORD_MIN_LENGTH, type ChangePasswordInput } from '../schemas';
import { FormErrorAlert } from './form-error-alert';

export function ChangePasswordForm() {
  const change = useChangePassword();
  const [fieldsShown, setFieldsShown] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(changePasswordSchema), defaultValues: { currentPassword: '', newPassword: '' } });

  const submit = handleSubmit((values: ChangePasswordInput) => {
    change.mutate(values, {
      onSuccess: () => reset(),
      onError: (error) => setFieldsShown(applyServerFieldErrors(error, setError, ['currentPassword', 'newPassword'])),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      <FormErrorAlert error={change.error} fieldsShown={fieldsShown} />
      {change.isSuccess && <Alert tone="success">Your password is changed. Any other device signed in to this account has been signed out.</Alert>}
      <PasswordField label="Current password" autoComplete="current-password" error={errors.currentPassword?.message} {...register('currentPassword')} />
      <PasswordField
        label="New password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        autoComplete="new-password"
        error={errors.newPassword?.message}
        {...register('newPassword')}
      />
      <div>
        <Button type="submit" loading={change.isPending} loadingLabel="Changing…">
          Change password
        </Button>
      </div>
    </form>
  );
}
