import { Textarea as ChakraTextarea, type TextareaProps } from '@chakra-ui/react';
import type { Ref } from 'react';

/** Chakra's textarea (outlined at 3:1 against the paper by theme/recipes/textarea.ts). */
export function Textarea({ ref, ...props }: TextareaProps & { ref?: Ref<HTMLTextAreaElement> }) {
  return <ChakraTextarea ref={ref} {...props} />;
}
