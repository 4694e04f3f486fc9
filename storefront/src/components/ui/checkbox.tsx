import { Checkbox as ChakraCheckbox } from '@chakra-ui/react';
import type { InputHTMLAttributes, ReactNode, Ref } from 'react';

export interface CheckboxProps extends Omit<ChakraCheckbox.RootProps, 'children'> {
  children?: ReactNode;
  /** Props for the real (visually hidden) input: `name`, `aria-describedby`, `onBlur`, a ref. */
  inputProps?: InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> };
}

/** Chakra's checkbox with its label, the box aligned with the label's first line. */
export function Checkbox({ children, inputProps, ...props }: CheckboxProps) {
  return (
    <ChakraCheckbox.Root alignItems="flex-start" {...props}>
      <ChakraCheckbox.HiddenInput {...inputProps} />
      <ChakraCheckbox.Control mt="0.5" />
      {children !== undefined && (
        <ChakraCheckbox.Label fontWeight="normal">{children}</ChakraCheckbox.Label>
      )}
    </ChakraCheckbox.Root>
  );
}
