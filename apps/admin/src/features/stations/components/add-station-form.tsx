import { stationCreateSchema, type Station, type StationCreate } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup, RadioOption } from '../../../components/ui/choice-group';
import { DialogActions } from '../../../components/ui/form-actions';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextLink } from '../../../components/ui/text-link';
import { paths } from '../../../config/paths';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { machineChoices } from '../utils/machine-choices';

type FormInput = z.input<typeof stationCreateSchema>;

const fields = ['kind', 'machineId', 'name'] as const;

const errorOptions = {
  codeFields: { machine_not_found: 'machineId' as const },
  messages: { machine_not_found: 'That machine is no longer in the shop’s records. Choose another.' },
};

const kindMeanings = {
  machine: 'A tablet or small PC at one machine. Members scan their badge there to start on it.',
  crib: 'At the tool crib, to check tools and gauges out and back in.',
  board: 'A screen on the wall that shows every machine’s state. Nobody touches it.',
};

const nameHints = {
  crib: 'Optional. Tells crib stations apart, for example “Crib counter”.',
  board: 'Optional. Tells boards apart, for example “Board by the welding bay”.',
};

interface AddStationFormProps {
  machines: readonly { id: string; name: string }[];
  stations: readonly Station[];
  pending: boolean;
  onCreate: (input: StationCreate) => Promise<void>;
  onCancel: () => void;
}

export function AddStationForm({ machines, stations, pending, onCreate, onCancel }: AddStationFormProps) {
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormInput, unknown, StationCreate>({
    resolver: zodResolver(stationCreateSchema),
    defaultValues: { kind: 'machine', machineId: undefined, name: '' },
  });
  const { formError, setFormError, showServerError } = useServerErrors(setError, fields, errorOptions);
  const kind = useWatch({ control, name: 'kind' }) ?? 'machine';
  const choices = machineChoices(machines, stations);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    // Only what the chosen kind uses goes out: a machine station takes its machine's name.
    const input: StationCreate =
      values.kind === 'crib' || values.kind === 'board' ? { kind: values.kind, name: values.name } : { machineId: values.machineId };
    try {
      await onCreate(input);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Add a station" className="flex flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      <ChoiceGroup legend="What the device is for" error={errors.kind?.message}>
        <RadioOption label="Machine station" description={kindMeanings.machine} value="machine" {...register('kind')} />
        <RadioOption label="Crib station" description={kindMeanings.crib} value="crib" {...register('kind')} />
        <RadioOption label="Wall board" description={kindMeanings.board} value="board" {...register('kind')} />
      </ChoiceGroup>

      {kind === 'machine' ? (
        choices.length > 0 ? (
          <SelectField
            label="Machine"
            hint="A machine marked “has a station” already has one; to replace its device, give that station a new pairing code instead."
            error={errors.machineId?.message}
            {...register('machineId', { setValueAs: (value: string) => value || undefined })}
          >
            <option value="">Choose a machine</option>
            {choices.map((choice) => (
              <option key={choice.id} value={choice.id}>
                {choice.label}
              </option>
            ))}
          </SelectField>
        ) : (
          <Alert tone="info" title="No machines yet">
            Add the machine first under <TextLink to={paths.setupMachineNew.getHref()}>Setup, Machines</TextLink>, then come back to give it a
            station.
          </Alert>
        )
      ) : (
        <TextField label="Name (optional)" hint={nameHints[kind]} autoComplete="off" error={errors.name?.message} {...register('name')} />
      )}

      <DialogActions pending={pending} onCancel={onCancel}>
        <Button type="submit" pending={pending} disabled={kind === 'machine' && choices.length === 0}>
          Add station
        </Button>
      </DialogActions>
    </form>
  );
}
