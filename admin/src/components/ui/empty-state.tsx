import { EmptyState as ChakraEmptyState, type BoxProps } from '@chakra-ui/react';
import type { ReactNode } from 'react';

/** Nothing here yet, and what to do about it. */
export function EmptyState({
  icon,
  title,
  titleAs = 'h3',
  children,
  action,
  descriptionMaxW = 'md',
  ...rootProps
}: {
  icon: ReactNode;
  title: string;
  /** The title's heading level: h2 where it stands directly under the screen's h1. */
  titleAs?: 'h2' | 'h3';
  /** What to do about it; left out, the title stands alone. */
  children?: ReactNode;
  action?: ReactNode;
  descriptionMaxW?: BoxProps['maxW'];
} & Omit<ChakraEmptyState.RootProps, 'title' | 'children'>) {
  return (
    <ChakraEmptyState.Root
      borderWidth="1px"
      borderStyle="dashed"
      borderColor="border.emphasized"
      borderRadius="l3"
      bg="bg.panel"
      {...rootProps}
    >
      <ChakraEmptyState.Content>
        <ChakraEmptyState.Indicator color="caramel.fg">{icon}</ChakraEmptyState.Indicator>
        <ChakraEmptyState.Title as={titleAs} fontFamily="heading" textStyle="xl" textAlign="center">
          {title}
        </ChakraEmptyState.Title>
        {children && (
          <ChakraEmptyState.Description color="fg.muted" textAlign="center" maxW={descriptionMaxW}>
            {children}
          </ChakraEmptyState.Description>
        )}
        {action}
      </ChakraEmptyState.Content>
    </ChakraEmptyState.Root>
  );
}
