import type { ReactNode } from 'react';
import { useDesserts } from '../../../features/kitchen/api/get-desserts';
import { useKitchenCatalogue } from '../../../features/kitchen/api/use-kitchen-catalogue';
import { QueryGate } from '../../../features/kitchen/components/load-states';
import type { DessertResponse, KitchenCatalogueData } from '../../../features/kitchen/api/types';

/** Renders `children` with the whole catalogue (ingredients, recipes, desserts) once loaded. */
export function CatalogueGate({
  currency,
  children,
}: {
  currency: string;
  children: (catalogue: KitchenCatalogueData) => ReactNode;
}) {
  const catalogue = useKitchenCatalogue(currency);
  return (
    <QueryGate
      query={catalogue}
      loading="Loading the kitchen…"
      failed="The kitchen’s ingredients and recipes could not be loaded"
    >
      {children}
    </QueryGate>
  );
}

/** Renders `children` with every dessert once loaded (a menu's choice). */
export function DessertsGate({
  children,
}: {
  children: (desserts: DessertResponse[]) => ReactNode;
}) {
  const desserts = useDesserts();
  return (
    <QueryGate
      query={desserts}
      loading="Loading desserts…"
      failed="The desserts could not be loaded"
    >
      {children}
    </QueryGate>
  );
}
