import { trainingInputSchema, type Training } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ChecklistEditor, checklistErrorProps } from '../../../components/checklist-editor';
import { Alert } from '../../../components/ui/alert';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { FormActions } from '../../../components/ui/form-actions';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { checklistDraftSchema, toDraft, withChecklistIds } from '../../../lib/checklist';
import { useCreateTraining } from '../api/create-training';
import { useUpdateTraining } from '../api/update-training';

// New checklist items get their ids only when saved, so the form checks the words and the
// server's schema checks the ids.
const formSchema = trainingInputSchema.extend({
  checklist: checklistDraftSchema.min(1, { error: 'List at least one practical item.' }),
});
type FormInput = z.input<typeof formSchema>;
type FormOutput = z.output<typeof formSchema>;

interface TrainingFormProps {
  training?: Training;
  onSaved: (training: Training) => void;
  onCancel: () => void;
}

export function TrainingForm({ training, onSaved, onCancel }: TrainingFormProps) {
  const create = useCreateTraining();
  const update = useUpdateTraining();
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(formSchema),
    defaultValues: {
      name: training?.name ?? '',
      description: training?.description ?? '',
      checklist: toDraft(training?.checklist ?? []),
      validityMonths: training?.validityMonths ?? 12,
      active: training?.active ?? true,
    },
  });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['name', 'description', 'checklist', 'validityMonths']);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const input = trainingInputSchema.parse({ ...values, checklist: withChecklistIds(values.checklist) });
    try {
      const saved = training ? await update.mutateAsync({ id: training.id, training: input }) : await create.mutateAsync(input);
      onSaved(saved);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-2xl flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <TextAreaField
        label="Description"
        hint="What the training covers and who teaches it. Members read it when a machine asks for this training."
        error={errors.description?.message}
        {...register('description')}
      />
      <Controller
        control={control}
        name="checklist"
        render={({ field }) => (
          <ChecklistEditor
            legend="Practical checklist"
            hint="What the instructor must see the member do before signing them off. The instructor ticks every item."
            items={field.value}
            onChange={field.onChange}
            {...checklistErrorProps(errors.checklist)}
            addLabel="Add a checklist item"
          />
        )}
      />
      <TextField
        label="Validity in months"
        hint="How long a sign-off counts before it has to be renewed. 0 = never lapses."
        type="number"
        inputMode="numeric"
        min={0}
        max={120}
        step={1}
        error={errors.validityMonths?.message}
        className="max-w-40"
        {...register('validityMonths')}
      />
      <CheckboxField
        label="Active"
        hint="Instructors can sign off only active trainings. Sign-offs already given keep counting."
        {...register('active')}
      />
      <FormActions
        submitLabel={training ? 'Save training' : 'Create training'}
        pending={create.isPending || update.isPending}
        onCancel={onCancel}
      />
    </form>
  );
}
