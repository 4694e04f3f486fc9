import {
  Alert,
  Box,
  Button,
  Field,
  Grid,
  IconButton,
  Input,
  NativeSelect,
  Stack,
  Text,
  Textarea,
} from '@chakra-ui/react';
import { dessertSchema, type Dessert } from '@nappe/shared';
import { useMemo, useState, type ReactNode } from 'react';
import { useFieldArray, useForm, useWatch } from 'react-hook-form';
import { PlusIcon, TrashIcon } from '../../../components/ui/icons';
import { ApiError } from '../../../lib/api-client';
import { useCreateDessert } from '../api/create-dessert';
import { useDeleteDessert } from '../api/delete-dessert';
import type { DessertResponse } from '../api/types';
import { useUpdateDessert } from '../api/update-dessert';
import {
  dessertBody,
  dessertFieldOf,
  dessertFromForm,
  dessertToFormValues,
  emptyComponent,
  liveDessert,
  type DessertFormValues,
} from '../lib/dessert-form-values';
import { schemaResolver } from '../lib/form-resolver';
import { attempt, dessertInsights, DRAFT_ID, indexWith } from '../lib/live-kitchen';
import { placeServerMessages, saveFailureMessage } from '../lib/server-errors';
import { DeleteButton } from './delete-dialog';
import { DessertInsightsPanel } from './dessert-insights-panel';
import { EditorActions, FormSection } from './editor-layout';
import { TextField, type FormControl } from './form-controls';
import type { KitchenCatalogueData } from '../api/types';
import { useUnsavedChangesGuard } from './unsaved-changes-guard';

type FieldName = Parameters<ReturnType<typeof useForm<DessertFormValues>>['setError']>[0];

