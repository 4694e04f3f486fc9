import { Box, Field, Heading, Input, Separator, Stack, Table, Text } from '@chakra-ui/react';
import { formatMoney, type RecipeCost } from '@nappe/shared';
import type { ReactNode } from 'react';
import { formatGrams, formatNumber } from '../lib/labels';
import type { AllergenView, Outcome, RecipeInsights } from '../lib/live-kitchen';
import { AllergenReportView, LabelText } from './allergen-display';
import { MixBalancePanel } from './mix-balance-panel';

function PanelPart({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Box as="section" aria-label={title}>
      <Heading as="h3" size="md" mb="2">
        {title}
      </Heading>
      {children}
    </Box>
  );
}

function Problem({ message }: { message: string }) {
  return (
    <Text textStyle="sm" color="fg.error">
      {message}
    </Text>
  );
}

function CostPart({ cost, currency }: { cost: Outcome<RecipeCost>; currency: string }) {
  if (!cost.ok) return <Problem message={cost.message} />;
  const c = cost.value;
  return (
    <Stack gap="2">
      <Text>
        <Text
          as="span"
          fontFamily="heading"
          fontSize="2xl"
          fontWeight="bold"
          data-testid="cost-per-kg"
        >
          {formatMoney(c.costPerKgMinor, currency)}
        </Text>{' '}
        <Text as="span" color="fg.muted">
          per kg
        </Text>
      </Text>
      <Text textStyle="sm" color="fg.muted">
        {formatMoney(c.batchCostMinor, currency)} for a batch of {formatGrams(c.yieldG)}
      </Text>
      <Table.Root size="sm" variant="line">
        <Table.Caption srOnly>Cost of each line</Table.Caption>
        <Table.Header>
          <Table.Row bg="transparent">
            <Table.ColumnHeader>Line</Table.ColumnHeader>
            <Table.ColumnHeader textAlign="end">Cost</Table.ColumnHeader>
            <Table.ColumnHeader textAlign="end">Share</Table.ColumnHeader>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {c.lines.map((line, i) => (
            <Table.Row key={`${line.id}-${i}`} bg="transparent">
              <Table.Cell>{line.name}</Table.Cell>
              <Table.Cell textAlign="end" fontVariantNumeric="tabular-nums">
                {formatMoney(line.costMinor, currency)}
              </Table.Cell>
              <Table.Cell textAlign="end" fontVariantNumeric="tabular-nums">
                {formatNumber(line.sharePercent, 1)} %
              </Table.Cell>
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </Stack>
  );
}

export function AllergenPart({ allergens }: { allergens: Outcome<AllergenView> }) {
  if (!allergens.ok) return <Problem message={allergens.message} />;
  return (
    <Stack gap="3">
      <AllergenReportView
        report={allergens.value.report}
        usStatement={allergens.value.usStatement}
      />
      <Box>
        <Text textStyle="xs" color="fg.muted" mb="1">
          Component label
        </Text>
        <LabelText segments={allergens.value.label.segments} />
      </Box>
    </Stack>
  );
}

/**
 * Cost per kg, allergens and (for frozen recipes) the mix balance of the recipe as it stands in
 * the form, worked out in the browser by the shared kitchen functions.
 */
export function RecipeInsightsPanel({
  insights,
  waiting,
  currency,
  overrun,
  onOverrunChange,
  frozen,
  live,
}: {
  insights: RecipeInsights | null;
  /** Why nothing can be worked out yet. */
  waiting?: string;
  currency: string;
  overrun: string;
  onOverrunChange?: (value: string) => void;
  frozen: boolean;
  /** "as you type" (an editor) or "as saved" (read-only). */
  live: boolean;
}) {
  return (
    <Box
      as="aside"
      aria-label="Recipe figures"
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '4', md: '5' }}
    >
      <Stack gap="5">
        <Box>
          <Heading as="h2" size="lg">
            Figures
          </Heading>
          <Text textStyle="xs" color="fg.muted" aria-live="polite">
            {live ? 'Worked out as you type, before saving.' : 'For one batch as written.'}
          </Text>
        </Box>
        {!insights ? (
          <Text color="fg.muted">{waiting}</Text>
        ) : (
          <>
            {insights.cost && (
              <>
                <PanelPart title="Cost">
                  <CostPart cost={insights.cost} currency={currency} />
                </PanelPart>
                <Separator />
              </>
            )}
            <PanelPart title="Allergens">
              <AllergenPart allergens={insights.allergens} />
            </PanelPart>
            {frozen && (
              <>
                <Separator />
                <PanelPart title="Mix balance">
                  <Stack gap="3">
                    {onOverrunChange && (
                      <Field.Root maxW="12rem">
                        <Field.Label>Overrun (%)</Field.Label>
                        <Input
                          size="sm"
                          inputMode="decimal"
                          value={overrun}
                          onChange={(e) => onOverrunChange(e.target.value)}
                        />
                        <Field.HelperText>Air churned in; 30 % if blank.</Field.HelperText>
                      </Field.Root>
                    )}
                    {insights.mix ? (
                      insights.mix.ok ? (
                        <MixBalancePanel mix={insights.mix.value} />
                      ) : (
                        <Problem message={insights.mix.message} />
                      )
                    ) : null}
                  </Stack>
                </PanelPart>
              </>
            )}
          </>
        )}
      </Stack>
    </Box>
  );
}
