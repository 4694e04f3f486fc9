import { Box, Grid, Image, List, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import { useMemo } from 'react';
import type { DessertResponse } from '../api/types';
import { formatNumber } from '../lib/labels';
import { attempt, dessertInsights, indexWith, toDomainDessert } from '../lib/live-kitchen';
import { DessertInsightsPanel } from './dessert-insights-panel';
import { FormSection } from './editor-layout';
import type { KitchenCatalogueData } from '../api/types';

/** A dessert to plate from (staff): its components, plating notes, photos and allergens. */
export function DessertDetail({
  dessert,
  catalogue,
}: {
  dessert: DessertResponse;
  catalogue: KitchenCatalogueData;
}) {
  const insights = useMemo(() => {
    const index = attempt(() => indexWith(catalogue));
    return index.ok
      ? dessertInsights(index.value, toDomainDessert(dessert), { withCost: false })
      : null;
  }, [catalogue, dessert]);
  return (
    <Grid
      templateColumns={{ base: 'minmax(0, 1fr)', lg: 'minmax(0, 1fr) 24rem' }}
      gap={{ base: '5', lg: '6' }}
      alignItems="start"
    >
      <Stack gap="5" minW="0">
        {dessert.description && <Text textStyle="lg">{dessert.description}</Text>}
        <FormSection title="On each plate" id="dessert-component-facts">
          <List.Root gap="2" ps="5">
            {dessert.components.map((c, i) => (
              <List.Item key={`${c.recipeId}-${i}`}>
                {dessert.referenceNames[c.recipeId] ?? c.recipeId} —{' '}
                {c.unit === 'g'
                  ? `${formatNumber(c.quantity, 1)} g`
                  : `${formatNumber(c.quantity, 2)} ${c.quantity === 1 ? 'piece' : 'pieces'}`}
                {c.note && (
                  <Text as="span" color="fg.muted">
                    {' '}
                    ({c.note})
                  </Text>
                )}
              </List.Item>
            ))}
          </List.Root>
        </FormSection>
        <FormSection title="Plating" id="dessert-plating-facts">
          <Text whiteSpace="pre-wrap">{dessert.platingNotes || 'No plating notes.'}</Text>
        </FormSection>
        {dessert.photos.length > 0 && (
          <FormSection title="Photos" id="dessert-photo-facts">
            <SimpleGrid columns={{ base: 2, md: 3 }} gap="3">
              {dessert.photos.map((p, i) => (
                <Image
                  key={p.id}
                  src={p.thumbnailUrl}
                  alt={`${dessert.name}, photo ${i + 1}`}
                  width={p.width}
                  height={p.height}
                  w="full"
                  h="auto"
                  borderRadius="l2"
                  loading="lazy"
                />
              ))}
            </SimpleGrid>
          </FormSection>
        )}
      </Stack>
      <Box
        position={{ lg: 'sticky' }}
        top={{ lg: '4' }}
        maxH={{ lg: 'calc(100dvh - 2rem)' }}
        overflowY={{ lg: 'auto' }}
      >
        <DessertInsightsPanel
          insights={insights}
          waiting="The allergens could not be worked out from the catalogue."
          currency={catalogue.currency}
          live={false}
        />
      </Box>
    </Grid>
  );
}
