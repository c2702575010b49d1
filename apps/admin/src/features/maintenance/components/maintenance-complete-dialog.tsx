import { maintenanceCompleteSchema, type MaintenanceComplete, type MaintenanceTask } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Dialog } from '../../../components/ui/dialog';
import { DialogForm } from '../../../components/ui/dialog-form';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useCompleteMaintenanceTask } from '../api/complete-maintenance-task';
import { hoursText } from '../utils/maintenance-words';

type FormInput = z.input<typeof maintenanceCompleteSchema>;

const errorOptions = { messages: { maintenance_task_not_found: 'This task is no longer in the records. Close this and look at the list again.' } };

function CompleteForm({ task, onClose, onDone }: { task: MaintenanceTask; onClose: () => void; onDone: (task: MaintenanceTask) => void }) {
  const complete = useCompleteMaintenanceTask();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormInput, unknown, MaintenanceComplete>({ resolver: zodResolver(maintenanceCompleteSchema), defaultValues: { note: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['note'], errorOptions);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onDone(await complete.mutateAsync({ taskId: task.id, note: values.note }));
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <DialogForm onSubmit={onSubmit} formError={formError} pending={complete.isPending} onCancel={onClose} submitLabel="Mark done">
      <TextAreaField label="Note (optional)" hint="What was found or done: worn parts, what was replaced, anything the next person should know." rows={3} error={errors.note?.message} {...register('note')} />
    </DialogForm>
  );
}

export function MaintenanceCompleteDialog({ task, onClose, onDone }: { task: MaintenanceTask | null; onClose: () => void; onDone: (task: MaintenanceTask) => void }) {
  return (
    <Dialog
      open={task !== null}
      title={task ? `Mark done: ${task.name}` : ''}
      description={task ? `Recorded now, at the meter's ${hoursText(task.machine.meterHours)}. The next due is counted from here.` : undefined}
      onClose={onClose}
    >
      {task && <CompleteForm key={task.id} task={task} onClose={onClose} onDone={onDone} />}
    </Dialog>
  );
}
