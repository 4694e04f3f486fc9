import { Badge, Box, Heading, SimpleGrid, Stack, Table, Text } from '@chakra-ui/react';
import {
  plural,
  UNIT_DEFINITIONS,
  type PlanRecipeRow,
  type PrepPlanView,
  type PurchaseLineView,
  type Unit,
} from '@nappe/shared';
import type { ReactNode } from 'react';
import { clockOf, grams, longDate, money, shortDate, STORAGE_LABELS, when } from '../lib/format';
import { PrepSection } from './prep-states';

function packUnit(unit: Unit, count: number): string {
  if (unit === 'piece') return count === 1 ? 'piece' : 'pieces';
  if (unit === 'leaf') return count === 1 ? 'leaf' : 'leaves';
  return UNIT_DEFINITIONS[unit].label;
}

const num = (n: number) => new Intl.NumberFormat('en-GB', { maximumFractionDigits: 3 }).format(n);

function needText(line: PurchaseLineView): string {
  if (line.counted) {
    const { pieces, countUnit } = line.counted;
    return `${plural(pieces, countUnit === 'leaf' ? 'leaf' : 'piece', countUnit === 'leaf' ? 'leaves' : 'pieces')} (${grams(line.grams)})`;
  }
  return grams(line.grams);
}

function Figure({ label, value, hint }: { label: string; value: ReactNode; hint?: string }) {
  return (
    <Box borderWidth="1px" borderColor="border" borderRadius="l3" bg="bg.panel" px="4" py="3">
      <Text textStyle="sm" color="fg.muted">
        {label}
      </Text>
      <Text fontFamily="heading" textStyle="2xl" fontVariantNumeric="tabular-nums">
        {value}
      </Text>
      {hint && (
        <Text textStyle="xs" color="fg.muted">
          {hint}
        </Text>
      )}
    </Box>
  );
}

/** A table in a scroll area; `fixed` lays it out to the width (cells wrap) rather than scroll. */
function DataTable({
  caption,
  head,
  children,
  foot,
  fixed,
}: {
  caption: string;
  head: ReactNode;
  children: ReactNode;
  foot?: ReactNode;
  fixed?: boolean;
}) {
  return (
    <Table.ScrollArea
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      whiteSpace={fixed ? 'normal' : undefined}
    >
      <Table.Root size="sm" tableLayout={fixed ? 'fixed' : undefined} overflowWrap="anywhere">
        <Table.Caption srOnly>{caption}</Table.Caption>
        <Table.Header>
          <Table.Row bg="bg.muted">{head}</Table.Row>
        </Table.Header>
        <Table.Body>{children}</Table.Body>
        {foot && <Table.Footer>{foot}</Table.Footer>}
      </Table.Root>
    </Table.ScrollArea>
  );
}

const numeric = { textAlign: 'end', fontVariantNumeric: 'tabular-nums' } as const;

function RecipeRow({ row, day }: { row: PlanRecipeRow; day: string }) {
  const use = [
    row.onPlates ? 'on plates' : null,
    row.forRecipes.length > 0 ? `in ${row.forRecipes.join(', ')}` : null,
  ]
    .filter(Boolean)
    .join('; ');
  return (
    <Table.Row bg="bg.panel" verticalAlign="top">
      <Table.Cell>
        <Text fontWeight="semibold">{row.recipeName}</Text>
        <Text textStyle="xs" color="fg.muted">
          {STORAGE_LABELS[row.storage]} · {use} · {plural(row.orderIds.length, 'event')}
        </Text>
        <Text textStyle="xs" color="fg.muted" fontVariantNumeric="tabular-nums">
          {clockOf(row.startAt)} → ready {when(row.finishAt, day)} · use by{' '}
          {when(row.expiresAt, day)}
        </Text>
      </Table.Cell>
      <Table.Cell {...numeric} fontWeight="semibold">
        {grams(row.grams)}
      </Table.Cell>
      <Table.Cell>
        <Text fontVariantNumeric="tabular-nums" fontWeight="medium">
          {plural(row.batches, 'batch', 'batches')} × {grams(row.gramsPerBatch)}
        </Text>
        <Text textStyle="xs" color="fg.muted">
          {row.equipment
            ? `${row.equipment.name}: up to ${grams(row.equipment.batchCapacityG)} a batch`
            : 'No equipment limit'}
        </Text>
      </Table.Cell>
    </Table.Row>
  );
}

