import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Field, Input, Stack } from '@chakra-ui/react';
import { nameSchema, PASSWORD_MIN_LENGTH, passwordSchema, type AuthUser } from '@nappe/shared';
import {
  describeAuthError,
  FormErrorAlert,
  PasswordInput,
  useCountdown,
} from '@nappe/web-kit/auth';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError } from '../../../lib/api-client';
import { useAcceptInvitation } from '../api/accept-invitation';

/** The same name and password rules as the API's accept-invitation body (shared schemas). */
const acceptFormSchema = z.object({ name: nameSchema, password: passwordSchema });
type AcceptForm = z.input<typeof acceptFormSchema>;

/** Why the link itself cannot be used (expired, used, withdrawn, unknown), in the server's words. */
export interface LinkProblem {
  message: string;
  /** The account exists already: Sign in is the way forward. */
  signIn: boolean;
}

/**
 * Splits a refusal into what the person can fix here (their name, a password too easy to guess)
 * and what they cannot (the link): the latter ends the form.
 */
export function sortAcceptErrors(error: ApiError): {
  fields: Partial<Record<keyof AcceptForm, string>>;
  link: LinkProblem | null;
  other: string[];
} {
  const fields: Partial<Record<keyof AcceptForm, string>> = {};
  const other: string[] = [];
  let link: LinkProblem | null = null;
  if (error.status === 409) {
    return { fields, link: { message: error.messages.join(' '), signIn: true }, other };
  }
  for (const text of error.messages) {
    const match = /^(token|name|password): (.+)$/s.exec(text);
    const field = match?.[1];
    const message = match?.[2] ?? text;
    if (field === 'name' || field === 'password') {
      fields[field] = fields[field] ? `${fields[field]} ${message}` : message;
    } else if (field === 'token' || /invitation/i.test(message)) {
      link = { message, signIn: /already been used/.test(message) };
    } else if (/password/i.test(message)) {
      // zxcvbn's verdict (common password or simple pattern) comes without a field name.
      fields.password = fields.password ? `${fields.password} ${message}` : message;
    } else {
      other.push(message);
    }
  }
  return { fields, link, other };
}

export function AcceptInvitationForm({
  token,
  onAccepted,
  onLinkProblem,
}: {
  token: string;
  onAccepted: (user: AuthUser) => void;
  onLinkProblem: (problem: LinkProblem) => void;
}) {
  const accept = useAcceptInvitation();
  const wait = useCountdown();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<AcceptForm>({
    resolver: zodResolver(acceptFormSchema),
    defaultValues: { name: '', password: '' },
  });

  const onSubmit = handleSubmit((values) =>
    accept.mutate(
      { token, ...values },
      {
        onSuccess: (session) => onAccepted(session.user),
        onError: (error) => {
          if (!(error instanceof ApiError)) return;
          if (error.status === 429) wait.start(error.retryAfterSeconds ?? 60);
          if (error.status !== 400 && error.status !== 409) return;
          const sorted = sortAcceptErrors(error);
          if (sorted.link) return onLinkProblem(sorted.link);
          for (const [field, message] of Object.entries(sorted.fields)) {
            setError(field as keyof AcceptForm, { type: 'server', message }, { shouldFocus: true });
          }
        },
      },
    ),
  );

  const error = accept.error;
  const sorted = error instanceof ApiError && error.status === 400 ? sortAcceptErrors(error) : null;
  const summary =
    error && !(sorted && sorted.other.length === 0)
      ? sorted
        ? { title: 'Please check the form', messages: sorted.other }
        : describeAuthError(error, wait.secondsLeft, 'creating an account')
      : null;

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Accept the invitation">
      <Stack gap="5">
        {summary && <FormErrorAlert {...summary} />}
        <Field.Root invalid={!!errors.name} required>
          <Field.Label>Your name</Field.Label>
          <Input autoComplete="name" {...register('name')} />
          {!errors.name && <Field.HelperText>As the team will see it.</Field.HelperText>}
          <Field.ErrorText>{errors.name?.message}</Field.ErrorText>
        </Field.Root>
        <Field.Root invalid={!!errors.password} required>
          <Field.Label>Choose a password</Field.Label>
          <PasswordInput autoComplete="new-password" {...register('password')} />
          {!errors.password && (
            <Field.HelperText>
              At least {PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong one;
              common passwords, simple patterns and your own name are refused.
            </Field.HelperText>
          )}
          <Field.ErrorText>{errors.password?.message}</Field.ErrorText>
        </Field.Root>
        <Button
          type="submit"
          size="lg"
          loading={accept.isPending}
          loadingText="Joining…"
          disabled={wait.secondsLeft > 0}
        >
          Join the team
        </Button>
      </Stack>
    </form>
  );
}
