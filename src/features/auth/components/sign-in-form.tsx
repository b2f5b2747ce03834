import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { EmailField } from '../../../components/ui/email-field';
import { PasswordField } from '../../../components/ui/password-field';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import type { User } from '../../../lib/user';
import { useSignIn } from '../api/sign-in';
import { loginSchema, type LoginInput } from '../schemas';
import { FormErrorAlert } from './form-error-alert';

export function SignInForm({ onSignedIn }: { onSignedIn: (user: User) => void }) {
  const signIn = useSignIn();
  const [fieldsShown, setFieldsShown] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(loginSchema), defaultValues: { email: '', password: '' } });

  const submit = handleSubmit((values: LoginInput) => {
    signIn.mutate(values, {
      onSuccess: onSignedIn,
      onError: (error) => setFieldsShown(applyServerFieldErrors(error, setError, ['email', 'password'])),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      <FormErrorAlert error={signIn.error} fieldsShown={fieldsShown} />
      <EmailField label="E-mail" error={errors.email?.message} {...register('email')} />
      <PasswordField label="Password" autoComplete="current-password" error={errors.password?.message} {...register('password')} />
      <Link to="/forgot-password" className="-mt-3 self-end text-sm font-bold text-accent-strong underline underline-offset-4">
        Forgot your password?
      </Link>
      <Button type="submit" size="lg" fullWidth loading={signIn.isPending} loadingLabel="Signing in…">
        Sign in
      </Button>
    </form>
  );
}
