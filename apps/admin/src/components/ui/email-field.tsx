import type { ComponentProps } from 'react';
import { TextField } from './text-field';

type EmailFieldProps = Omit<ComponentProps<typeof TextField>, 'type' | 'inputMode' | 'autoCapitalize' | 'spellCheck' | 'label' | 'autoComplete'> & {
  label?: string;
  /** Whose address it is decides what the browser may fill in: "username" to sign in, "email" for one's own, "off" for someone else's. */
  autoComplete: 'username' | 'email' | 'off';
};

/** An e-mail address: phones show the keyboard with @, and neither capitalise nor "correct" it. */
export function EmailField({ label = 'E-mail', ...props }: EmailFieldProps) {
  return <TextField label={label} type="email" inputMode="email" autoCapitalize="none" spellCheck={false} {...props} />;
}
