import { tagOutCreateSchema, type TagOut } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Dialog } from '../../../components/ui/dialog';
import { DialogForm } from '../../../components/ui/dialog-form';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useTagOutMachine } from '../api/tag-out-machine';

export interface ReportedMachine {
  id: string;
  name: string;
}

const errorOptions = {
  messages: {
    already_tagged_out: 'Someone tagged this machine out already. Its plate on the Shop floor says why.',
    machine_not_found: 'This machine is no longer in the shop.',
  },
};

function ReportForm({ machine, onClose, onReported }: { machine: ReportedMachine; onClose: () => void; onReported: (tagOut: TagOut) => void }) {
  const tagOut = useTagOutMachine();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(tagOutCreateSchema), defaultValues: { reason: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['reason'], errorOptions);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onReported(await tagOut.mutateAsync({ machineId: machine.id, tagOut: values }));
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <DialogForm onSubmit={onSubmit} formError={formError} pending={tagOut.isPending} onCancel={onClose} submitLabel="Tag out this machine" submitVariant="danger">
      <TextAreaField
        label="What is wrong?"
        hint="For example: strange noise from the headstock, guard damaged, coolant leak. Stop the machine safely first."
        rows={3}
        maxLength={500}
        error={errors.reason?.message}
        {...register('reason')}
      />
    </DialogForm>
  );
}

interface ReportProblemDialogProps {
  machine: ReportedMachine | null;
  onClose: () => void;
  onReported: (tagOut: TagOut) => void;
}

/** "Report a problem" in the web app: the machine is tagged out at once, and the admins are mailed. */
export function ReportProblemDialog({ machine, onClose, onReported }: ReportProblemDialogProps) {
  return (
    <Dialog
      open={machine !== null}
      title={machine ? `Report a problem with the ${machine.name}` : ''}
      description="The machine is tagged out at once: no station starts a session on it until an admin, or the instructor who tagged it, clears it. The shop’s admins are e-mailed."
      onClose={onClose}
    >
      {machine && <ReportForm key={machine.id} machine={machine} onClose={onClose} onReported={onReported} />}
    </Dialog>
  );
}
