import { tagOutClearSchema, type TagOutListItem } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Dialog } from '../../../components/ui/dialog';
import { DialogForm } from '../../../components/ui/dialog-form';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useClearTagOut } from '../api/clear-tag-out';

const errorOptions = {
  messages: {
    not_tagged_out: 'Someone cleared this tag-out already. Close this and look at the list again.',
    forbidden: 'Only an admin, or the instructor who tagged this machine out, can clear it.',
  },
};

function ClearForm({ tagOut, onClose, onCleared }: { tagOut: TagOutListItem; onClose: () => void; onCleared: () => void }) {
  const clear = useClearTagOut();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(tagOutClearSchema), defaultValues: { note: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['note'], errorOptions);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await clear.mutateAsync({ machineId: tagOut.machineId, clear: values });
      onCleared();
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <DialogForm onSubmit={onSubmit} formError={formError} pending={clear.isPending} onCancel={onClose} submitLabel="Clear the tag-out">
      <TextAreaField
        label="What was done"
        hint="Kept with the machine’s history: what was found, what was fixed, and that it was checked safe to run."
        rows={3}
        maxLength={1000}
        error={errors.note?.message}
        {...register('note')}
      />
    </DialogForm>
  );
}

interface ClearTagOutDialogProps {
  tagOut: TagOutListItem | null;
  onClose: () => void;
  onCleared: () => void;
}

/** Puts a machine back in service: the stations take it again and the board shows it free. */
export function ClearTagOutDialog({ tagOut, onClose, onCleared }: ClearTagOutDialogProps) {
  return (
    <Dialog
      open={tagOut !== null}
      title={tagOut ? `Clear the tag-out of the ${tagOut.machineName}?` : ''}
      description={tagOut ? `Tagged out because: ${tagOut.reason}` : undefined}
      onClose={onClose}
    >
      {tagOut && <ClearForm key={tagOut.id} tagOut={tagOut} onClose={onClose} onCleared={onCleared} />}
    </Dialog>
  );
}
