import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { EmailField } from '../../../components/ui/email-field';
import { ChoiceCards, TextField } from '../../../components/ui/field';
import { PasswordField } from '../../../components/ui/password-field';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import type { User } from '../../../lib/user';
import { useSignUp } from '../api/sign-up';
import { PASSWORD_MIN_LENGTH, registerSchema, type RegisterInput } from '../schemas';
import { FormErrorAlert } from './form-error-alert';

const ROLE_CHOICES = [
  {
    value: 'cook' as const,
    label: 'I cook for myself or my household',
    description:
      'Paste the recipes you love, see what is in a serving, get a lighter version that keeps the portion size, and keep the ones you like in your recipe book. If a coach invites you, their approved swaps and targets come with you.',
  },
  {
    value: 'coach' as const,
    label: 'I coach other people',
    description:
      'Build a library of swaps you approve, with cooking notes, publish it to your clients, invite them by e-mail, set their targets and look over the versions they save. Coaching here does not replace a licensed dietitian.',
  },
];

const FIELDS = ['displayName', 'email', 'password', 'role'] as const;

/** Sign-up from a coach's invitation: the account takes the invited address and is a cook's. */
export interface SignUpInvitation {
  token: string;
  email: string;
  coachName: string;
}

export function SignUpForm({ onSignedUp, invitation }: { onSignedUp: (user: User) => void; invitation?: SignUpInvitation }) {
  const signUp = useSignUp();
  const [fieldsShown, setFieldsShown] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({
    resolver: zodResolver(registerSchema),
    defaultValues: invitation
      ? { displayName: '', email: invitation.email, password: '', role: 'cook' as const }
      : { displayName: '', email: '', password: '', role: undefined },
  });

  const submit = handleSubmit((values: RegisterInput) => {
    // bound to the invitation: the invited address, a cook account (the server refuses anything else)
    const input = invitation ? { ...values, email: invitation.email, role: 'cook' as const, invitationToken: invitation.token } : values;
    signUp.mutate(input, {
      onSuccess: onSignedUp,
      onError: (error) => setFieldsShown(applyServerFieldErrors(error, setError, FIELDS)),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6">
      <FormErrorAlert error={signUp.error} fieldsShown={fieldsShown} />
      {invitation ? (
        <p className="rounded-field border border-ember-200 bg-ember-50 px-4 py-3 text-ink">
          You're joining <strong>{invitation.coachName}</strong> as a cook: your account is linked with them as soon as it is created.
        </p>
      ) : (
        <ChoiceCards legend="How will you use Hearthswap?" options={ROLE_CHOICES} columns={2} error={errors.role?.message} inputProps={register('role')} />
      )}
      <TextField
        label="Display name"
        hint="Shown to your coach or clients. A first name is plenty."
        autoComplete="nickname"
        maxLength={80}
        error={errors.displayName?.message}
        {...register('displayName')}
      />
      <EmailField
        label="E-mail"
        readOnly={invitation !== undefined}
        hint={
          invitation
            ? `The invitation was sent to this address, so your account uses it. To use another address, ask ${invitation.coachName} to invite that one.`
            : undefined
        }
        error={errors.email?.message}
        {...register('email')}
      />
      <PasswordField
        label="Password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A short sentence you will remember works well.`}
        autoComplete="new-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" size="lg" fullWidth loading={signUp.isPending} loadingLabel="Creating your account…">
        {invitation ? `Create account and join ${invitation.coachName}` : 'Create account'}
      </Button>
    </form>
  );
}
