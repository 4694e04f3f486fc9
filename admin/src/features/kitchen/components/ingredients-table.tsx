import { Link, Text } from '@chakra-ui/react';
import { formatMoney, ingredientCostPerGramExact, roundMinorUnits } from '@nappe/shared';
import { useMemo } from 'react';
import { Link as RouterLink } from 'react-router';
import type { IngredientResponse } from '../api/types';
import { ingredientAllergenText } from '../lib/allergen-text';
import { formatNumber, unitLabel } from '../lib/labels';
import { attempt, toDomainIngredient } from '../lib/live-kitchen';
import { CatalogueTable, kitchenColumnHelper } from './catalogue-table';

interface IngredientRow {
  id: string;
  name: string;
  allergens: string;
  pack: string;
  /** Price per kg in minor units; undefined for staff, or when the pack cannot be weighed. */
  perKgMinor: number | undefined;
  href: string;
}

const column = kitchenColumnHelper<IngredientRow>();

function columnsFor(currency: string, withPrices: boolean) {
  const name = column.accessor('name', {
    header: 'Name',
    sortFn: 'alphanumeric',
    cell: (info) => (
      <>
        <Link
          asChild
          fontWeight="medium"
          color="fg"
          textDecoration="underline"
          textUnderlineOffset="3px"
        >
          <RouterLink to={info.row.original.href}>{info.getValue()}</RouterLink>
        </Link>
        <Text hideFrom="md" textStyle="xs" color="fg.muted" mt="1">
          {info.row.original.allergens} · {info.row.original.pack}
        </Text>
      </>
    ),
  });
  const allergens = column.accessor('allergens', {
    header: 'Allergens',
    enableSorting: false,
    cell: (info) => (
      <Text textStyle="sm" color={info.getValue() === 'None declared' ? 'fg.muted' : 'fg'}>
        {info.getValue()}
      </Text>
    ),
  });
  const pack = column.accessor('pack', { header: 'Pack', enableSorting: false });
  const perKg = column.accessor('perKgMinor', {
    header: 'Price per kg',
    sortFn: 'basic',
    sortUndefined: 'last',
    sortDescFirst: false,
    cell: (info) => {
      const v = info.getValue();
      return v === undefined ? (
        <Text color="fg.muted" title="The pack cannot be weighed: add a density or unit weight.">
          —
        </Text>
      ) : (
        <Text fontVariantNumeric="tabular-nums">{formatMoney(v, currency)}</Text>
      );
    },
  });
  return withPrices ? [name, allergens, pack, perKg] : [name, allergens, pack];
}

/** Ingredients: name, allergens in words, the pack bought and (for the chef) its price per kg. */
export function IngredientsTable({
  ingredients,
  currency,
  withPrices,
  hrefOf,
}: {
  ingredients: IngredientResponse[];
  currency: string;
  withPrices: boolean;
  hrefOf: (id: string) => string;
}) {
  const rows = useMemo(
    () =>
      ingredients.map((ing): IngredientRow => {
        const price = ing.purchase.packPriceMinor;
        const perGram =
          price === null
            ? null
            : attempt(() => ingredientCostPerGramExact(toDomainIngredient(ing)));
        const packPrice = price === null ? '' : ` · ${formatMoney(price, currency)}`;
        return {
          id: ing.id,
          name: ing.name,
          allergens: ingredientAllergenText(ing),
          pack: `${formatNumber(ing.purchase.packSize, 3)} ${unitLabel(ing.purchase.packUnit)}${packPrice}`,
          perKgMinor: perGram?.ok ? roundMinorUnits(perGram.value * 1000) : undefined,
          href: hrefOf(ing.id),
        };
      }),
    [ingredients, currency, hrefOf],
  );
  const columns = useMemo(() => columnsFor(currency, withPrices), [currency, withPrices]);
  return (
    <CatalogueTable
      data={rows}
      columns={columns}
      caption="Ingredients of the kitchen"
      searchColumns={['name', 'allergens']}
      searchLabel="Search ingredients by name or allergen"
      hideOnPhone={['allergens', 'pack']}
      noun={['ingredient', 'ingredients']}
      getRowId={(row) => row.id}
    />
  );
}
