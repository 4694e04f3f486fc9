import {
  Box,
  Button,
  Field,
  Grid,
  IconButton,
  Input,
  NativeSelect,
  Stack,
  Text,
} from '@chakra-ui/react';
import { dessertSchema } from '@nappe/shared';
import { useMemo, type ReactNode } from 'react';
import { useFieldArray, useForm, useWatch } from 'react-hook-form';
import { PlusIcon, TrashIcon } from '../../../components/ui/icons';
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
import { attempt, dessertInsights, DRAFT_ID, indexWith } from '../lib/live-kitchen';
import { DessertInsightsPanel } from './dessert-insights-panel';
import { EditorArea, EditorColumns, EditorPanel, FormSection } from './editor-layout';
import { NameField, TextAreaField, type FormControl } from './form-controls';
import type { KitchenCatalogueData } from '../api/types';
import { ItemEditorForm, useItemEditor } from './item-editor';

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
  const editor = useItemEditor({
    item: dessert,
    schema: dessertSchema,
    fromForm: (values: DessertFormValues) => dessertFromForm(values, id),
    fieldOf: dessertFieldOf,
    rephrase: (_field, message) =>
      /^(Invalid input|Too small|Too big)/.test(message) ? 'Check this value.' : message,
    toFormValues: dessertToFormValues,
    toBody: dessertBody,
    create: useCreateDessert(),
    update: useUpdateDessert(),
    remove: useDeleteDessert(),
    onSaved,
    onDeleted,
  });
  const {
    register,
    control,
    formState: { errors },
  } = editor.form;
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

  const recipes = catalogue.recipes;
  return (
    <ItemEditorForm editor={editor} what="dessert" actions={actions}>
      <EditorColumns areas={['basics', 'components', 'plating', 'photos']} panelWidth="24rem">
        <EditorArea area="basics">
          <FormSection title="Dessert" id="dessert-basics">
            <NameField error={errors.name?.message} registration={register('name')} />
            <TextAreaField
              label="Description for clients"
              rows={2}
              error={errors.description?.message}
              registration={register('description')}
            />
          </FormSection>
        </EditorArea>
        <EditorArea area="components">
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
        </EditorArea>
        <EditorPanel>
          <DessertInsightsPanel
            insights={insights}
            waiting="Add a component with a portion to see the plate."
            currency={catalogue.currency}
            live
          />
        </EditorPanel>
        <EditorArea area="plating">
          <FormSection title="Plating" id="dessert-plating">
            <TextAreaField
              label="Plating notes for the team"
              rows={4}
              error={errors.platingNotes?.message}
              registration={register('platingNotes')}
            />
          </FormSection>
        </EditorArea>
        <EditorArea area="photos">
          <FormSection title="Photos" id="dessert-photos">
            {photos ?? <Text color="fg.muted">Create the dessert first, then add its photos.</Text>}
          </FormSection>
        </EditorArea>
      </EditorColumns>
    </ItemEditorForm>
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
