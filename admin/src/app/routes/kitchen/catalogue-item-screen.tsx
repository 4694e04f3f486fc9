import { Badge } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import type { QueryClient, UseQueryResult } from '@tanstack/react-query';
import { Fragment, type ReactNode } from 'react';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { LoadError } from '../../../components/ui/load-error';
import { RequireRole } from '../../../features/auth/components/require-role';
import type { CatalogueItem } from '../../../features/kitchen/components/item-editor';
import { KitchenPageHeader } from '../../../features/kitchen/components/kitchen-page-header';
import {
  BackLink,
  warm,
  WithKitchenViewer,
  type AnyQueryOptions,
  type KitchenViewer,
} from './kitchen-shell';

/** What a screen hands its item's editor. */
export interface ItemEditorProps<Item extends CatalogueItem> {
  /** The saved item, or undefined for a new one. */
  item?: Item;
  viewer: KitchenViewer;
  /** The link back to the list, for the save bar. */
  actions: ReactNode;
  onSaved: (saved: Item, created: boolean) => void;
  onDeleted: () => void;
}

/** One kind of catalogue item's screen: its words, where it lives, how it loads and shows. */
export interface CatalogueItemKind<Item extends CatalogueItem> {
  /** "dessert": the titles and messages say it. */
  noun: string;
  /** "desserts": the list, in the eyebrow and the back link. */
  plural: string;
  listHref: string;
  itemHref: (id: string) => string;
  useItem: (id: string) => UseQueryResult<Item>;
  /** Beside the title, for everyone (a recipe's Scale). */
  headerActions?: (item: Item) => ReactNode;
  /** The chef's editor. */
  editor: (props: ItemEditorProps<Item>) => ReactNode;
  /** What staff read instead. */
  detail: (item: Item, viewer: KitchenViewer) => ReactNode;
}

const capitalised = (word: string) => word.charAt(0).toUpperCase() + word.slice(1);

/**
 * A loader for `/kitchen/<plural>/new` and `/kitchen/<plural>/:id`: warms the item (when there is
 * one) and whatever else its editor reads.
 */
export const catalogueItemLoader =
  (detail: (id: string) => AnyQueryOptions, also: () => AnyQueryOptions[] = () => []) =>
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    warm(queryClient, ...also(), ...(params.id ? [detail(params.id)] : []));
    return null;
  };

/**
 * `/kitchen/<plural>/new` (the chef starts one) and `/kitchen/<plural>/:id` (the chef edits it,
 * staff read it): the item loaded, or why not with a retry; after creating, its own address;
 * after deleting, the list.
 */
export function CatalogueItemScreen<Item extends CatalogueItem>({
  kind,
}: {
  kind: CatalogueItemKind<Item>;
}) {
  const { id } = useParams();
  const navigate = useNavigate();
  const noun = capitalised(kind.noun);
  const back = <BackLink to={kind.listHref}>All {kind.plural}</BackLink>;
  const eyebrow = `Kitchen · ${capitalised(kind.plural)}`;
  const handlers = {
    actions: back,
    onSaved: (saved: Item, created: boolean) => {
      if (created) void navigate(kind.itemHref(saved.id), { replace: true });
    },
    onDeleted: () => void navigate(kind.listHref, { replace: true }),
  };
  return (
    <WithKitchenViewer title={id ? noun : `New ${kind.noun}`}>
      {(viewer) =>
        id ? (
          <ExistingItem id={id} kind={kind} viewer={viewer} eyebrow={eyebrow} handlers={handlers} />
        ) : (
          <RequireRole user={viewer.user} roles={[Role.Chef]}>
            <KitchenPageHeader eyebrow={eyebrow} title={`New ${kind.noun}`} />
            {kind.editor({ viewer, ...handlers })}
          </RequireRole>
        )
      }
    </WithKitchenViewer>
  );
}

function ExistingItem<Item extends CatalogueItem>({
  id,
  kind,
  viewer,
  eyebrow,
  handlers,
}: {
  id: string;
  kind: CatalogueItemKind<Item>;
  viewer: KitchenViewer;
  eyebrow: string;
  handlers: Omit<ItemEditorProps<Item>, 'item' | 'viewer'>;
}) {
  const back = handlers.actions;
  const query = kind.useItem(id);
  if (query.isPending) return <BlockSkeleton label={`Loading the ${kind.noun}…`} />;
  if (query.isError) {
    return (
      <>
        <KitchenPageHeader eyebrow={eyebrow} title={capitalised(kind.noun)} actions={back} />
        <LoadError
          title={`This ${kind.noun} could not be loaded`}
          error={query.error}
          onRetry={() => void query.refetch()}
          retrying={query.isFetching}
        />
      </>
    );
  }
  const item = query.data;
  const shared = kind.headerActions?.(item);
  return (
    <>
      <KitchenPageHeader
        eyebrow={eyebrow}
        title={item.name}
        actions={
          viewer.canEdit ? (
            shared
          ) : (
            <>
              <Badge variant="outline" size="lg">
                Read-only
              </Badge>
              {shared}
              {back}
            </>
          )
        }
      />
      {viewer.canEdit ? (
        // A fresh form for each item, should the address change under it.
        <Fragment key={item.id}>{kind.editor({ item, viewer, ...handlers })}</Fragment>
      ) : (
        kind.detail(item, viewer)
      )}
    </>
  );
}
