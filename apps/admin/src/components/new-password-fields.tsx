import { PASSWORD_MIN } from '@chuckkey/core';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { TextField } from './ui/text-field';

interface NewPasswordFieldsProps {
  password: UseFormRegisterReturn;
  confirm: UseFormRegisterReturn;
  passwordError: string | undefined;
  confirmError: string | undefined;
  /** Someone joining the shop sets their first password; everyone else replaces one, and the labels say "new". */
  first?: boolean;
}

/**
 * A password typed twice, marked as new so that password managers offer to generate and save
 * one instead of filling in the old.
 */
export function NewPasswordFields({ password, confirm, passwordError, confirmError, first = false }: NewPasswordFieldsProps) {
  return (
    <>
      <TextField
        label={first ? 'Password' : 'New password'}
        hint={`${first ? 'Choose one of at least' : 'At least'} ${PASSWORD_MIN} characters. A few unrelated words make a strong one.`}
        type="password"
        autoComplete="new-password"
        error={passwordError}
        {...password}
      />
      <TextField
        label={first ? 'Confirm password' : 'Confirm new password'}
        type="password"
        autoComplete="new-password"
        error={confirmError}
        {...confirm}
      />
    </>
  );
}
