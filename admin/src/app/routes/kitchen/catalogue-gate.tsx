import type { ReactNode } from 'react';
import { useKitchenCatalogue } from '../../../features/kitchen/api/use-kitchen-catalogue';
import { BlockSkeleton, LoadError } from '../../../features/kitchen/components/load-states';
import type { KitchenCatalogueData } from '../../../features/kitchen/api/types';

/** Renders `children` with the whole catalogue (ingredients, recipes, desserts) once loaded. */
export function CatalogueGate({
  currency,
  children,
}: {
  currency: string;
  children: (catalogue: KitchenCatalogueData) => ReactNode;
}) {
  const catalogue = useKitchenCatalogue(currency);
  if (catalogue.error) {
    return (
      <LoadError
        title="The kitchen’s ingredients and recipes could not be loaded"
        error={catalogue.error}
        onRetry={() => void catalogue.refetch()}
        retrying={catalogue.isFetching}
      />
    );
  }
  if (!catalogue.data) return <BlockSkeleton label="Loading the kitchen…" />;
  return children(catalogue.data);
}
