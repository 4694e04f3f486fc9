import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Field, Stack } from '@chakra-ui/react';
import { PASSWORD_MIN_LENGTH, passwordSchema } from '@nappe/shared';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError } from '../api-client.js';
import { useConfirmPasswordReset } from './confirm-password-reset.js';
import { describeAuthError } from './describe-auth-error.js';
import { FormErrorAlert } from './form-error-alert.js';
import { PasswordInput } from './password-input.js';
import { useCountdown } from './use-countdown.js';

/** The registration rule, checked here before sending (shared schema); the API judges strength. */
const resetPasswordSchema = z.object({ password: passwordSchema });
type ResetPasswordValues = z.input<typeof resetPasswordSchema>;

/** The API's words for a link that cannot be used (expired, used, replaced or unknown). */
const LINK_PROBLEM = /reset link/i;

/**
 * Splits a 400 into what ends the form (the link itself) and what the person can fix here: every
 * other message is about the one field, the new password (too short, too easy to guess).
 */
export function sortResetErrors(error: ApiError): { link: string | null; password: string[] } {
  const link = error.messages.find((m) => LINK_PROBLEM.test(m)) ?? null;
  return { link, password: error.messages.filter((m) => !LINK_PROBLEM.test(m)) };
}

export function ResetPasswordForm({
  token,
  onDone,
  onLinkProblem,
}: {
  token: string;
  onDone: () => void;
  onLinkProblem: (message: string) => void;
}) {
  const confirm = useConfirmPasswordReset();
  const wait = useCountdown();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<ResetPasswordValues>({
    resolver: zodResolver(resetPasswordSchema),
    defaultValues: { password: '' },
  });

  const onSubmit = handleSubmit(({ password }) =>
    confirm.mutate(
      { token, password },
      {
        onSuccess: onDone,
        onError: (error) => {
          if (!(error instanceof ApiError)) return;
          if (error.status === 429) wait.start(error.retryAfterSeconds ?? 60);
          if (error.status !== 400) return;
          const sorted = sortResetErrors(error);
          if (sorted.link) return onLinkProblem(sorted.link);
          setError(
            'password',
            { type: 'server', message: sorted.password.join(' ') },
            { shouldFocus: true },
          );
        },
      },
    ),
  );

  // A 400 is shown on the field (or ends the form); anything else above the form.
  const error = confirm.error;
  const summary =
    error && !(error instanceof ApiError && error.status === 400)
      ? describeAuthError(error, wait.secondsLeft, 'choosing a new password')
      : null;

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Password reset">
      <Stack gap="5">
        {summary && <FormErrorAlert {...summary} />}
        <Field.Root invalid={!!errors.password} required>
          <Field.Label>New password</Field.Label>
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
          loading={confirm.isPending}
          loadingText="Saving…"
          disabled={wait.secondsLeft > 0}
        >
          Save the new password
        </Button>
      </Stack>
    </form>
  );
}
