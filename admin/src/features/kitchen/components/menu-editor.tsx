import {
  Alert,
  Box,
  Button,
  Field,
  Grid,
  HStack,
  IconButton,
  Input,
  InputGroup,
  NativeSelect,
  SimpleGrid,
  Stack,
  Switch,
  Text,
  Textarea,
} from '@chakra-ui/react';
import { menuSchema, type Menu } from '@nappe/shared';
import { useMemo, useState, type ReactNode } from 'react';
import { Controller, useFieldArray, useForm } from 'react-hook-form';
import { ArrowDownIcon, ArrowUpIcon, PlusIcon, TrashIcon } from '../../../components/ui/icons';
import { ApiError } from '../../../lib/api-client';
import { useCreateMenu } from '../api/create-menu';
import { useDeleteMenu } from '../api/delete-menu';
import type { DessertResponse, MenuResponse } from '../api/types';
import { useUpdateMenu } from '../api/update-menu';
import { schemaResolver } from '../lib/form-resolver';
import {
  menuBody,
  menuFieldOf,
  menuFromForm,
  menuToFormValues,
  rephraseMenuMessage,
  type MenuFormValues,
} from '../lib/menu-form-values';
import { placeServerMessages, saveFailureMessage } from '../lib/server-errors';
import { DeleteButton } from './delete-dialog';
import { EditorActions, FormSection } from './editor-layout';
import { TextField } from './form-controls';
import { MenuCostingPanel } from './menu-costing-panel';
import { useUnsavedChangesGuard } from './unsaved-changes-guard';

type FieldName = Parameters<ReturnType<typeof useForm<MenuFormValues>>['setError']>[0];

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
  const create = useCreateMenu();
  const update = useUpdateMenu();
  const remove = useDeleteMenu();
  const [formError, setFormError] = useState<string | null>(null);
  const [savedNote, setSavedNote] = useState<string | null>(null);
  const resolver = useMemo(
    () =>
      schemaResolver<MenuFormValues, typeof menuSchema>(
        (values) => menuFromForm(values, currency),
        menuSchema,
        menuFieldOf,
        rephraseMenuMessage,
      ),
    [currency],
  );
  const form = useForm<MenuFormValues, unknown, Menu>({
    resolver,
    defaultValues: menuToFormValues(menu, currency),
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
    remove: removeDessert,
    move,
  } = useFieldArray({ control, name: 'desserts' });

  const onSubmit = handleSubmit(async (parsed) => {
    setFormError(null);
    setSavedNote(null);
    const body = menuBody(parsed);
    try {
      const saved = menu
        ? await update.mutateAsync({ id: menu.id, body })
        : await create.mutateAsync(body);
      form.reset(menuToFormValues(saved, currency));
      setSavedNote(`Saved “${saved.name}”.`);
      guard.allowNextNavigation();
      onSaved(saved, !menu);
    } catch (error) {
      if (error instanceof ApiError && error.status === 400) {
        const general: string[] = [];
        for (const p of placeServerMessages(error, (path) => {
          const field = menuFieldOf(path);
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
        templateColumns={{ base: 'minmax(0, 1fr)', lg: 'minmax(0, 1fr) 22rem' }}
        templateAreas={{
          base: '"basics" "desserts" "panel" "booking" "photos"',
          lg: '"basics panel" "desserts panel" "booking panel" "photos panel"',
        }}
        gap={{ base: '5', lg: '6' }}
        alignItems="start"
      >
        <Box gridArea="basics" minW="0">
          <FormSection title="Menu" id="menu-basics">
            <TextField
              label="Name"
              required
              error={errors.name?.message}
              registration={register('name')}
              autoComplete="off"
            />
            <Field.Root invalid={!!errors.description}>
              <Field.Label>Description for clients</Field.Label>
              <Textarea rows={3} {...register('description')} />
              <Field.ErrorText>{errors.description?.message}</Field.ErrorText>
            </Field.Root>
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
        </Box>
        <Box gridArea="desserts" minW="0">
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
        </Box>
        <Box gridArea="panel" position={{ lg: 'sticky' }} top={{ lg: '4' }}>
          <MenuCostingPanel menuId={menu?.id ?? null} currency={currency} unsaved={isDirty} />
        </Box>
        <Box gridArea="booking" minW="0">
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
        </Box>
        <Box gridArea="photos" minW="0">
          <FormSection title="Photo" id="menu-photos">
            {photos ?? <Text color="fg.muted">Create the menu first, then add a photo.</Text>}
          </FormSection>
        </Box>
      </Grid>
      <EditorActions
        saving={create.isPending || update.isPending}
        saveLabel={menu ? 'Save changes' : 'Create menu'}
        dirty={isDirty}
        status={savedNote && !isDirty ? savedNote : undefined}
        extra={
          <>
            {actions}
            {menu && (
              <DeleteButton
                what="menu"
                name={menu.name}
                onDelete={() => remove.mutateAsync(menu.id)}
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
