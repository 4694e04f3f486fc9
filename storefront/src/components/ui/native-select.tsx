import { NativeSelect } from '@chakra-ui/react';
import type { ReactNode, Ref, SelectHTMLAttributes } from 'react';

export interface SelectProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'size'> {
  ref?: Ref<HTMLSelectElement>;
  children: ReactNode;
  size?: 'sm' | 'md' | 'lg';
}

/** A plain `<select>`: the phone's own picker, fully keyboard and screen-reader friendly. */
export function Select({ ref, children, size = 'md', ...props }: SelectProps) {
  return (
    <NativeSelect.Root size={size}>
      <NativeSelect.Field ref={ref} {...props}>
        {children}
      </NativeSelect.Field>
      <NativeSelect.Indicator />
    </NativeSelect.Root>
  );
}
