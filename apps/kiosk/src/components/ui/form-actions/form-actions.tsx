import type { ReactNode } from 'react';
import { Button } from '@/components/ui/button';

interface FormActionsProps {
  /** The words of the submit button. */
  submit: ReactNode;
  /** The words of the quiet button that leaves the form without sending it. */
  cancel: ReactNode;
  onCancel: () => void;
  /** The submit button only: leaving the form is always possible. */
  disabled?: boolean;
}

/** A kiosk form's row of actions: the submit button first, then the way out, wrapping on a narrow screen. */
export function FormActions({ submit, cancel, onCancel, disabled }: FormActionsProps) {
  return (
    <div className="flex flex-wrap gap-4">
      <Button type="submit" disabled={disabled}>
        {submit}
      </Button>
      <Button variant="quiet" onClick={onCancel}>
        {cancel}
      </Button>
    </div>
  );
}
