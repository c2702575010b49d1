import type { ReactNode } from 'react';
import { Alert } from './alert';
import { Button, type ButtonVariant } from './button';
import { Dialog } from './dialog';
import { DialogActions } from './form-actions';

interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children?: ReactNode;
  confirmLabel: string;
  confirmVariant?: ButtonVariant;
  pending?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/** A yes-or-no question in a modal dialog; the body explains what confirming will do. */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  confirmVariant = 'primary',
  pending = false,
  error,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  return (
    <Dialog
      open={open}
      title={title}
      description={children}
      busy={pending}
      size="question"
      onClose={onCancel}
    >
      {error && <Alert tone="error">{error}</Alert>}
      <DialogActions pending={pending} onCancel={onCancel}>
        <Button variant={confirmVariant} onClick={onConfirm} pending={pending}>
          {confirmLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
