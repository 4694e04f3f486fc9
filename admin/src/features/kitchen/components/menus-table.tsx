import { Badge, Link, Text } from '@chakra-ui/react';
import { formatMoney } from '@nappe/shared';
import { useMemo } from 'react';
import { Link as RouterLink } from 'react-router';
import type { MenuResponse } from '../api/types';
import { CatalogueTable, kitchenColumnHelper } from './catalogue-table';

interface MenuRow {
  id: string;
  name: string;
  desserts: string;
  priceMinor: number;
  guests: string;
  status: string;
  href: string;
}

const column = kitchenColumnHelper<MenuRow>();

function columnsFor(currency: string) {
  return [
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
            {info.row.original.desserts}
          </Text>
        </>
      ),
    }),
    column.accessor('desserts', {
      header: 'Desserts',
      enableSorting: false,
      cell: (info) => (
        <Text textStyle="sm" color="fg.muted">
          {info.getValue()}
        </Text>
      ),
    }),
    column.accessor('priceMinor', {
      header: 'Per guest',
      sortFn: 'basic',
      sortDescFirst: false,
      cell: (info) => (
        <Text fontVariantNumeric="tabular-nums">{formatMoney(info.getValue(), currency)}</Text>
      ),
    }),
    column.accessor('guests', { header: 'Guests', enableSorting: false }),
    column.accessor('status', {
      header: 'Status',
      sortFn: 'text',
      cell: (info) => (
        <Badge variant="subtle" colorPalette={info.getValue() === 'On sale' ? 'accent' : 'gray'}>
          {info.getValue()}
        </Badge>
      ),
    }),
  ];
}

export function MenusTable({
  menus,
  currency,
  hrefOf,
}: {
  menus: MenuResponse[];
  currency: string;
  hrefOf: (id: string) => string;
}) {
  const rows = useMemo(
    () =>
      menus.map((m): MenuRow => ({
        id: m.id,
        name: m.name,
        desserts: m.dessertIds.map((id) => m.referenceNames[id] ?? id).join(', '),
        priceMinor: m.pricePerGuestMinor,
        guests: `${m.minGuests}–${m.maxGuests}`,
        status: m.active ? 'On sale' : 'Not on sale',
        href: hrefOf(m.id),
      })),
    [menus, hrefOf],
  );
  const columns = useMemo(() => columnsFor(currency), [currency]);
  return (
    <CatalogueTable
      data={rows}
      columns={columns}
      caption="Menus of the studio"
      searchColumns={['name', 'desserts']}
      searchLabel="Search menus by name or dessert"
      hideOnPhone={['desserts', 'guests']}
      noun={['menu', 'menus']}
      getRowId={(row) => row.id}
    />
  );
}
