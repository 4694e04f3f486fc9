import { Combobox, createListCollection, Portal, Text } from '@chakra-ui/react';
import { useMemo, useState } from 'react';

export interface PickerOption {
  value: string;
  label: string;
  group: string;
  /** A second line, e.g. what an ingredient is bought in. */
  hint?: string;
}

/** Case- and accent-insensitive "contains", the way a chef types ("creme" finds "crème"). */
function matches(label: string, query: string): boolean {
  const fold = (s: string) =>
    s
      .normalize('NFD')
      .replace(/\p{Diacritic}/gu, '')
      .toLocaleLowerCase('en');
  return fold(label).includes(fold(query.trim()));
}

/**
 * Search-as-you-type over ingredients and recipes (a WAI-ARIA combobox): type part of a name,
 * arrow to the one you mean, Enter to pick it.
 */
export function ItemPicker({
  label,
  value,
  onChange,
  options,
  invalid,
  onBlur,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: readonly PickerOption[];
  invalid?: boolean;
  onBlur?: () => void;
}) {
  const [query, setQuery] = useState<string | null>(null);
  const selected = options.find((o) => o.value === value);
  // A new array on every render would read as a new selection and reset what is being typed.
  const selection = useMemo(() => (value ? [value] : []), [value]);
  const collection = useMemo(() => {
    const items = query ? options.filter((o) => matches(o.label, query)) : [...options];
    return createListCollection({
      items,
      itemToString: (o) => o.label,
      itemToValue: (o) => o.value,
      groupBy: (o) => o.group,
    });
  }, [options, query]);

  return (
    <Combobox.Root
      collection={collection}
      value={selection}
      defaultInputValue={selected?.label ?? ''}
      onInputValueChange={(details) => setQuery(details.inputValue)}
      onValueChange={(details) => {
        onChange(details.value[0] ?? '');
        setQuery(null);
      }}
      onOpenChange={(details) => {
        if (!details.open) setQuery(null);
      }}
      openOnClick
      inputBehavior="autohighlight"
      invalid={invalid}
      positioning={{ sameWidth: false, placement: 'bottom-start' }}
      size="md"
    >
      <Combobox.Label srOnly>{label}</Combobox.Label>
      <Combobox.Control>
        <Combobox.Input
          placeholder="Search ingredients and recipes"
          onBlur={onBlur}
          bg="bg.subtle"
        />
        <Combobox.IndicatorGroup>
          <Combobox.Trigger aria-label={`Show all for ${label.toLowerCase()}`} />
        </Combobox.IndicatorGroup>
      </Combobox.Control>
      <Portal>
        <Combobox.Positioner>
          <Combobox.Content minW="18rem" maxH="20rem" bg="bg.panel">
            <Combobox.Empty px="3" py="2">
              Nothing matches “{query}”.
            </Combobox.Empty>
            {collection.group().map(([group, items]) => (
              <Combobox.ItemGroup key={group}>
                <Combobox.ItemGroupLabel>{group}</Combobox.ItemGroupLabel>
                {items.map((item) => (
                  <Combobox.Item key={item.value} item={item}>
                    <Combobox.ItemText>
                      {item.label}
                      {item.hint && (
                        <Text as="span" display="block" textStyle="xs" color="fg.muted">
                          {item.hint}
                        </Text>
                      )}
                    </Combobox.ItemText>
                    <Combobox.ItemIndicator />
                  </Combobox.Item>
                ))}
              </Combobox.ItemGroup>
            ))}
          </Combobox.Content>
        </Combobox.Positioner>
      </Portal>
    </Combobox.Root>
  );
}
