import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Field, Input, Stack } from '@chakra-ui/react';
import { PASSWORD_MIN_LENGTH, registerSchema, type AuthUser } from '@nappe/shared';
import {
  describeAuthError,
  FormErrorAlert,
  PasswordInput,
  useCountdown,
} from '@nappe/web-kit/auth';
import { useForm } from 'react-hook-form';
import { ApiError } from '../../../lib/api-client';
import { useRegister } from '../api/register';

export const EMAIL_TAKEN_MESSAGE =
  'An account with this e-mail already exists. Sign in instead, or use another address.';

export function CreateAccountForm({ onCreated }: { onCreated: (user: AuthUser) => void }) {
  const registration = useRegister();
  const wait = useCountdown();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({
    resolver: zodResolver(registerSchema),
    defaultValues: { name: '', email: '', password: '' },
  });

  const onSubmit = handleSubmit((values) =>
    registration.mutate(values, {
      onSuccess: (session) => onCreated(session.user),
      onError: (error) => {
        if (!(error instanceof ApiError)) return;
        if (error.status === 409) {
          setError(
            'email',
            { type: 'server', message: EMAIL_TAKEN_MESSAGE },
            { shouldFocus: true },
          );
        } else if (error.status === 429) {
          wait.start(error.retryAfterSeconds ?? 60);
        }
      },
    }),
  );

  const error = registration.error;
  const emailTaken = error instanceof ApiError && error.status === 409;
  const serverError =
    error && !emailTaken ? describeAuthError(error, wait.secondsLeft, 'creating an account') : null;

  return (
    <form onSubmit={onSubmit} noValidate>
      <Stack gap="5">
        {serverError && <FormErrorAlert {...serverError} />}
        <Field.Root invalid={!!errors.name} required>
          <Field.Label>Your name</Field.Label>
          <Input autoComplete="name" {...register('name')} />
          <Field.ErrorText>{errors.name?.message}</Field.ErrorText>
        </Field.Root>
        <Field.Root invalid={!!errors.email} required>
          <Field.Label>E-mail</Field.Label>
          <Input type="email" autoComplete="email" inputMode="email" {...register('email')} />
          <Field.ErrorText>{errors.email?.message}</Field.ErrorText>
        </Field.Root>
        <Field.Root invalid={!!errors.password} required>
          <Field.Label>Password</Field.Label>
          <PasswordInput autoComplete="new-password" {...register('password')} />
          {errors.password ? (
            <Field.ErrorText>{errors.password.message}</Field.ErrorText>
          ) : (
            <Field.HelperText>
              At least {PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong,
              memorable passphrase.
            </Field.HelperText>
          )}
        </Field.Root>
        <Button
          type="submit"
          size="lg"
          loading={registration.isPending}
          loadingText="Creating your account…"
          disabled={wait.secondsLeft > 0}
        >
          Create account
        </Button>
      </Stack>
    </form>
  );
}
