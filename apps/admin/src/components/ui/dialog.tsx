import { useEffect, useId, useRef, type ReactNode } from 'react';
import { cn } from './cn';

interface DialogProps {
  open: boolean;
  title: string;
  description?: ReactNode;
  /** While a change is being saved, Escape does not close the dialog halfway through. */
  busy?: boolean;
  /** A yes-or-no question needs less room than a form. */
  size?: 'form' | 'question';
  onClose: () => void;
  children: ReactNode;
}

/**
 * A native modal dialog for a small form: the browser keeps focus inside it, closes it on
 * Escape and returns focus to the control that opened it.
 */
export function Dialog({
  open,
  title,
  description,
  busy = false,
  size = 'form',
  onClose,
  children,
}: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onCancel={(event) => {
        event.preventDefault();
        if (!busy) onClose();
      }}
      className={cn(
        'm-auto rounded-lg bg-white p-0 text-neutral-900 shadow-xl backdrop:bg-neutral-900/50',
        size === 'form' ? 'w-[min(34rem,calc(100vw-2rem))]' : 'w-[min(32rem,calc(100vw-2rem))]',
      )}
    >
      <div className="flex flex-col gap-4 p-5">
        <h2 id={titleId} className="text-xl font-bold">
          {title}
        </h2>
        {description && (
          <div id={descriptionId} className="text-neutral-800">
            {description}
          </div>
        )}
        {open && children}
      </div>
    </dialog>
  );
}
