import {
  Button,
  Field,
  HStack,
  IconButton,
  Input,
  InputGroup,
  NativeSelect,
  SimpleGrid,
  Stack,
  Switch,
  Text,
} from '@chakra-ui/react';
import { menuSchema } from '@nappe/shared';
import type { ReactNode } from 'react';
import { Controller, useFieldArray } from 'react-hook-form';
import { ArrowDownIcon, ArrowUpIcon, PlusIcon, TrashIcon } from '../../../components/ui/icons';
import { useCreateMenu } from '../api/create-menu';
import { useDeleteMenu } from '../api/delete-menu';
import type { DessertResponse, MenuResponse } from '../api/types';
import { useUpdateMenu } from '../api/update-menu';
import {
  menuBody,
  menuFieldOf,
  menuFromForm,
  menuToFormValues,
  rephraseMenuMessage,
  type MenuFormValues,
} from '../lib/menu-form-values';
import { EditorArea, EditorColumns, EditorPanel, FormSection } from './editor-layout';
import { NameField, TextAreaField, TextField } from './form-controls';
import { ItemEditorForm, useItemEditor } from './item-editor';
import { MenuCostingPanel } from './menu-costing-panel';

/** The chef's menu editor: desserts, price per guest, guest limits, lead time, on sale or not. */
export function MenuEditor({
  menu,
  desserts,
  currency,
  onSaved,
  onDeleted,
  actions,
  photos,
}: {
  menu?: MenuResponse;
  desserts: DessertResponse[];
  currency: string;
  onSaved: (saved: MenuResponse, created: boolean) => void;
  onDeleted: () => void;
  actions: ReactNode;
  photos?: ReactNode;
}) {
  const editor = useItemEditor({
    item: menu,
    schema: menuSchema,
    fromForm: (values: MenuFormValues) => menuFromForm(values, currency),
    fieldOf: menuFieldOf,
    rephrase: rephraseMenuMessage,
    toFormValues: (saved: MenuResponse | undefined) => menuToFormValues(saved, currency),
    toBody: menuBody,
    create: useCreateMenu(),
    update: useUpdateMenu(),
    remove: useDeleteMenu(),
    onSaved,
    onDeleted,
  });
  const {
    register,
    control,
    formState: { errors, isDirty },
  } = editor.form;
  const {
    fields,
    append,
    remove: removeDessert,
    move,
  } = useFieldArray({ control, name: 'desserts' });

  return (
    <ItemEditorForm editor={editor} what="menu" actions={actions}>
      <EditorColumns areas={['basics', 'desserts', 'booking', 'photos']} panelWidth="22rem">
        <EditorArea area="basics">
          <FormSection title="Menu" id="menu-basics">
            <NameField error={errors.name?.message} registration={register('name')} />
            <TextAreaField
              label="Description for clients"
              rows={3}
              error={errors.description?.message}
              registration={register('description')}
            />
            <Controller
              control={control}
              name="active"
              render={({ field }) => (
                <Switch.Root
                  checked={field.value}
                  onCheckedChange={(e) => field.onChange(e.checked)}
                  colorPalette="accent"
                >
                  <Switch.HiddenInput ref={field.ref} name={field.name} onBlur={field.onBlur} />
                  <Switch.Control />
                  <Switch.Label>On sale on the storefront</Switch.Label>
                </Switch.Root>
              )}
            />
          </FormSection>
        </EditorArea>
        <EditorArea area="desserts">
          <FormSection
            title="Desserts"
            id="menu-desserts"
            description="Served to every guest, in this order."
          >
            <Stack gap="2">
              {fields.map((field, index) => {
                const e = errors.desserts?.[index]?.dessertId;
                const n = index + 1;
                return (
                  <Field.Root key={field.id} invalid={!!e}>
                    <HStack gap="2" w="full">
                      <Text fontWeight="semibold" w="6" flexShrink="0">
                        {n}.
                      </Text>
                      <Field.Label srOnly>Dessert {n}</Field.Label>
                      <NativeSelect.Root flex="1">
                        <NativeSelect.Field
                          bg="bg.subtle"
                          {...register(`desserts.${index}.dessertId`)}
                        >
                          <option value="">Pick a dessert…</option>
                          {desserts.map((d) => (
                            <option key={d.id} value={d.id}>
                              {d.name}
                            </option>
                          ))}
                        </NativeSelect.Field>
                        <NativeSelect.Indicator />
                      </NativeSelect.Root>
                      <IconButton
                        aria-label={`Move dessert ${n} up`}
                        variant="ghost"
                        size="sm"
                        disabled={index === 0}
                        onClick={() => move(index, index - 1)}
                      >
                        <ArrowUpIcon />
                      </IconButton>
                      <IconButton
                        aria-label={`Move dessert ${n} down`}
                        variant="ghost"
                        size="sm"
                        disabled={index === fields.length - 1}
                        onClick={() => move(index, index + 1)}
                      >
                        <ArrowDownIcon />
                      </IconButton>
                      <IconButton
                        aria-label={`Remove dessert ${n}`}
                        variant="ghost"
                        size="sm"
                        disabled={fields.length === 1}
                        onClick={() => removeDessert(index)}
                      >
                        <TrashIcon />
                      </IconButton>
                    </HStack>
                    <Field.ErrorText ps="8">{e?.message}</Field.ErrorText>
                  </Field.Root>
                );
              })}
              {errors.desserts?.root?.message && (
                <Text color="fg.error">{errors.desserts.root.message}</Text>
              )}
              <Button variant="outline" alignSelf="start" onClick={() => append({ dessertId: '' })}>
                <PlusIcon /> Add a dessert
              </Button>
            </Stack>
          </FormSection>
        </EditorArea>
        <EditorPanel scrolls={false}>
          <MenuCostingPanel menuId={menu?.id ?? null} currency={currency} unsaved={isDirty} />
        </EditorPanel>
        <EditorArea area="booking">
          <FormSection
            title="Booking"
            id="menu-booking"
            description="What clients pay and what the kitchen needs to make it."
          >
            <SimpleGrid columns={{ base: 1, sm: 2 }} gap="4">
              <Field.Root invalid={!!errors.pricePerGuest} required>
                <Field.Label>
                  Price per guest ({currency})
                  <Field.RequiredIndicator />
                </Field.Label>
                <InputGroup startAddon={currency}>
                  <Input
                    inputMode="decimal"
                    autoComplete="off"
                    placeholder="0.00"
                    {...register('pricePerGuest')}
                  />
                </InputGroup>
                <Field.ErrorText>{errors.pricePerGuest?.message}</Field.ErrorText>
              </Field.Root>
              <TextField
                label="Lead time (days)"
                inputMode="numeric"
                error={errors.leadDays?.message}
                registration={register('leadDays')}
                helper="Days production needs before the event."
              />
              <TextField
                label="Fewest guests"
                inputMode="numeric"
                error={errors.minGuests?.message}
                registration={register('minGuests')}
              />
              <TextField
                label="Most guests"
                inputMode="numeric"
                error={errors.maxGuests?.message}
                registration={register('maxGuests')}
              />
            </SimpleGrid>
          </FormSection>
        </EditorArea>
        <EditorArea area="photos">
          <FormSection title="Photo" id="menu-photos">
            {photos ?? <Text color="fg.muted">Create the menu first, then add a photo.</Text>}
          </FormSection>
        </EditorArea>
      </EditorColumns>
    </ItemEditorForm>
  );
}