/** The chef's dessert editor: components per plate, plating notes, plate cost and allergens. */
export function DessertEditor({
  dessert,
  catalogue,
  seesCosts,
  onSaved,
  onDeleted,
  actions,
  photos,
}: {
  dessert?: DessertResponse;
  catalogue: KitchenCatalogueData;
  seesCosts: boolean;
  onSaved: (saved: DessertResponse, created: boolean) => void;
  onDeleted: () => void;
  actions: ReactNode;
  /** The photo manager, for a saved dessert. */
  photos?: ReactNode;
}) {
  const id = dessert?.id ?? DRAFT_ID;
  const create = useCreateDessert();
  const update = useUpdateDessert();
  const remove = useDeleteDessert();
  const [formError, setFormError] = useState<string | null>(null);
  const [savedNote, setSavedNote] = useState<string | null>(null);
  const resolver = useMemo(
    () =>
      schemaResolver<DessertFormValues, typeof dessertSchema>(
        (values) => dessertFromForm(values, id),
        dessertSchema,
        dessertFieldOf,
        (_field, message) =>
          /^(Invalid input|Too small|Too big)/.test(message) ? 'Check this value.' : message,
      ),
    [id],
  );
  const form = useForm<DessertFormValues, unknown, Dessert>({
    resolver,
    defaultValues: dessertToFormValues(dessert),
  });
  const {
    register,
    control,
    handleSubmit,
    formState: { errors, isDirty },
  } = form;
  const guard = useUnsavedChangesGuard(isDirty);
  const {
    fields,
    append,
    remove: removeComponent,
  } = useFieldArray({ control, name: 'components' });

  const [name, components] = useWatch({ control, name: ['name', 'components'] });
  const insights = useMemo(() => {
    const draft = liveDessert({ ...dessertToFormValues(undefined), name, components }, id);
    if (!draft) return null;
    const index = attempt(() => indexWith(catalogue, { dessert: draft }));
    return index.ok ? dessertInsights(index.value, draft, { withCost: seesCosts }) : null;
  }, [catalogue, name, components, id, seesCosts]);

  const onSubmit = handleSubmit(async (parsed) => {
    setFormError(null);
    setSavedNote(null);
    const body = dessertBody(parsed);
    try {
      const saved = dessert
        ? await update.mutateAsync({ id: dessert.id, body })
        : await create.mutateAsync(body);
      form.reset(dessertToFormValues(saved));
      setSavedNote(`Saved “${saved.name}”.`);
      guard.allowNextNavigation();
      onSaved(saved, !dessert);
    } catch (error) {
      if (error instanceof ApiError && error.status === 400) {
        const general: string[] = [];
        for (const p of placeServerMessages(error, (path) => {
          const field = dessertFieldOf(path);
          return field.startsWith('root.') ? null : field;
        })) {
          if (p.field) form.setError(p.field as FieldName, { type: 'server', message: p.message });
          else general.push(p.message);
        }
        setFormError(
          general.length > 0 ? general.join(' ') : 'Please check the fields marked below.',
        );
      } else {
        setFormError(saveFailureMessage(error));
      }
    }
  });

  const recipes = catalogue.recipes;
  return (
    <form onSubmit={(e) => void onSubmit(e)} noValidate>
      {guard.dialog}
      {formError && (
        <Alert.Root status="error" role="alert" borderRadius="l2" mb="5">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>Not saved</Alert.Title>
            <Alert.Description>{formError}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
      <Grid
        templateColumns={{ base: 'minmax(0, 1fr)', lg: 'minmax(0, 1fr) 24rem' }}
        templateAreas={{
          base: '"basics" "components" "panel" "plating" "photos"',
          lg: '"basics panel" "components panel" "plating panel" "photos panel"',
        }}
        gap={{ base: '5', lg: '6' }}
        alignItems="start"
      >
        <Box gridArea="basics" minW="0">
          <FormSection title="Dessert" id="dessert-basics">
            <TextField
              label="Name"
              required
              error={errors.name?.message}
              registration={register('name')}
              autoComplete="off"
            />
            <Field.Root invalid={!!errors.description}>
              <Field.Label>Description for clients</Field.Label>
              <Textarea rows={2} {...register('description')} />
              <Field.ErrorText>{errors.description?.message}</Field.ErrorText>
            </Field.Root>
          </FormSection>
        </Box>
        <Box gridArea="components" minW="0">
          <FormSection
            title="On each plate"
            id="dessert-components"
            description="The recipes on one plate, by weight or by the piece (a shard, a disc of sponge)."
          >
            <Stack gap="3">
              {fields.map((field, index) => {
                const e = errors.components?.[index];
                const label = `Component ${index + 1}`;
                return (
                  <ComponentRow
                    key={field.id}
                    index={index}
                    label={label}
                    register={register}
                    control={control}
                    recipes={recipes}
                    errors={e}
                    onRemove={fields.length > 1 ? () => removeComponent(index) : undefined}
                  />
                );
              })}
              <Button variant="outline" alignSelf="start" onClick={() => append(emptyComponent())}>
                <PlusIcon /> Add a component
              </Button>
            </Stack>
          </FormSection>
        </Box>
        <Box
          gridArea="panel"
          position={{ lg: 'sticky' }}
          top={{ lg: '4' }}
          maxH={{ lg: 'calc(100dvh - 2rem)' }}
          overflowY={{ lg: 'auto' }}
        >
          <DessertInsightsPanel
            insights={insights}
            waiting="Add a component with a portion to see the plate."
            currency={catalogue.currency}
            live
          />
        </Box>
        <Box gridArea="plating" minW="0">
          <FormSection title="Plating" id="dessert-plating">
            <Field.Root invalid={!!errors.platingNotes}>
              <Field.Label>Plating notes for the team</Field.Label>
              <Textarea rows={4} {...register('platingNotes')} />
              <Field.ErrorText>{errors.platingNotes?.message}</Field.ErrorText>
            </Field.Root>
          </FormSection>
        </Box>
        <Box gridArea="photos" minW="0">
          <FormSection title="Photos" id="dessert-photos">
            {photos ?? <Text color="fg.muted">Create the dessert first, then add its photos.</Text>}
          </FormSection>
        </Box>
      </Grid>
      <EditorActions
        saving={create.isPending || update.isPending}
        saveLabel={dessert ? 'Save changes' : 'Create dessert'}
        dirty={isDirty}
        status={savedNote && !isDirty ? savedNote : undefined}
        extra={
          <>
            {actions}
            {dessert && (
              <DeleteButton
                what="dessert"
                name={dessert.name}
                onDelete={() => remove.mutateAsync(dessert.id)}
                onDeleted={() => {
                  guard.allowNextNavigation();
                  onDeleted();
                }}
              />
            )}
          </>
        }
      />
    </form>
  );
}

function ComponentRow({
  index,
  label,
  register,
  control,
  recipes,
  errors,
  onRemove,
}: {
  index: number;
  label: string;
  register: ReturnType<typeof useForm<DessertFormValues>>['register'];
  control: FormControl<DessertFormValues>;
  recipes: KitchenCatalogueData['recipes'];
  errors: NonNullable<
    ReturnType<typeof useForm<DessertFormValues>>['formState']['errors']['components']
  >[number];
  onRemove?: () => void;
}) {
  const unit = useWatch({ control, name: `components.${index}.unit` });
  return (
    <Box
      role="group"
      aria-label={label}
      borderWidth="1px"
      borderColor="border.muted"
      borderRadius="l2"
      p="3"
      bg="bg.subtle"
    >
      <Grid
        templateColumns={{
          base: 'minmax(0, 1fr) minmax(0, 1fr) auto',
          sm: '8rem 10rem minmax(0, 1fr) auto',
        }}
        templateAreas={{
          base: '"recipe recipe recipe" "qty unit remove"',
          sm: '"recipe recipe recipe recipe" "qty unit . remove"',
        }}
        gap="2"
        alignItems="start"
      >
        <Field.Root gridArea="recipe" invalid={!!errors?.recipeId}>
          <Field.Label srOnly>{label}: recipe</Field.Label>
          <NativeSelect.Root>
            <NativeSelect.Field bg="bg.panel" {...register(`components.${index}.recipeId`)}>
              <option value="">Pick a recipe…</option>
              {recipes.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.name}
                </option>
              ))}
            </NativeSelect.Field>
            <NativeSelect.Indicator />
          </NativeSelect.Root>
          <Field.ErrorText>{errors?.recipeId?.message}</Field.ErrorText>
        </Field.Root>
        <Field.Root gridArea="qty" invalid={!!errors?.quantity}>
          <Field.Label srOnly>{label}: portion</Field.Label>
          <Input
            inputMode="decimal"
            placeholder="Portion"
            {...register(`components.${index}.quantity`)}
          />
          <Field.ErrorText>{errors?.quantity?.message}</Field.ErrorText>
        </Field.Root>
        <Field.Root gridArea="unit">
          <Field.Label srOnly>{label}: unit</Field.Label>
          <NativeSelect.Root>
            <NativeSelect.Field bg="bg.panel" {...register(`components.${index}.unit`)}>
              <option value="g">grams</option>
              <option value="piece">pieces</option>
            </NativeSelect.Field>
            <NativeSelect.Indicator />
          </NativeSelect.Root>
        </Field.Root>
        <IconButton
          gridArea="remove"
          justifySelf="end"
          aria-label={`Remove ${label.toLowerCase()}`}
          variant="ghost"
          disabled={!onRemove}
          onClick={onRemove}
        >
          <TrashIcon />
        </IconButton>
      </Grid>
      {unit === 'piece' && (
        <Field.Root mt="2" maxW="16rem" invalid={!!errors?.pieceWeight}>
          <Field.Label textStyle="sm">Weight of one piece (g)</Field.Label>
          <Input size="sm" inputMode="decimal" {...register(`components.${index}.pieceWeight`)} />
          <Field.HelperText>Leave blank to use the recipe’s own piece weight.</Field.HelperText>
          <Field.ErrorText>{errors?.pieceWeight?.message}</Field.ErrorText>
        </Field.Root>
      )}
    </Box>
  );
}
