import { Link, Text } from '@chakra-ui/react';
import { useMemo } from 'react';
import { Link as RouterLink } from 'react-router';
import type { RecipeResponse } from '../api/types';
import { formatHours, formatNumber, STORAGE_LABELS } from '../lib/labels';
import { CatalogueTable, kitchenColumnHelper } from './catalogue-table';

interface RecipeRow {
  id: string;
  name: string;
  storage: string;
  yieldG: number;
  shelfLifeHours: number;
  uses: string;
  href: string;
}

const column = kitchenColumnHelper<RecipeRow>();
const columns = [
  column.accessor('name', {
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
          {info.row.original.uses}
        </Text>
      </>
    ),
  }),
  column.accessor('storage', { header: 'Storage', sortFn: 'text' }),
  column.accessor('yieldG', {
    header: 'Yield',
    sortFn: 'basic',
    sortDescFirst: false,
    cell: (info) => (
      <Text fontVariantNumeric="tabular-nums">{formatNumber(info.getValue(), 1)} g</Text>
    ),
  }),
  column.accessor('shelfLifeHours', {
    header: 'Keeps',
    sortFn: 'basic',
    sortDescFirst: false,
    cell: (info) => formatHours(info.getValue()),
  }),
  column.accessor('uses', {
    header: 'Made of',
    enableSorting: false,
    cell: (info) => (
      <Text textStyle="sm" color="fg.muted">
        {info.getValue()}
      </Text>
    ),
  }),
];

export function RecipesTable({
  recipes,
  hrefOf,
}: {
  recipes: RecipeResponse[];
  hrefOf: (id: string) => string;
}) {
  const rows = useMemo(
    () =>
      recipes.map((r): RecipeRow => ({
        id: r.id,
        name: r.name,
        storage: STORAGE_LABELS[r.storage],
        yieldG: r.yieldG,
        shelfLifeHours: r.shelfLifeHours,
        uses: r.lines
          .map((l) => r.referenceNames[l.kind === 'ingredient' ? l.ingredientId : l.recipeId])
          .filter(Boolean)
          .join(', '),
        href: hrefOf(r.id),
      })),
    [recipes, hrefOf],
  );
  return (
    <CatalogueTable
      data={rows}
      columns={columns}
      caption="Recipes of the kitchen"
      searchColumns={['name', 'uses']}
      searchLabel="Search recipes by name or ingredient"
      hideOnPhone={['storage', 'shelfLifeHours', 'uses']}
      noun={['recipe', 'recipes']}
      getRowId={(row) => row.id}
    />
  );
}
