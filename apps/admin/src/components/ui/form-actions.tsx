import type { ReactNode } from 'react';
import { Button } from './button';

interface FormActionsProps {
  /** What the form's own button does: "Save machine", "Create training". */
  submitLabel: string;
  pending: boolean;
  onCancel: () => void;
}

/**
 * The end of a form on its own page: saving comes first in reading and tab order, and on a
 * phone it sits at the bottom, nearest the thumb.
 */
export function FormActions({ submitLabel, pending, onCancel }: FormActionsProps) {
  return (
    <div className="flex flex-col-reverse gap-2 sm:flex-row">
      <Button type="submit" pending={pending}>
        {submitLabel}
      </Button>
      <Button variant="secondary" onClick={onCancel}>
        Cancel
      </Button>
    </div>
  );
}

interface DialogActionsProps {
  pending: boolean;
  onCancel: () => void;
  /** The button that does what the dialog asks about. */
  children: ReactNode;
}

/**
 * The end of a dialog: Cancel, then the action, to the right on wide screens. While the action
 * runs, Cancel waits too, so the dialog does not close on a change halfway through.
 */
export function DialogActions({ pending, onCancel, children }: DialogActionsProps) {
  return (
    <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
      <Button variant="secondary" onClick={onCancel} disabled={pending}>
        Cancel
      </Button>
      {children}
    </div>
  );
}
