import {
  Alert,
  Badge,
  Button,
  chakra,
  Field,
  Heading,
  HStack,
  NativeSelect,
  Stack,
  Text,
  Textarea,
} from '@chakra-ui/react';
import { useEffect, useId, useMemo, useRef, useState, type FormEvent } from 'react';
import { AllergyIcon } from '../../../components/ui/icons';
import { useSaveSubstitution } from '../api/save-substitution';
import { useSubstitutionChoices } from '../api/get-substitution-choices';
import type { GuestNote, GuestPlateNote, SubstitutionBody } from '../api/types';
import { conflictRows } from '../lib/allergen-words';
import { describeError } from '../lib/describe-error';
import { BlockSkeleton, LoadError } from './load-states';

/** As the API's limit (api/src/allergy-notes/allergy-notes.dto.ts). */
export const NOTE_MAX = 500;

type Action = 'keep' | 'leave_out' | 'replace';
interface Choice {
  action: Action;
  replacement: string;
}

function initialChoices(plate: GuestPlateNote): Record<string, Choice> {
  const choices: Record<string, Choice> = {};
  for (const change of plate.substitution?.changes ?? []) {
    choices[change.componentRecipeId] = change.replacementRecipeId
      ? { action: 'replace', replacement: change.replacementRecipeId }
      : { action: 'leave_out', replacement: '' };
  }
  return choices;
}

/**
 * The chef's change to one guest's plate of one dessert: per component keep it, leave it out or
 * replace it with another recipe, and/or a note. The API checks the changed plate again.
 */
