import { cribConditions, cribReturnInputSchema, type CribCheckout, type CribCondition, type CribReturnInput } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { ChoiceGroup, RadioOption } from '../../../components/ui/choice-group';
import { Dialog } from '../../../components/ui/dialog';
import { DialogForm } from '../../../components/ui/dialog-form';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useReturnCheckout } from '../api/return-checkout';

export const conditionLabels: Record<CribCondition, string> = {
  good: 'Good',
  needs_attention: 'Needs attention',
  damaged: 'Damaged',
};

const conditionMeanings: Record<CribCondition, string> = {
  good: 'Back on the shelf, ready to lend again.',
  needs_attention: 'Goes out of circulation until an admin has checked it, and waits under Needs attention.',
  damaged: 'Goes out of circulation until it is repaired or replaced, and waits under Needs attention.',
};

const errorOptions = {
  messages: {
    already_returned: 'Someone has recorded this return already. Close this and look at the list again.',
    crib_checkout_not_found: 'This checkout is no longer in the records. Close this and look at the list again.',
  },
};

type FormInput = z.input<typeof cribReturnInputSchema>;

function ReturnForm({ checkout, onClose, onReturned }: { checkout: CribCheckout; onClose: () => void; onReturned: (checkout: CribCheckout) => void }) {
  const ret = useReturnCheckout();
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormInput, unknown, CribReturnInput>({ resolver: zodResolver(cribReturnInputSchema), defaultValues: { condition: 'good', note: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['condition', 'note'], errorOptions);
  const condition = useWatch({ control, name: 'condition' });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onReturned(await ret.mutateAsync({ id: checkout.id, ret: values }));
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <DialogForm onSubmit={onSubmit} formError={formError} pending={ret.isPending} onCancel={onClose} submitLabel="Record return">
      <ChoiceGroup legend="Condition" error={errors.condition?.message}>
        {cribConditions.map((value) => (
          <RadioOption key={value} value={value} label={conditionLabels[value]} description={conditionMeanings[value]} {...register('condition')} />
        ))}
      </ChoiceGroup>
      {condition !== 'good' && (
        <Alert tone="warning">{checkout.itemName} goes out of circulation: nobody can check it out until an admin puts it back.</Alert>
      )}
      <TextAreaField
        label="Note (optional)"
        hint="What was seen: a chipped face, a sticky spindle, a missing part. Whoever checks it reads this."
        rows={3}
        error={errors.note?.message}
        {...register('note')}
      />
    </DialogForm>
  );
}

interface CribCheckoutsReturnDialogProps {
  checkout: CribCheckout | null;
  onClose: () => void;
  onReturned: (checkout: CribCheckout) => void;
}

export function CribCheckoutsReturnDialog({ checkout, onClose, onReturned }: CribCheckoutsReturnDialogProps) {
  return (
    <Dialog
      open={checkout !== null}
      title={checkout ? `Return ${checkout.itemName}` : ''}
      description={checkout ? `Checked out to ${checkout.memberName}. Look the tool over before choosing its condition.` : undefined}
      onClose={onClose}
    >
      {checkout && <ReturnForm key={checkout.id} checkout={checkout} onClose={onClose} onReturned={onReturned} />}
    </Dialog>
  );
}
