import { Box, Field, Heading, Input, InputGroup, Stack, Table, Text } from '@chakra-ui/react';
import { formatMoney } from '@nappe/shared';
import { useState } from 'react';
import { errorMessage } from '../../../lib/error-message';
import { useMenuCosting } from '../api/get-menu-costing';
import { parseNumber } from '../lib/form-resolver';
import { formatNumber } from '../lib/labels';

/**
 * Food cost of a saved menu and the price per guest that meets a target food-cost percentage,
 * from `GET /api/menus/:id/costing` (the shared costing, on the server's prices).
 */
export function MenuCostingPanel({
  menuId,
  currency,
  unsaved,
}: {
  menuId: string | null;
  currency: string;
  unsaved: boolean;
}) {
  const [target, setTarget] = useState('30');
  const targetPercent = parseNumber(target);
  const valid = targetPercent !== undefined && targetPercent >= 1 && targetPercent <= 99;
  const costing = useMenuCosting(
    menuId ?? '',
    valid ? targetPercent : 30,
    menuId !== null && valid,
  );
  return (
    <Box
      as="aside"
      aria-label="Menu costing"
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      p={{ base: '4', md: '5' }}
    >
      <Stack gap="4">
        <Heading as="h2" size="lg">
          Food cost
        </Heading>
        {menuId === null ? (
          <Text color="fg.muted">Create the menu to see what it costs per guest.</Text>
        ) : (
          <>
            <Field.Root invalid={!valid} maxW="12rem">
              <Field.Label>Target food cost</Field.Label>
              <InputGroup endAddon="%">
                <Input
                  inputMode="decimal"
                  value={target}
                  onChange={(e) => setTarget(e.target.value)}
                />
              </InputGroup>
              <Field.ErrorText>Between 1 and 99 %.</Field.ErrorText>
            </Field.Root>
            {costing.isPending ? (
              <Text color="fg.muted" role="status">
                Working out the cost…
              </Text>
            ) : costing.isError ? (
              <Text color="fg.error" role="alert">
                {errorMessage(costing.error)}
              </Text>
            ) : (
              <Stack gap="3" opacity={costing.isPlaceholderData ? 0.6 : 1}>
                <Box>
                  <Text textStyle="sm" color="fg.muted">
                    Cost per guest
                  </Text>
                  <Text fontFamily="heading" fontSize="2xl" fontWeight="bold">
                    {formatMoney(costing.data.costPerGuestMinor, currency)}
                  </Text>
                </Box>
                <Text>
                  Food cost{' '}
                  <Text as="strong" data-testid="food-cost-percent">
                    {formatNumber(costing.data.foodCostPercent, 1)} %
                  </Text>{' '}
                  of {formatMoney(costing.data.pricePerGuestMinor, currency)} per guest.
                </Text>
                {costing.data.suggestion && (
                  <Text>
                    At {formatNumber(costing.data.suggestion.targetPercent, 1)} %, charge at least{' '}
                    <Text as="strong" data-testid="suggested-price">
                      {formatMoney(costing.data.suggestion.pricePerGuestMinor, currency)}
                    </Text>{' '}
                    per guest.
                  </Text>
                )}
                <Table.Root size="sm">
                  <Table.Caption srOnly>Plate cost of each dessert</Table.Caption>
                  <Table.Body>
                    {costing.data.desserts.map((d) => (
                      <Table.Row key={d.dessertId} bg="transparent">
                        <Table.Cell>{d.name}</Table.Cell>
                        <Table.Cell textAlign="end" fontVariantNumeric="tabular-nums">
                          {formatMoney(d.plateCostMinor, currency)}
                        </Table.Cell>
                      </Table.Row>
                    ))}
                  </Table.Body>
                </Table.Root>
                <Text textStyle="xs" color="fg.muted">
                  {unsaved
                    ? 'For the menu as saved: save your changes to update these figures.'
                    : 'The price as stored; say on the storefront whether it includes tax.'}
                </Text>
              </Stack>
            )}
          </>
        )}
      </Stack>
    </Box>
  );
}