export function SubstitutionForm({
  orderId,
  guest,
  plate,
  onSaved,
  onCancel,
}: {
  orderId: string;
  guest: GuestNote;
  plate: GuestPlateNote;
  onSaved: (guest: GuestNote) => void;
  onCancel: () => void;
}) {
  const headingId = useId();
  const { dessert, recipes } = useSubstitutionChoices(plate.dessertId);
  const save = useSaveSubstitution();
  const [choices, setChoices] = useState<Record<string, Choice>>(() => initialChoices(plate));
  const [note, setNote] = useState(plate.substitution?.note ?? '');
  const [errors, setErrors] = useState<{ form?: string; components: Record<string, string> }>({
    components: {},
  });

  // What each component carries against this guest, to show beside its choice.
  const carried = useMemo(() => {
    const map = new Map<string, string[]>();
    for (const row of conflictRows(plate.conflicts)) {
      map.set(row.componentId, [...(map.get(row.componentId) ?? []), row.what]);
    }
    return map;
  }, [plate.conflicts]);

  const title = `Change ${guest.label}’s ${plate.dessertName}`;
  // The form opens in place of its button: take the focus to its title once it is there.
  const headingRef = useRef<HTMLHeadingElement>(null);
  const ready = !!dessert.data && !!recipes.data;
  useEffect(() => {
    if (ready) headingRef.current?.focus();
  }, [ready]);

  if (dessert.isError || recipes.isError) {
    return (
      <LoadError
        title="The dessert’s components could not be loaded"
        error={dessert.error ?? recipes.error}
        onRetry={() => {
          void dessert.refetch();
          void recipes.refetch();
        }}
        retrying={dessert.isFetching || recipes.isFetching}
      />
    );
  }
  if (!dessert.data || !recipes.data)
    return <BlockSkeleton label="Loading the components…" rows={2} />;

  // Conflicting components first: those are the ones the chef came to change.
  const components = [...dessert.data.components].sort(
    (a, b) => Number(carried.has(b.recipeId)) - Number(carried.has(a.recipeId)),
  );
  const nameOf = (id: string) =>
    dessert.data.referenceNames[id] ?? recipes.data.find((r) => r.id === id)?.name ?? id;

  const choiceOf = (id: string): Choice => choices[id] ?? { action: 'keep', replacement: '' };
  const setChoice = (id: string, next: Partial<Choice>) => {
    setChoices((all) => ({ ...all, [id]: { ...choiceOf(id), ...next } }));
    setErrors((e) => ({ ...e, form: undefined, components: { ...e.components, [id]: '' } }));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const body: SubstitutionBody = { leaveOut: [], replace: [] };
    const componentErrors: Record<string, string> = {};
    for (const c of components) {
      const choice = choiceOf(c.recipeId);
      if (choice.action === 'leave_out') body.leaveOut.push(c.recipeId);
      if (choice.action === 'replace') {
        if (!choice.replacement) {
          componentErrors[c.recipeId] =
            `Choose the recipe that takes the place of ${nameOf(c.recipeId)}.`;
        } else {
          body.replace.push({
            componentRecipeId: c.recipeId,
            replacementRecipeId: choice.replacement,
          });
        }
      }
    }
    const trimmed = note.trim();
    if (trimmed) body.note = trimmed;
    const nothing = body.leaveOut.length + body.replace.length === 0 && !trimmed;
    if (Object.values(componentErrors).some(Boolean) || nothing || trimmed.length > NOTE_MAX) {
      setErrors({
        components: componentErrors,
        form: nothing
          ? 'Say what changes: a component to leave out, one to replace, or a note.'
          : trimmed.length > NOTE_MAX
            ? `Keep the note to ${NOTE_MAX} characters.`
            : undefined,
      });
      return;
    }
    save.mutate(
      { orderId, guestId: guest.guestId, dessertId: plate.dessertId, body },
      { onSuccess: (saved) => onSaved(saved) },
    );
  };

  return (
    <chakra.form
      onSubmit={submit}
      noValidate
      aria-labelledby={headingId}
      borderWidth="1px"
      borderColor="border.emphasized"
      borderRadius="l2"
      bg="bg.subtle"
      p={{ base: '3', md: '4' }}
    >
      <Stack gap="4">
        <Stack gap="1">
          <Heading
            as="h4"
            id={headingId}
            ref={headingRef}
            tabIndex={-1}
            outline="none"
            textStyle="md"
            fontFamily="body"
            fontWeight="semibold"
          >
            {title}
          </Heading>
          <Text textStyle="sm" color="fg.muted">
            The plate is checked again against {guest.label}’s requirements when you save. A
            replacement takes the component’s weight on the plate.
          </Text>
        </Stack>
        {components.map((c) => {
          const choice = choiceOf(c.recipeId);
          const name = nameOf(c.recipeId);
          const error = errors.components[c.recipeId];
          return (
            <Stack key={c.recipeId} gap="2" role="group" aria-label={name}>
              <Field.Root>
                <Field.Label fontWeight="semibold">
                  {name}
                  {carried.has(c.recipeId) && (
                    <Badge colorPalette="danger" variant="subtle" size="sm" gap="1" ms="1">
                      <AllergyIcon boxSize="3" aria-hidden />
                      {carried.get(c.recipeId)!.join('; ')}
                    </Badge>
                  )}
                </Field.Label>
                <NativeSelect.Root>
                  <NativeSelect.Field
                    bg="bg.panel"
                    aria-label={`What happens to ${name}`}
                    value={choice.action}
                    onChange={(e) => setChoice(c.recipeId, { action: e.target.value as Action })}
                  >
                    <option value="keep">Keep it</option>
                    <option value="leave_out">Leave it out</option>
                    <option value="replace">Replace it with another recipe</option>
                  </NativeSelect.Field>
                  <NativeSelect.Indicator />
                </NativeSelect.Root>
              </Field.Root>
              {choice.action === 'replace' && (
                <Field.Root invalid={!!error} ps={{ base: '0', md: '4' }}>
                  <Field.Label>Replace {name} with</Field.Label>
                  <NativeSelect.Root>
                    <NativeSelect.Field
                      bg="bg.panel"
                      value={choice.replacement}
                      onChange={(e) => setChoice(c.recipeId, { replacement: e.target.value })}
                    >
                      <option value="">Choose a recipe…</option>
                      {recipes.data
                        .filter((r) => r.id !== c.recipeId)
                        .map((r) => (
                          <option key={r.id} value={r.id}>
                            {r.name}
                          </option>
                        ))}
                    </NativeSelect.Field>
                    <NativeSelect.Indicator />
                  </NativeSelect.Root>
                  <Field.ErrorText>{error}</Field.ErrorText>
                </Field.Root>
              )}
            </Stack>
          );
        })}
        <Field.Root invalid={note.trim().length > NOTE_MAX}>
          <Field.Label>Note for the kitchen and service (optional)</Field.Label>
          <Textarea
            bg="bg.panel"
            value={note}
            onChange={(e) => {
              setNote(e.target.value);
              setErrors((er) => ({ ...er, form: undefined }));
            }}
            rows={2}
            autoresize
            placeholder="For example: a second quenelle of ice cream in place of the parfait"
          />
          <Field.HelperText>
            {note.trim().length} / {NOTE_MAX} characters. A note alone does not change the plate, so
            it does not clear a conflict.
          </Field.HelperText>
        </Field.Root>
        {(errors.form || save.isError) && (
          <Alert.Root status="error" role="alert" borderRadius="l2">
            <Alert.Indicator />
            <Alert.Content>
              <Alert.Title>Not saved</Alert.Title>
              <Alert.Description>{errors.form ?? describeError(save.error)}</Alert.Description>
            </Alert.Content>
          </Alert.Root>
        )}
        <HStack gap="2" wrap="wrap">
          <Button type="submit" loading={save.isPending} loadingText="Saving and checking…">
            Save and check again
          </Button>
          <Button type="button" variant="outline" onClick={onCancel} disabled={save.isPending}>
            Cancel
          </Button>
        </HStack>
      </Stack>
    </chakra.form>
  );
}
