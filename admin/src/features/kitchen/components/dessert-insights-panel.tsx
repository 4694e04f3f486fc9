import { Box, Heading, Separator, Stack, Table, Text } from '@chakra-ui/react';
import { formatMoney } from '@nappe/shared';
import { formatGrams } from '../lib/labels';
import type { DessertInsights } from '../lib/live-kitchen';
import { AllergenPart } from './recipe-insights-panel';

/** What one plate costs (chef) and carries, worked out by the shared functions. */
export function DessertInsightsPanel({
  insights,
  waiting,
  currency,
  live,
}: {
  insights: DessertInsights | null;
  waiting?: string;
  currency: string;
  live: boolean;
}) {
  return (
    <Box
      as="aside"
      aria-label="Plate figures"
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '4', md: '5' }}
    >
      <Stack gap="5">
        <Box>
          <Heading as="h2" size="lg">
            One plate
          </Heading>
          <Text textStyle="xs" color="fg.muted">
            {live ? 'Worked out as you type, before saving.' : 'As saved.'}
          </Text>
        </Box>
        {!insights ? (
          <Text color="fg.muted">{waiting}</Text>
        ) : (
          <>
            {insights.cost && (
              <Box as="section" aria-label="Plate cost">
                <Heading as="h3" size="md" mb="2">
                  Plate cost
                </Heading>
                {insights.cost.ok ? (
                  <Stack gap="2">
                    <Text
                      fontFamily="heading"
                      fontSize="2xl"
                      fontWeight="bold"
                      data-testid="plate-cost"
                    >
                      {formatMoney(insights.cost.value.plateCostMinor, currency)}
                    </Text>
                    <Table.Root size="sm">
                      <Table.Caption srOnly>Cost of each component</Table.Caption>
                      <Table.Body>
                        {insights.cost.value.components.map((c, i) => (
                          <Table.Row key={`${c.recipeId}-${i}`} bg="transparent">
                            <Table.Cell>{c.name}</Table.Cell>
                            <Table.Cell
                              textAlign="end"
                              whiteSpace="nowrap"
                              fontVariantNumeric="tabular-nums"
                            >
                              {formatGrams(c.grams)}
                            </Table.Cell>
                            <Table.Cell textAlign="end" fontVariantNumeric="tabular-nums">
                              {formatMoney(c.costMinor, currency)}
                            </Table.Cell>
                          </Table.Row>
                        ))}
                      </Table.Body>
                    </Table.Root>
                  </Stack>
                ) : (
                  <Text textStyle="sm" color="fg.error">
                    {insights.cost.message}
                  </Text>
                )}
              </Box>
            )}
            {insights.cost && <Separator />}
            <Box as="section" aria-label="Allergens">
              <Heading as="h3" size="md" mb="2">
                Allergens
              </Heading>
              <AllergenPart allergens={insights.allergens} />
            </Box>
          </>
        )}
      </Stack>
    </Box>
  );
}
