import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { paths } from '../../../config/paths';
import { nameCollator } from '../../../lib/table-sort';
import { useMachines } from '../../machines/api/get-machines';

/** The way to any machine's maintenance page, for a machine with no tasks yet as much as one with many. */
export function MaintenanceMachinePicker() {
  const machines = useMachines();
  const navigate = useNavigate();
  const [machineId, setMachineId] = useState('');
  const sorted = [...(machines.data ?? [])].sort((a, b) => nameCollator.compare(a.name, b.name));

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (machineId) void navigate(paths.upkeepMachine.getHref(machineId));
  };

  return (
    <form onSubmit={onSubmit} aria-label="Open a machine's maintenance" className="flex flex-col gap-3 sm:flex-row sm:items-end">
      <SelectField label="Machine" hint="Its tasks, history and marking work done" value={machineId} onChange={(event) => setMachineId(event.target.value)} disabled={machines.isPending}>
        <option value="">Choose a machine</option>
        {sorted.map((machine) => (
          <option key={machine.id} value={machine.id}>
            {machine.name}
          </option>
        ))}
      </SelectField>
      <Button type="submit" variant="secondary" disabled={!machineId}>
        Open
      </Button>
    </form>
  );
}
