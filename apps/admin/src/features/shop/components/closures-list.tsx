import type { ShopClosure } from '@chuckkey/core';
import { useEffect, useId, useRef, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { TrashIcon } from '../../../components/ui/icons';
import { errorMessage } from '../../../lib/api-client';
import { closureDays } from '../utils/hours-text';

const removeMessages = {
  closure_not_found: 'Someone removed this closure already. Close this and look at the list again.',
};

interface ClosuresListProps {
  closures: readonly ShopClosure[];
  onRemove: (closure: ShopClosure) => Promise<void>;
}

/** The closures still to come or under way, each removable after a question. */
export function ClosuresList({ closures, onRemove }: ClosuresListProps) {
  const noticeId = useId();
  const [removing, setRemoving] = useState<ShopClosure | null>(null);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<unknown>(null);
  const [removed, setRemoved] = useState<ShopClosure | null>(null);
  const noticeRef = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (removed && !removing) noticeRef.current?.focus();
  }, [removed, removing]);

  async function confirm() {
    if (!removing) return;
    setPending(true);
    setError(null);
    try {
      await onRemove(removing);
      setRemoved(removing);
      setRemoving(null);
    } catch (caught) {
      setError(caught);
    } finally {
      setPending(false);
    }
  }

  return (
    <div className="flex flex-col gap-3">
      {removed && (
        <Alert id={noticeId} ref={noticeRef} tabIndex={-1} tone="success">
          Closure removed: {removed.reason}. The weekly hours apply on those days again.
        </Alert>
      )}
      {closures.length === 0 ? (
        <EmptyState title="No closures coming up">Add one below for a holiday, a deep clean or a day the shop moves machines.</EmptyState>
      ) : (
        <ul aria-label="Closures" className="flex flex-col gap-2">
          {closures.map((closure) => (
            <li key={closure.id} className="flex flex-col gap-2 rounded-md border border-neutral-300 bg-white p-3 sm:flex-row sm:items-center sm:justify-between">
              <div className="flex min-w-0 flex-col">
                <span className="font-bold break-words text-neutral-900">{closure.reason}</span>
                <span className="text-neutral-700">{closureDays(closure)}</span>
              </div>
              <Button
                variant="secondary"
                className="min-h-12!"
                onClick={() => {
                  setRemoved(null);
                  setError(null);
                  setRemoving(closure);
                }}
              >
                <TrashIcon />
                <span>
                  Remove{' '}
                  <span className="sr-only">the closure {closure.reason}</span>
                </span>
              </Button>
            </li>
          ))}
        </ul>
      )}

      <ConfirmDialog
        open={removing !== null}
        title={removing ? `Remove the closure “${removing.reason}”?` : ''}
        confirmLabel="Remove closure"
        confirmVariant="danger"
        pending={pending}
        error={error ? errorMessage(error, removeMessages) : null}
        onCancel={() => setRemoving(null)}
        onConfirm={() => void confirm()}
      >
        {removing && <p>The shop keeps its weekly hours on {closureDays(removing)} again, and stations clear members as usual on those days.</p>}
      </ConfirmDialog>
    </div>
  );
}
