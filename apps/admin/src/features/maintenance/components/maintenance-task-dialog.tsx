import { maintenanceTaskInputSchema, type MaintenanceTask, type MaintenanceTaskInput } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { Dialog } from '../../../components/ui/dialog';
import { DialogForm } from '../../../components/ui/dialog-form';
import { CountField, TextField } from '../../../components/ui/text-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useSaveMaintenanceTask } from '../api/save-maintenance-task';

type FormInput = z.input<typeof maintenanceTaskInputSchema>;

/** An empty box is "not by this measure"; anything else goes to the schema as typed, to be checked there. */
const optionalCount = (value: unknown) => (value === '' || value === null || value === undefined ? null : Number(value));

const errorOptions = {
  codeFields: { maintenance_task_name_taken: 'name' as const },
  messages: { maintenance_task_not_found: 'This task is no longer in the records. Close this and look at the list again.' },
};

function TaskForm({ machineId, task, onClose, onSaved }: { machineId: string; task: MaintenanceTask | null; onClose: () => void; onSaved: (task: MaintenanceTask) => void }) {
  const save = useSaveMaintenanceTask();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormInput, unknown, MaintenanceTaskInput>({
    resolver: zodResolver(maintenanceTaskInputSchema),
    defaultValues: task
      ? { name: task.name, instructions: task.instructions, everyHours: task.everyHours, everyDays: task.everyDays, blocking: task.blocking, active: task.active }
      : { name: '', instructions: '', everyHours: null, everyDays: null, blocking: false, active: true },
  });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['name', 'instructions', 'everyHours', 'everyDays', 'blocking', 'active'], errorOptions);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onSaved(await save.mutateAsync({ machineId, taskId: task?.id ?? null, task: values }));
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <DialogForm onSubmit={onSubmit} formError={formError} pending={save.isPending} onCancel={onClose} submitLabel={task ? 'Save task' : 'Add task'}>
      <TextField label="Task" hint="What is done, e.g. Oil the ways" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <TextAreaField label="Instructions (optional)" hint="How it is done and what to look for." rows={3} error={errors.instructions?.message} {...register('instructions')} />
      <fieldset className="flex flex-col gap-3">
        <legend className="font-bold text-neutral-900">How often</legend>
        <p className="text-sm text-neutral-700">Fill in one or both; the task is due at whichever comes first, counted from the last time it was done.</p>
        <CountField label="Every … meter hours" error={errors.everyHours?.message} {...register('everyHours', { setValueAs: optionalCount })} />
        <CountField label="Every … days" error={errors.everyDays?.message} {...register('everyDays', { setValueAs: optionalCount })} />
      </fieldset>
      <CheckboxField
        label="Stops use when overdue"
        hint="While this task is overdue, stations refuse the machine until someone marks it done."
        error={errors.blocking?.message}
        {...register('blocking')}
      />
      <CheckboxField label="Active" hint="An inactive task is kept with its history but is never due." error={errors.active?.message} {...register('active')} />
    </DialogForm>
  );
}

interface MaintenanceTaskDialogProps {
  /** Open when set: `task` null adds a task to the machine. */
  editing: { task: MaintenanceTask | null } | null;
  machineId: string;
  machineName: string;
  onClose: () => void;
  onSaved: (task: MaintenanceTask) => void;
}

export function MaintenanceTaskDialog({ editing, machineId, machineName, onClose, onSaved }: MaintenanceTaskDialogProps) {
  return (
    <Dialog open={editing !== null} title={editing?.task ? `Change ${editing.task.name}` : `Add a task to ${machineName}`} onClose={onClose}>
      {editing && <TaskForm key={editing.task?.id ?? 'new'} machineId={machineId} task={editing.task} onClose={onClose} onSaved={onSaved} />}
    </Dialog>
  );
}
