import {
  Box,
  Button,
  Flex,
  Grid,
  Heading,
  HStack,
  Stack,
  Text,
  useBreakpointValue,
} from '@chakra-ui/react';
import type { ReactNode } from 'react';

/**
 * The grid areas of an editor whose live figures (`panel`) stand beside its sections on a wide
 * screen and, on a phone, come after the first `panelAfter` sections.
 */
export function editorAreas(areas: readonly string[], panelAfter = 2) {
  const phone = [...areas.slice(0, panelAfter), 'panel', ...areas.slice(panelAfter)];
  return {
    base: phone.map((area) => `"${area}"`).join(' '),
    lg: areas.map((area) => `"${area} panel"`).join(' '),
  };
}

/** An editor's sections (`EditorArea`) in a column, with its `EditorPanel` beside them. */
export function EditorColumns({
  areas,
  panelWidth,
  children,
}: {
  /** The sections, top to bottom. */
  areas: readonly string[];
  panelWidth: string;
  children: ReactNode;
}) {
  return (
    <Grid
      templateColumns={{ base: 'minmax(0, 1fr)', lg: `minmax(0, 1fr) ${panelWidth}` }}
      templateAreas={editorAreas(areas)}
      gap={{ base: '5', lg: '6' }}
      alignItems="start"
    >
      {children}
    </Grid>
  );
}

/** One section's place in `EditorColumns`. */
export function EditorArea({ area, children }: { area: string; children: ReactNode }) {
  return (
    <Box gridArea={area} minW="0">
      {children}
    </Box>
  );
}

/**
 * The live figures beside the sections, kept in view while the form scrolls; unless `scrolls` is
 * false they scroll on their own when taller than the screen.
 */
export function EditorPanel({
  scrolls = true,
  children,
}: {
  scrolls?: boolean;
  children: ReactNode;
}) {
  return (
    <Box
      gridArea="panel"
      position={{ lg: 'sticky' }}
      top={{ lg: '4' }}
      {...(scrolls ? { maxH: { lg: 'calc(100dvh - 2rem)' }, overflowY: { lg: 'auto' } } : {})}
    >
      {children}
    </Box>
  );
}

/** One part of an editor, with its heading. */
export function FormSection({
  title,
  description,
  children,
  id,
}: {
  title: string;
  description?: ReactNode;
  children: ReactNode;
  id?: string;
}) {
  return (
    <Box
      as="section"
      aria-labelledby={id ? `${id}-title` : undefined}
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '4', md: '6' }}
    >
      <Stack gap="1" mb="4">
        <Heading as="h2" size="lg" id={id ? `${id}-title` : undefined}>
          {title}
        </Heading>
        {description && (
          <Text color="fg.muted" textStyle="sm">
            {description}
          </Text>
        )}
      </Stack>
      <Stack gap="4">{children}</Stack>
    </Box>
  );
}

/**
 * The save bar, kept in reach at the bottom of the screen while scrolling a long editor. On a
 * phone it holds only the status and Save; the other actions follow the form.
 */
export function EditorActions({
  saving,
  saveLabel,
  status,
  dirty,
  extra,
}: {
  saving: boolean;
  saveLabel: string;
  status?: ReactNode;
  dirty: boolean;
  extra?: ReactNode;
}) {
  const wide = useBreakpointValue({ base: false, md: true }, { fallback: 'base' }) ?? false;
  return (
    <>
      <Box
        position="sticky"
        bottom="0"
        zIndex="sticky"
        mx={{ base: '-4', md: '0' }}
        mt="6"
        px={{ base: '4', md: '5' }}
        py="3"
        bg="bg.panel"
        borderWidth="1px"
        borderColor="border"
        borderRadius={{ base: '0', md: 'l3' }}
        boxShadow="card"
      >
        <Flex gap="3" align="center" justify="space-between">
          <Text textStyle="sm" color="fg.muted" aria-live="polite" minW="0" lineClamp={2}>
            {status ?? (dirty ? 'Unsaved changes' : 'No changes')}
          </Text>
          <HStack gap="2" flexShrink="0">
            {wide && extra}
            <Button type="submit" loading={saving} loadingText="Saving…">
              {saveLabel}
            </Button>
          </HStack>
        </Flex>
      </Box>
      {!wide && extra && (
        <HStack gap="2" wrap="wrap" mt="4" justify="space-between">
          {extra}
        </HStack>
      )}
    </>
  );
}
