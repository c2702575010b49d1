import { signOffRevokeSchema, type SignOff } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Dialog } from '../../../components/ui/dialog';
import { DialogForm } from '../../../components/ui/dialog-form';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useRevokeSignOff } from '../api/revoke-sign-off';

const errorOptions = {
  messages: {
    already_revoked: 'Someone revoked this sign-off already. Close this and look at the record again.',
  },
};

function RevokeForm({ signOff, onClose, onRevoked }: { signOff: SignOff; onClose: () => void; onRevoked: (signOff: SignOff) => void }) {
  const revoke = useRevokeSignOff();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(signOffRevokeSchema), defaultValues: { reason: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['reason'], errorOptions);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onRevoked(await revoke.mutateAsync({ id: signOff.id, revoke: values }));
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <DialogForm onSubmit={onSubmit} formError={formError} pending={revoke.isPending} onCancel={onClose} submitLabel="Revoke sign-off" submitVariant="danger">
      <TextAreaField
        label="Reason"
        hint="The member sees it on their record. Say what was seen and what they need to do to be signed off again."
        rows={3}
        error={errors.reason?.message}
        {...register('reason')}
      />
    </DialogForm>
  );
}

interface RevokeDialogProps {
  signOff: SignOff | null;
  onClose: () => void;
  onRevoked: (signOff: SignOff) => void;
}

export function RevokeDialog({ signOff, onClose, onRevoked }: RevokeDialogProps) {
  return (
    <Dialog
      open={signOff !== null}
      title={signOff ? `Revoke ${signOff.memberName}'s sign-off for ${signOff.trainingName}?` : ''}
      description={
        signOff && signOff.machines.length > 0
          ? `From now on no station clears them for ${signOff.machines.map((machine) => machine.name).join(', ')} on this sign-off. The record stays, marked revoked.`
          : 'From now on this sign-off no longer counts. The record stays, marked revoked.'
      }
      onClose={onClose}
    >
      {signOff && <RevokeForm key={signOff.id} signOff={signOff} onClose={onClose} onRevoked={onRevoked} />}
    </Dialog>
  );
}
