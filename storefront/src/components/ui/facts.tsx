import { Box } from '@chakra-ui/react';
import { Fragment, type ReactNode } from 'react';

export type Fact = readonly [label: ReactNode, value: ReactNode];

/**
 * Label and value pairs as a description list: side by side from small tablets up, the label
 * above its value on a phone.
 */
export function Facts({
  items,
  labelWidth = '11rem',
}: {
  items: readonly Fact[];
  labelWidth?: string;
}) {
  return (
    <Box
      as="dl"
      display="grid"
      gridTemplateColumns={{ base: '1fr', sm: `${labelWidth} 1fr` }}
      columnGap="6"
      rowGap={{ base: '0.5', sm: '2' }}
      alignItems="baseline"
    >
      {items.map(([label, value], i) => (
        <Fragment key={i}>
          <Box
            as="dt"
            color="fg.muted"
            textStyle="sm"
            mt={{ base: i === 0 ? '0' : '2.5', sm: '0' }}
          >
            {label}
          </Box>
          <Box as="dd">{value}</Box>
        </Fragment>
      ))}
    </Box>
  );
}
