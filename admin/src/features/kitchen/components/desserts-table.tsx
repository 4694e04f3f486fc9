import { Link, Text } from '@chakra-ui/react';
import { useMemo } from 'react';
import { Link as RouterLink } from 'react-router';
import type { DessertResponse } from '../api/types';
import { CatalogueTable, kitchenColumnHelper } from './catalogue-table';

interface DessertRow {
  id: string;
  name: string;
  components: string;
  photos: number;
  href: string;
}

const column = kitchenColumnHelper<DessertRow>();
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
          {info.row.original.components}
        </Text>
      </>
    ),
  }),
  column.accessor('components', {
    header: 'On the plate',
    enableSorting: false,
    cell: (info) => (
      <Text textStyle="sm" color="fg.muted">
        {info.getValue()}
      </Text>
    ),
  }),
  column.accessor('photos', {
    header: 'Photos',
    sortFn: 'basic',
    cell: (info) => (info.getValue() === 0 ? 'None yet' : String(info.getValue())),
  }),
];

export function DessertsTable({
  desserts,
  hrefOf,
}: {
  desserts: DessertResponse[];
  hrefOf: (id: string) => string;
}) {
  const rows = useMemo(
    () =>
      desserts.map((d): DessertRow => ({
        id: d.id,
        name: d.name,
        components: d.components.map((c) => d.referenceNames[c.recipeId] ?? c.recipeId).join(', '),
        photos: d.photos.length,
        href: hrefOf(d.id),
      })),
    [desserts, hrefOf],
  );
  return (
    <CatalogueTable
      data={rows}
      columns={columns}
      caption="Plated desserts"
      searchColumns={['name', 'components']}
      searchLabel="Search desserts by name or component"
      hideOnPhone={['components', 'photos']}
      noun={['dessert', 'desserts']}
      getRowId={(row) => row.id}
    />
  );
}
