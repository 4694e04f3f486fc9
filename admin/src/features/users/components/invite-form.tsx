import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Box, Button, Field, Flex, Input, NativeSelect, Stack } from '@chakra-ui/react';
import { emailSchema, nameSchema } from '@nappe/shared';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError } from '../../../lib/api-client';
import { errorMessage, placeFieldMessages } from '../../../lib/error-message';
import { useCreateInvitation } from '../api/create-invitation';

/** The invitation body's rules, from the same shared pieces the API's schema is made of. */
const invitationFormSchema = z.object({
  name: nameSchema,
  email: emailSchema,
  role: z.enum(['staff', 'chef'], { error: 'The role is either staff or chef.' }),
});
type InvitationForm = z.input<typeof invitationFormSchema>;

const FIELDS = ['name', 'email', 'role'] as const;

/** The form field a server message's path names ("email: …"), or null. */
const fieldOf = (path: readonly PropertyKey[]) =>
  (path.length === 1 && FIELDS.find((f) => f === path[0])) || null;

/** Invite someone to the team: the API e-mails them a link that works once, for 7 days. */
export function InviteForm() {
  const create = useCreateInvitation();
  const [sent, setSent] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<InvitationForm, unknown, z.output<typeof invitationFormSchema>>({
    resolver: zodResolver(invitationFormSchema),
    defaultValues: { name: '', email: '', role: 'staff' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setSent(null);
    setFailure(null);
    try {
      const invitation = await create.mutateAsync(values);
      reset();
      setSent(
        `Invitation sent to ${invitation.email}. The link in the e-mail works once, for 7 days.`,
      );
    } catch (error) {
      if (error instanceof ApiError && error.status === 400) {
        const general: string[] = [];
        for (const placed of placeFieldMessages(error.messages, fieldOf)) {
          const field = FIELDS.find((f) => f === placed.field);
          if (field) setError(field, { type: 'server', message: placed.message });
          else general.push(placed.message);
        }
        if (general.length > 0) setFailure(general.join(' '));
      } else {
        setFailure(errorMessage(error));
      }
    }
  });

  return (
    <form onSubmit={(e) => void onSubmit(e)} noValidate aria-label="Invite a team member">
      <Stack gap="4">
        <Flex gap="4" direction={{ base: 'column', md: 'row' }} align={{ md: 'start' }}>
          <Field.Root invalid={!!errors.name} flex="1">
            <Field.Label>Name</Field.Label>
            <Input autoComplete="off" {...register('name')} />
            <Field.ErrorText>{errors.name?.message}</Field.ErrorText>
          </Field.Root>
          <Field.Root invalid={!!errors.email} flex="1.4">
            <Field.Label>E-mail</Field.Label>
            <Input type="email" inputMode="email" autoComplete="off" {...register('email')} />
            <Field.ErrorText>{errors.email?.message}</Field.ErrorText>
          </Field.Root>
          <Field.Root invalid={!!errors.role} flex="0.8">
            <Field.Label>Role</Field.Label>
            <NativeSelect.Root>
              <NativeSelect.Field {...register('role')} bg="bg.subtle">
                <option value="staff">Staff</option>
                <option value="chef">Chef</option>
              </NativeSelect.Field>
              <NativeSelect.Indicator />
            </NativeSelect.Root>
            <Field.ErrorText>{errors.role?.message}</Field.ErrorText>
          </Field.Root>
        </Flex>
        <Field.Root>
          <Field.HelperText>
            Staff see Today, Prep, Allergy notes and the Kitchen read-only. A chef sees and changes
            everything, settings and team included.
          </Field.HelperText>
        </Field.Root>
        <Box>
          <Button type="submit" loading={isSubmitting} loadingText="Sending…">
            Send invitation
          </Button>
        </Box>
        {failure && (
          <Alert.Root status="error" role="alert" borderRadius="l2">
            <Alert.Indicator />
            <Alert.Content>
              <Alert.Title>No invitation sent</Alert.Title>
              <Alert.Description>{failure}</Alert.Description>
            </Alert.Content>
          </Alert.Root>
        )}
        <Box aria-live="polite" aria-atomic="true">
          {sent && (
            <Alert.Root status="success" borderRadius="l2">
              <Alert.Indicator />
              <Alert.Content>
                <Alert.Title>{sent}</Alert.Title>
              </Alert.Content>
            </Alert.Root>
          )}
        </Box>
      </Stack>
    </form>
  );
}