/**
 * The prep plan of a date range: plates per dessert with the spare plates, per production day
 * the recipes with grams and batches against the equipment, totals, and the purchase list —
 * with prices and costs only when the API sent them (the chef's).
 */
export function PlanView({ plan }: { plan: PrepPlanView }) {
  const costs = plan.costsShown;
  const totalPlates = plan.plates.reduce((s, p) => s + p.plates, 0);
  const lines = plan.purchaseList.lines;
  return (
    <Stack gap={{ base: '8', md: '10' }}>
      <SimpleGrid columns={{ base: 2, md: costs ? 4 : 3 }} gap="3">
        <Figure label="Confirmed events" value={plan.orders.length} />
        <Figure label="Plates" value={totalPlates} hint={`with ${plan.sparePercent} % spare`} />
        <Figure label="Production days" value={plan.days.length} />
        {costs && plan.purchaseList.totalMinor !== undefined && (
          <Figure
            label="Purchase list"
            value={money(plan.purchaseList.totalMinor, plan.currency)}
            hint="whole packs"
          />
        )}
      </SimpleGrid>

      <PrepSection id="plan-plates" title="Plates per dessert">
        <Text color="fg.muted" textStyle="sm" mb="3">
          Guests plus {plan.sparePercent} % spare, rounded up to a whole plate for each event. A
          changed plate (a component left out or replaced for a guest) is counted as the recipes it
          really uses.
        </Text>
        <Stack gap="4">
          <DataTable
            caption="Plates per dessert"
            head={
              <>
                <Table.ColumnHeader>Dessert</Table.ColumnHeader>
                <Table.ColumnHeader {...numeric}>Plates</Table.ColumnHeader>
                <Table.ColumnHeader {...numeric}>Events</Table.ColumnHeader>
              </>
            }
          >
            {plan.plates.map((p) => (
              <Table.Row key={p.dessertId} bg="bg.panel">
                <Table.Cell fontWeight="semibold">{p.dessertName}</Table.Cell>
                <Table.Cell {...numeric}>{p.plates}</Table.Cell>
                <Table.Cell {...numeric}>{p.orderIds.length}</Table.Cell>
              </Table.Row>
            ))}
          </DataTable>
          <DataTable
            fixed
            caption="Events and their plates"
            head={
              <>
                <Table.ColumnHeader w={{ base: '36%', md: '30%' }}>Event</Table.ColumnHeader>
                <Table.ColumnHeader {...numeric} w={{ base: '20%', md: '12%' }}>
                  Guests
                </Table.ColumnHeader>
                <Table.ColumnHeader>Plates</Table.ColumnHeader>
              </>
            }
          >
            {plan.orders.map((o) => (
              <Table.Row key={o.orderId} bg="bg.panel" verticalAlign="top">
                <Table.Cell>
                  <Text fontWeight="semibold">
                    {shortDate(o.eventDate)} {o.serviceTime}
                  </Text>
                  <Text textStyle="xs" color="fg.muted">
                    {o.menuName}
                  </Text>
                </Table.Cell>
                <Table.Cell {...numeric}>{o.guestCount}</Table.Cell>
                <Table.Cell>
                  {o.desserts.map((d) => (
                    <Text key={d.dessertId} textStyle="sm">
                      {d.dessertName}: {d.plates}
                      <Text as="span" color="fg.muted">
                        {' '}
                        ({d.sparePlates} spare
                        {d.changedPlates > 0 ? `, ${d.changedPlates} changed` : ''})
                      </Text>
                    </Text>
                  ))}
                </Table.Cell>
              </Table.Row>
            ))}
          </DataTable>
        </Stack>
      </PrepSection>

      <PrepSection id="plan-days" title="Production days">
        <Text color="fg.muted" textStyle="sm" mb="4">
          What to make each day, worked back from every service time. Components made together serve
          several events while their shelf life allows; no batch is larger than its equipment holds.
        </Text>
        <Stack gap="6">
          {plan.days.map((day) => (
            <Box key={day.date} as="section" aria-labelledby={`plan-day-${day.date}`}>
              <Heading
                as="h3"
                size="md"
                id={`plan-day-${day.date}`}
                mb="2"
                display="flex"
                gap="2"
                alignItems="baseline"
                flexWrap="wrap"
              >
                {longDate(day.date)}
                <Badge variant="subtle" colorPalette="caramel">
                  {plural(day.recipes.length, 'recipe')}
                </Badge>
              </Heading>
              <DataTable
                fixed
                caption={`Recipes to make on ${longDate(day.date)}`}
                head={
                  <>
                    <Table.ColumnHeader w={{ base: '46%', md: '55%' }}>Recipe</Table.ColumnHeader>
                    <Table.ColumnHeader {...numeric} w={{ base: '22%', md: '13%' }}>
                      Weigh
                    </Table.ColumnHeader>
                    <Table.ColumnHeader w={{ base: '32%', md: '32%' }}>Batches</Table.ColumnHeader>
                  </>
                }
              >
                {day.recipes.map((row) => (
                  <RecipeRow key={row.runId} row={row} day={day.date} />
                ))}
              </DataTable>
            </Box>
          ))}
        </Stack>
      </PrepSection>

      <PrepSection id="plan-totals" title="Totals per recipe">
        <DataTable
          caption="Totals per recipe"
          head={
            <>
              <Table.ColumnHeader>Recipe</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Grams</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Times made</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Batches</Table.ColumnHeader>
            </>
          }
        >
          {plan.recipes.map((r) => (
            <Table.Row key={r.recipeId} bg="bg.panel">
              <Table.Cell fontWeight="semibold">{r.recipeName}</Table.Cell>
              <Table.Cell {...numeric}>{grams(r.grams)}</Table.Cell>
              <Table.Cell {...numeric}>{r.runs}</Table.Cell>
              <Table.Cell {...numeric}>{r.batches}</Table.Cell>
            </Table.Row>
          ))}
        </DataTable>
      </PrepSection>

      <PrepSection id="plan-purchases" title="Purchase list">
        <Text color="fg.muted" textStyle="sm" mb="3">
          Every ingredient of every recipe above, totalled and rounded up to whole packs.
          {costs ? ' Cost is whole packs at today’s pack prices; what is used is beside it.' : ''}
        </Text>
        <DataTable
          caption="Purchase list"
          head={
            <>
              <Table.ColumnHeader>Ingredient</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Needed</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>To buy</Table.ColumnHeader>
              {costs && (
                <>
                  <Table.ColumnHeader {...numeric}>Pack price</Table.ColumnHeader>
                  <Table.ColumnHeader {...numeric}>Cost</Table.ColumnHeader>
                  <Table.ColumnHeader {...numeric}>Of which used</Table.ColumnHeader>
                </>
              )}
            </>
          }
          foot={
            costs && plan.purchaseList.totalMinor !== undefined ? (
              <Table.Row bg="bg.muted">
                <Table.Cell fontWeight="semibold" colSpan={4}>
                  Total
                </Table.Cell>
                <Table.Cell {...numeric} fontWeight="semibold">
                  {money(plan.purchaseList.totalMinor, plan.currency)}
                </Table.Cell>
                <Table.Cell {...numeric}>
                  {plan.purchaseList.usedCostMinor !== undefined
                    ? money(plan.purchaseList.usedCostMinor, plan.currency)
                    : ''}
                </Table.Cell>
              </Table.Row>
            ) : undefined
          }
        >
          {lines.map((l) => (
            <Table.Row key={l.ingredientId} bg="bg.panel">
              <Table.Cell fontWeight="medium" minW="10rem">
                {l.name}
              </Table.Cell>
              <Table.Cell {...numeric}>{needText(l)}</Table.Cell>
              <Table.Cell {...numeric} whiteSpace="nowrap">
                {l.packs} × {num(l.packSize)} {packUnit(l.packUnit, l.packSize)}
              </Table.Cell>
              {costs && (
                <>
                  <Table.Cell {...numeric}>
                    {l.packPriceMinor !== undefined ? money(l.packPriceMinor, plan.currency) : ''}
                  </Table.Cell>
                  <Table.Cell {...numeric}>
                    {l.totalMinor !== undefined ? money(l.totalMinor, plan.currency) : ''}
                  </Table.Cell>
                  <Table.Cell {...numeric} color="fg.muted">
                    {l.usedCostMinor !== undefined ? money(l.usedCostMinor, plan.currency) : ''}
                  </Table.Cell>
                </>
              )}
            </Table.Row>
          ))}
        </DataTable>
      </PrepSection>
    </Stack>
  );
}
