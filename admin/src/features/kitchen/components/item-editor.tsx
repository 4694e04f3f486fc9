import { Alert } from '@chakra-ui/react';
import { useState, type BaseSyntheticEvent, type ReactNode } from 'react';
import {
  useForm,
  type DefaultValues,
  type FieldPath,
  type FieldValues,
  type UseFormReturn,
} from 'react-hook-form';
import type { z } from 'zod';
import { schemaResolver, type Conversion } from '../lib/form-resolver';
import { saveErrorsOf } from '../lib/server-errors';
import { DeleteButton } from './delete-dialog';
import { EditorActions } from './editor-layout';
import { useUnsavedChangesGuard } from './unsaved-changes-guard';

/** A catalogue item as the API answers it: an ingredient, recipe, dessert or menu. */
export interface CatalogueItem {
  id: string;
  name: string;
}

/** What the editor needs of a mutation hook's result. */
interface Mutation<Variables, Result> {
  mutateAsync: (variables: Variables) => Promise<Result>;
  isPending: boolean;
}

export interface ItemEditorOptions<
  Values extends FieldValues,
  Schema extends z.ZodType,
  Body,
  Item extends CatalogueItem,
> {
  /** The saved item, or undefined for a new one. */
  item: Item | undefined;
  /** The shared schema the API validates with: the form is checked with it too. */
  schema: Schema;
  /** The domain object the schema judges, built from the form's values. */
  fromForm: (values: Values) => Conversion;
  /** The form field a schema path is about (`root.…`: the whole form). */
  fieldOf: (path: readonly PropertyKey[], candidate: unknown) => string;
  /** Words for zod's generic messages (see `schemaResolver`). */
  rephrase?: (field: string, message: string) => string;
  /** The form's values for an item, or for a new one. */
  toFormValues: (item: Item | undefined) => Values;
  /** What is sent, from the validated form. */
  toBody: (parsed: z.output<Schema>) => Body;
  /** A field for a server message that names no path, found from its words; null if none. */
  placeElsewhere?: (message: string, values: Values) => FieldPath<Values> | null;
  create: Mutation<Body, Item>;
  update: Mutation<{ id: string; body: Body }, Item>;
  remove: Mutation<string, unknown>;
  onSaved: (saved: Item, created: boolean) => void;
  onDeleted: () => void;
}

/** What `ItemEditorForm` shows of an editor's state. */
export interface ItemEditorState<Item extends CatalogueItem> {
  item: Item | undefined;
  isDirty: boolean;
  guard: ReturnType<typeof useUnsavedChangesGuard>;
  onSubmit: (event?: BaseSyntheticEvent) => Promise<void>;
  /** Why the last save failed, for the "Not saved" alert. */
  formError: string | null;
  /** "Saved …" until the next change. */
  status: string | undefined;
  saving: boolean;
  remove: (id: string) => Promise<unknown>;
  onDeleted: () => void;
}

/**
 * The form of one catalogue item and its saving: create or update, the server's 400 messages
 * placed at their fields, "Saved …" until the next change, and the unsaved-changes guard.
 * Render it with `ItemEditorForm`.
 */
export function useItemEditor<
  Values extends FieldValues,
  Schema extends z.ZodType,
  Body,
  Item extends CatalogueItem,
>({
  item,
  schema,
  fromForm,
  fieldOf,
  rephrase,
  toFormValues,
  toBody,
  placeElsewhere,
  create,
  update,
  remove,
  onSaved,
  onDeleted,
}: ItemEditorOptions<Values, Schema, Body, Item>): ItemEditorState<Item> & {
  form: UseFormReturn<Values, unknown, z.output<Schema>>;
} {
  const [formError, setFormError] = useState<string | null>(null);
  const [savedNote, setSavedNote] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<Schema>>({
    // useForm reads its options afresh on every render, so this needs no memo.
    resolver: schemaResolver(fromForm, schema, fieldOf, rephrase),
    defaultValues: toFormValues(item) as DefaultValues<Values>,
  });
  const isDirty = form.formState.isDirty;
  const guard = useUnsavedChangesGuard(isDirty);

  const onSubmit = form.handleSubmit(async (parsed) => {
    setFormError(null);
    setSavedNote(null);
    const body = toBody(parsed);
    try {
      const saved = item
        ? await update.mutateAsync({ id: item.id, body })
        : await create.mutateAsync(body);
      form.reset(toFormValues(saved));
      setSavedNote(`Saved “${saved.name}”.`);
      guard.allowNextNavigation();
      onSaved(saved, !item);
    } catch (error) {
      const values = form.getValues();
      const { candidate } = fromForm(values);
      const { fields, summary } = saveErrorsOf(
        error,
        (path) => fieldOf(path, candidate),
        placeElsewhere && ((message) => placeElsewhere(message, values)),
      );
      for (const { field, message } of fields) {
        form.setError(field as FieldPath<Values>, { type: 'server', message });
      }
      setFormError(summary);
    }
  });

  return {
    form,
    item,
    isDirty,
    guard,
    onSubmit,
    formError,
    status: savedNote && !isDirty ? savedNote : undefined,
    saving: create.isPending || update.isPending,
    remove: (id) => remove.mutateAsync(id),
    onDeleted,
  };
}

/**
 * The frame of every catalogue editor: the form, "Not saved" with what went wrong, the editor's
 * own sections (`children`), and the save bar with `actions` and, for a saved item, Delete after
 * asking.
 */
export function ItemEditorForm<Item extends CatalogueItem>({
  editor,
  what,
  problems = [],
  actions,
  children,
}: {
  editor: ItemEditorState<Item>;
  /** "dessert", "menu"…: the save button and the delete dialog say it. */
  what: string;
  /** More for the "Not saved" alert: form-wide problems the checks found. */
  problems?: string[];
  actions: ReactNode;
  children: ReactNode;
}) {
  const { item, guard } = editor;
  const notSaved = [editor.formError, ...problems].filter(Boolean).join(' ');
  return (
    <form onSubmit={(e) => void editor.onSubmit(e)} noValidate>
      {guard.dialog}
      {notSaved && (
        <Alert.Root status="error" role="alert" borderRadius="l2" mb="5">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>Not saved</Alert.Title>
            <Alert.Description>{notSaved}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
      {children}
      <EditorActions
        saving={editor.saving}
        saveLabel={item ? 'Save changes' : `Create ${what}`}
        dirty={editor.isDirty}
        status={editor.status}
        extra={
          <>
            {actions}
            {item && (
              <DeleteButton
                what={what}
                name={item.name}
                onDelete={() => editor.remove(item.id)}
                onDeleted={() => {
                  guard.allowNextNavigation();
                  editor.onDeleted();
                }}
              />
            )}
          </>
        }
      />
    </form>
  );
}
