import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Field, Input, Stack } from '@chakra-ui/react';
import { emailSchema } from '@nappe/shared';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError } from '../api-client.js';
import { useRequestPasswordReset } from './request-password-reset.js';
import { describeAuthError } from './describe-auth-error.js';
import { FormErrorAlert } from './form-error-alert.js';
import { useCountdown } from './use-countdown.js';

/** The same address rule as sign-in and the API (shared schema). */
const forgotPasswordSchema = z.object({ email: emailSchema });
type ForgotPasswordValues = z.input<typeof forgotPasswordSchema>;

/** Asks for a reset link. `onSent` gets the address as typed; the answer never says more. */
export function ForgotPasswordForm({
  defaultEmail = '',
  onSent,
}: {
  defaultEmail?: string;
  onSent: (email: string) => void;
}) {
  const request = useRequestPasswordReset();
  const wait = useCountdown();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<ForgotPasswordValues>({
    resolver: zodResolver(forgotPasswordSchema),
    defaultValues: { email: defaultEmail },
  });

  const onSubmit = handleSubmit(({ email }) =>
    request.mutate(
      { email },
      {
        onSuccess: () => onSent(email.trim()),
        onError: (error) => {
          if (error instanceof ApiError && error.status === 429) {
            wait.start(error.retryAfterSeconds ?? 60);
          }
        },
      },
    ),
  );

  const serverError = request.error
    ? describeAuthError(request.error, wait.secondsLeft, 'sending reset links')
    : null;

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Ask for a reset link">
      <Stack gap="5">
        {serverError && <FormErrorAlert {...serverError} />}
        <Field.Root invalid={!!errors.email} required>
          <Field.Label>E-mail</Field.Label>
          <Input type="email" autoComplete="email" inputMode="email" {...register('email')} />
          {errors.email ? (
            <Field.ErrorText>{errors.email.message}</Field.ErrorText>
          ) : (
            <Field.HelperText>The address you sign in with.</Field.HelperText>
          )}
        </Field.Root>
        <Button
          type="submit"
          size="lg"
          loading={request.isPending}
          loadingText="Sending…"
          disabled={wait.secondsLeft > 0}
        >
          Send me a link
        </Button>
      </Stack>
    </form>
  );
}
