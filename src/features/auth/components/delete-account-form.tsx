import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button, buttonClasses } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { PasswordField } from '../../../components/ui/password-field';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import { useDeleteAccount } from '../api/delete-account';
import { deleteAccountFormSchema, type DeleteAccountFormInput } from '../schemas';
import { FormErrorAlert } from './form-error-alert';

/**
 * Deleting the account: the recipe download comes first, then the password and a checked
 * "I understand". `exportHref` is the whole recipe book as a JSON-LD file.
 */
export function DeleteAccountForm({ exportHref, onDeleted }: { exportHref: string; onDeleted: () => void }) {
  const remove = useDeleteAccount();
  const [fieldsShown, setFieldsShown] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(deleteAccountFormSchema), defaultValues: { password: '', understood: false } });

  const submit = handleSubmit((values: DeleteAccountFormInput) => {
    remove.mutate(values.password, {
      onSuccess: onDeleted,
      onError: (error) => setFieldsShown(applyServerFieldErrors(error, setError, ['password'])),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      <div className="flex flex-col gap-2">
        <p>
          Deleting your account removes your recipes with every version, your foods, your coach link and your sign-ins, for good. Keep your recipes first: the
          file holds every version, and Hearthswap can import it again.
        </p>
        <div>
          <a href={exportHref} download className={buttonClasses({ variant: 'secondary' })}>
            Download all my recipes (JSON-LD)
          </a>
        </div>
      </div>
      <FormErrorAlert error={remove.error} fieldsShown={fieldsShown} />
      <PasswordField label="Your password" autoComplete="current-password" error={errors.password?.message} {...register('password')} />
      <div>
        <CheckboxField label="I understand my recipes and foods are deleted for good" {...register('understood')} />
        {errors.understood?.message && (
          <p role="alert" className="px-2 text-sm font-semibold text-beet-700">
            {errors.understood.message}
          </p>
        )}
      </div>
      <div>
        <Button type="submit" variant="danger" loading={remove.isPending} loadingLabel="Deleting…">
          Delete my account
        </Button>
      </div>
    </form>
  );
}
