import { cribRestoreInputSchema, type CribAttention, type CribRestoreInput } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { cn } from '../../../components/ui/cn';
import { Dialog } from '../../../components/ui/dialog';
import { DialogForm } from '../../../components/ui/dialog-form';
import { EmptyState } from '../../../components/ui/empty-state';
import { CrossCircleIcon, WarningIcon } from '../../../components/ui/icons';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { ActionsTh, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { paths } from '../../../config/paths';
import { useFocusedNotice } from '../../../hooks/use-focused-notice';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { formatDateTime } from '../../../lib/format';
import { useCribAttention } from '../api/attention';
import { useRestoreItem } from '../api/restore-item';

function ConditionBadge({ condition }: { condition: CribAttention['condition'] }) {
  const damaged = condition === 'damaged';
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-bold whitespace-nowrap',
        damaged ? 'border-danger bg-danger-soft text-danger' : 'border-warning bg-warning-soft text-warning',
      )}
    >
      {damaged ? <CrossCircleIcon className="size-4 shrink-0" /> : <WarningIcon className="size-4 shrink-0" />}
      {damaged ? 'Damaged' : 'Needs attention'}
    </span>
  );
}

type FormInput = z.input<typeof cribRestoreInputSchema>;

function RestoreForm({ tool, onClose, onRestored }: { tool: CribAttention; onClose: () => void; onRestored: () => void }) {
  const restore = useRestoreItem();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormInput, unknown, CribRestoreInput>({ resolver: zodResolver(cribRestoreInputSchema), defaultValues: { note: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['note'], {
    messages: { crib_item_not_found: 'This tool is no longer in the crib. Close this and look at the list again.' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await restore.mutateAsync({ id: tool.itemId, restore: values });
      onRestored();
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <DialogForm onSubmit={onSubmit} formError={formError} pending={restore.isPending} onCancel={onClose} submitLabel="Back in circulation">
      <TextAreaField
        label="What was done (optional)"
        hint="Kept in the audit log: the repair, the check, who did it."
        rows={3}
        error={errors.note?.message}
        {...register('note')}
      />
    </DialogForm>
  );
}

/** Tools that came back needing attention or damaged, waiting off the shelf until an admin puts them back. */
export function CribAttentionList({ timeZone }: { timeZone: string | undefined }) {
  const attention = useCribAttention();
  const [restoring, setRestoring] = useState<CribAttention | null>(null);
  const [restored, setRestored, restoredRef] = useFocusedNotice<string | null>(null);

  return (
    <div className="flex flex-col gap-4">
      {restored && (
        <Alert ref={restoredRef} tabIndex={-1} tone="success" title="Back in circulation">
          {restored} is marked good and can be checked out again.
        </Alert>
      )}
      {attention.isPending ? (
        <Spinner label="Loading the tools that need attention…" />
      ) : attention.isError ? (
        <QueryError error={attention.error} what="the tools that need attention" onRetry={() => void attention.refetch()} retrying={attention.isFetching} />
      ) : attention.data.length === 0 ? (
        <EmptyState title="Nothing needs attention — returned tools marked needs attention or damaged appear here." />
      ) : (
        <Table caption="Tools that need attention">
          <THead>
            <Tr>
              <Th>Tool</Th>
              <Th>Condition</Th>
              <Th>Return note</Th>
              <Th>Returned by</Th>
              <Th>Returned</Th>
              <ActionsTh />
            </Tr>
          </THead>
          <TBody>
            {attention.data.map((tool) => (
              <Tr key={tool.itemId}>
                <Td>
                  <span className="flex flex-col">
                    <span className="font-bold">{tool.name}</span>
                    <span className="text-sm text-neutral-700">
                      {tool.assetTag}
                      {tool.binLocation && ` · bin ${tool.binLocation}`}
                    </span>
                  </span>
                </Td>
                <Td>
                  <ConditionBadge condition={tool.condition} />
                </Td>
                <Td className="max-w-80 break-words">{tool.note ?? <span className="text-neutral-700">No note</span>}</Td>
                <Td>
                  {tool.memberId && tool.memberName ? (
                    <Link to={paths.memberRecord.getHref(tool.memberId)} state={{ name: tool.memberName }} className="text-brand underline underline-offset-4">
                      {tool.memberName}
                    </Link>
                  ) : (
                    <span className="text-neutral-700">Not from a return</span>
                  )}
                </Td>
                <Td className="whitespace-nowrap">{tool.returnedAt ? formatDateTime(tool.returnedAt, timeZone) : '—'}</Td>
                <Td>
                  <Button
                    variant="secondary"
                    aria-label={`Put ${tool.name} (${tool.assetTag}) back in circulation`}
                    onClick={() => {
                      setRestored(null);
                      setRestoring(tool);
                    }}
                  >
                    Back in circulation
                  </Button>
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
      <Dialog
        open={restoring !== null}
        title={restoring ? `Put ${restoring.name} back in circulation?` : ''}
        description="It is marked good and can be checked out again. Do this once it has been repaired or checked."
        onClose={() => setRestoring(null)}
      >
        {restoring && (
          <RestoreForm
            key={restoring.itemId}
            tool={restoring}
            onClose={() => setRestoring(null)}
            onRestored={() => {
              setRestored(restoring.name);
              setRestoring(null);
            }}
          />
        )}
      </Dialog>
    </div>
  );
}
