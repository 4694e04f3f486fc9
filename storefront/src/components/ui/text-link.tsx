import { Link as ChakraLink, type LinkProps as ChakraLinkProps } from '@chakra-ui/react';
import { Link as RouterLink, type To } from 'react-router';

export interface TextLinkProps extends Omit<ChakraLinkProps, 'href'> {
  to: To;
}

/** A Chakra-styled link that navigates inside the app. */
export function TextLink({ to, children, ...props }: TextLinkProps) {
  return (
    <ChakraLink
      asChild
      color="brand.fg"
      textDecoration="underline"
      textUnderlineOffset="3px"
      textDecorationColor="accent.border"
      _hover={{ textDecorationColor: 'currentColor' }}
      {...props}
    >
      <RouterLink to={to}>{children}</RouterLink>
    </ChakraLink>
  );
}
