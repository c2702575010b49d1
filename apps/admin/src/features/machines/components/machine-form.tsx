import { machineCategories, machineCategoryLabels, machineInputSchema, type Area, type MachineDetail, type Training } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { ChecklistEditor, checklistErrorProps } from '../../../components/checklist-editor';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { FormActions } from '../../../components/ui/form-actions';
import { SelectField } from '../../../components/ui/select-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { checklistDraftSchema, newDraftKey, toDraft, withChecklistIds } from '../../../lib/checklist';
import { useCreateMachine } from '../api/create-machine';
import { useUpdateMachine } from '../api/update-machine';
import { usualSafetyItems } from '../utils/usual-safety-items';

const formSchema = machineInputSchema.extend({ safetyChecklist: checklistDraftSchema });
type FormInput = z.input<typeof formSchema>;
type FormOutput = z.output<typeof formSchema>;

const fields = ['name', 'category', 'areaId', 'reservable', 'description', 'requiresPin', 'safetyChecklist', 'trainingIds'] as const;

interface MachineFormProps {
  machine?: MachineDetail;
  areas: Area[];
  trainings: Training[];
  onSaved: (machine: MachineDetail) => void;
  onCancel: () => void;
}

export function MachineForm({ machine, areas, trainings, onSaved, onCancel }: MachineFormProps) {
  const create = useCreateMachine();
  const update = useUpdateMachine();
  const {
    register,
    control,
    handleSubmit,
    setError,
    getValues,
    setValue,
    formState: { errors },
  } = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(formSchema),
    defaultValues: {
      name: machine?.name ?? '',
      category: machine?.category ?? 'lathe',
      areaId: machine?.areaId ?? '',
      reservable: machine?.reservable ?? false,
      description: machine?.description ?? '',
      requiresPin: machine?.requiresPin ?? false,
      safetyChecklist: toDraft(machine?.safetyChecklist ?? []),
      trainingIds: machine?.trainings.map((training) => training.id) ?? [],
    },
  });
  const { formError, setFormError, showServerError } = useServerErrors(setError, fields);
  const category = useWatch({ control, name: 'category' });
  const checklist = useWatch({ control, name: 'safetyChecklist' }) ?? [];
  // Offered for an empty list only: next to items of the shop's own wording they would read as repeats.
  const suggestions = checklist.length === 0 ? usualSafetyItems[category] : [];

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const input = machineInputSchema.parse({ ...values, safetyChecklist: withChecklistIds(values.safetyChecklist) });
    try {
      const saved = machine ? await update.mutateAsync({ id: machine.id, machine: input }) : await create.mutateAsync(input);
      onSaved(saved);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-2xl flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField label="Name" hint="As on the machine's plate in the shop, e.g. Lathe 2." autoComplete="off" error={errors.name?.message} {...register('name')} />
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <SelectField label="Category" error={errors.category?.message} {...register('category')}>
          {machineCategories.map((option) => (
            <option key={option} value={option}>
              {machineCategoryLabels[option]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Area" error={errors.areaId?.message} {...register('areaId')}>
          <option value="">Choose an area</option>
          {areas.map((area) => (
            <option key={area.id} value={area.id}>
              {area.name}
            </option>
          ))}
        </SelectField>
      </div>
      <TextAreaField
        label="Description"
        hint="Capacity, tooling, quirks: what a member should know before walking up to it."
        error={errors.description?.message}
        {...register('description')}
      />
      <div className="flex flex-col gap-2">
        <CheckboxField label="Can be reserved" hint="Members book time on it ahead; otherwise it is walk-up only." {...register('reservable')} />
        <CheckboxField
          label="Requires PIN"
          hint="The station asks for the member's PIN as well as their badge before a session starts."
          {...register('requiresPin')}
        />
      </div>

      <Controller
        control={control}
        name="trainingIds"
        render={({ field }) => (
          <ChoiceGroup
            legend="Required trainings"
            hint={
              trainings.length > 0
                ? 'A member needs a valid sign-off for every training ticked here before the station clears them.'
                : 'There are no trainings yet. Create them under Trainings, then come back to tick them here.'
            }
            error={errors.trainingIds?.message}
          >
            <ul className="flex flex-col gap-1">
              {trainings.map((training, index) => {
                const chosen = field.value ?? [];
                return (
                  <li key={training.id}>
                    <CheckboxField
                      ref={index === 0 ? field.ref : undefined}
                      label={training.name}
                      hint={training.active ? undefined : 'Inactive: no new sign-offs are given for it.'}
                      checked={chosen.includes(training.id)}
                      onBlur={field.onBlur}
                      onChange={(event) =>
                        field.onChange(event.target.checked ? [...chosen, training.id] : chosen.filter((id) => id !== training.id))
                      }
                    />
                  </li>
                );
              })}
            </ul>
          </ChoiceGroup>
        )}
      />

      <Controller
        control={control}
        name="safetyChecklist"
        render={({ field }) => (
          <ChecklistEditor
            legend="Safety checklist"
            hint="What a member confirms at the station before each session: protective equipment and set-up. It reminds; it does not replace in-person training, the shop's rules or local codes."
            items={field.value ?? []}
            onChange={field.onChange}
            {...checklistErrorProps(errors.safetyChecklist)}
            addLabel="Add a safety item"
          />
        )}
      />
      {suggestions.length > 0 && (
        <div className="flex flex-col gap-2 rounded-md border border-neutral-300 bg-white p-3">
          <p className="text-neutral-800">
            Usual items for this kind of machine ({machineCategoryLabels[category]}), to start from and reword: {suggestions.join('; ')}.
          </p>
          <div>
            <Button
              variant="secondary"
              onClick={() =>
                setValue('safetyChecklist', [
                  ...(getValues('safetyChecklist') ?? []),
                  ...suggestions.map((label) => ({ key: newDraftKey(), id: '', label })),
                ])
              }
            >
              Start from the usual items
            </Button>
          </div>
        </div>
      )}

      <FormActions
        submitLabel={machine ? 'Save machine' : 'Create machine'}
        pending={create.isPending || update.isPending}
        onCancel={onCancel}
      />
    </form>
  );
}
