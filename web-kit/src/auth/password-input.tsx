import { IconButton, Input, InputGroup, type InputProps } from '@chakra-ui/react';
import { useState, type Ref } from 'react';
import { EyeIcon, EyeOffIcon } from './eye-icons.js';

export interface PasswordInputProps extends Omit<InputProps, 'type'> {
  ref?: Ref<HTMLInputElement>;
}

/** A password field with a toggle that shows what was typed (a pressed/unpressed button). */
export function PasswordInput({ ref, ...props }: PasswordInputProps) {
  const [visible, setVisible] = useState(false);
  return (
    <InputGroup
      endElement={
        <IconButton
          type="button"
          variant="ghost"
          size="sm"
          me="-2"
          aria-label="Show password"
          aria-pressed={visible}
          onClick={() => setVisible((v) => !v)}
        >
          {visible ? <EyeOffIcon /> : <EyeIcon />}
        </IconButton>
      }
    >
      <Input ref={ref} type={visible ? 'text' : 'password'} {...props} />
    </InputGroup>
  );
}
