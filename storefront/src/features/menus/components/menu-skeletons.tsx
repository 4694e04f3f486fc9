import { Card, SimpleGrid, Stack } from '@chakra-ui/react';
import { Skeleton, SkeletonLines } from '../../../components/ui/skeleton';

/** The menus grid while it loads: the same shapes, so nothing jumps when the cards arrive. */
export function MenuGridSkeleton({ count = 3 }: { count?: number }) {
  return (
    <SimpleGrid
      columns={{ base: 1, md: 2, lg: 3 }}
      gap="6"
      role="status"
      aria-label="Loading the menus"
    >
      {Array.from({ length: count }, (_, i) => (
        <Card.Root key={i} variant="outline" bg="bg.panel" borderColor="border" overflow="hidden">
          <Skeleton style={{ aspectRatio: '4 / 3' }} borderRadius="0" />
          <Card.Body gap="4">
            <Skeleton h="7" w="70%" />
            <SkeletonLines lines={3} />
            <Skeleton h="10" w="40%" borderRadius="full" />
          </Card.Body>
        </Card.Root>
      ))}
    </SimpleGrid>
  );
}

export function MenuDetailSkeleton() {
  return (
    <Stack gap="6" role="status" aria-label="Loading the menu">
      <Skeleton style={{ aspectRatio: '16 / 9' }} borderRadius="l3" />
      <Skeleton h="10" w="60%" />
      <SkeletonLines lines={4} />
    </Stack>
  );
}
