import type { FormEventHandler, ReactNode } from 'react';
import { Alert } from './alert';
import { Button, type ButtonVariant } from './button';
import { DialogActions } from './form-actions';

interface DialogFormProps {
  onSubmit: FormEventHandler<HTMLFormElement>;
  /** A refusal that belongs to no one field, above the fields. */
  formError: string | null;
  pending: boolean;
  onCancel: () => void;
  /** What confirming does: "Record return", "Revoke sign-off". */
  submitLabel: string;
  submitVariant?: ButtonVariant;
  /** The fields: a note or a reason, and whatever the action needs besides. */
  children: ReactNode;
}

/** The form inside a dialog that confirms an action with a few words about it, then Cancel or the action. */
export function DialogForm({ onSubmit, formError, pending, onCancel, submitLabel, submitVariant = 'primary', children }: DialogFormProps) {
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      {children}
      <DialogActions pending={pending} onCancel={onCancel}>
        <Button type="submit" variant={submitVariant} pending={pending}>
          {submitLabel}
        </Button>
      </DialogActions>
    </form>
  );
}
