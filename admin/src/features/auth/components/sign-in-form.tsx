import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Button, Field, Input, Link, Stack } from '@chakra-ui/react';
import { loginSchema, type AuthUser } from '@nappe/shared';
import {
  describeAuthError,
  FormErrorAlert,
  PasswordInput,
  useCountdown,
} from '@nappe/web-kit/auth';
import { useForm } from 'react-hook-form';
import { env } from '../../../config/env';
import { ApiError } from '../../../lib/api-client';
import { NotAdmittedError, useLogin } from '../api/login';

export function SignInForm({ onSignedIn }: { onSignedIn: (user: AuthUser) => void }) {
  const login = useLogin();
  const wait = useCountdown();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm({ resolver: zodResolver(loginSchema), defaultValues: { email: '', password: '' } });

  const onSubmit = handleSubmit((values) =>
    login.mutate(values, {
      onSuccess: (session) => onSignedIn(session.user),
      onError: (error) => {
        if (error instanceof ApiError && error.status === 429) {
          wait.start(error.retryAfterSeconds ?? 60);
        }
      },
    }),
  );

  const error = login.error;
  return (
    <form onSubmit={onSubmit} noValidate>
      <Stack gap="5">
        {error instanceof NotAdmittedError ? (
          <ClientAccountNotice name={error.user.name} />
        ) : error ? (
          <FormErrorAlert {...describeAuthError(error, wait.secondsLeft)} />
        ) : null}
        <Field.Root invalid={!!errors.email} required>
          <Field.Label>E-mail</Field.Label>
          <Input type="email" autoComplete="email" inputMode="email" {...register('email')} />
          <Field.ErrorText>{errors.email?.message}</Field.ErrorText>
        </Field.Root>
        <Field.Root invalid={!!errors.password} required>
          <Field.Label>Password</Field.Label>
          <PasswordInput autoComplete="current-password" {...register('password')} />
          <Field.ErrorText>{errors.password?.message}</Field.ErrorText>
        </Field.Root>
        <Button
          type="submit"
          size="lg"
          loading={login.isPending}
          loadingText="Signing in…"
          disabled={wait.secondsLeft > 0}
        >
          Sign in
        </Button>
      </Stack>
    </form>
  );
}

function ClientAccountNotice({ name }: { name: string }) {
  return (
    <Alert.Root status="warning" role="alert" borderRadius="l2">
      <Alert.Indicator />
      <Alert.Content gap="2">
        <Alert.Title>This is the studio’s kitchen app</Alert.Title>
        <Alert.Description>
          {name}, your account is a client account. Clients book desserts and follow their events on
          the storefront, so we have signed you out here.
        </Alert.Description>
        <Link
          href={env.storefrontUrl}
          fontWeight="semibold"
          color="caramel.fg"
          textDecoration="underline"
        >
          Go to the storefront
        </Link>
      </Alert.Content>
    </Alert.Root>
  );
}
