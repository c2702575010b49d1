import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { cn } from '../../../components/ui/cn';
import { TextField } from '../../../components/ui/text-field';
import { matchingPreset, presetRange, rangePresetLabels, rangePresets, rangeProblem, type DateRange } from '../utils/date-range';

interface RangePickerProps {
  range: DateRange;
  /** Today on the shop's calendar, where every preset ends. */
  today: string;
  onChange: (range: DateRange) => void;
}

/** A preset in one press, or any two dates of the shop's calendar, checked before the report is asked for. */
export function RangePicker({ range, today, onChange }: RangePickerProps) {
  const [draft, setDraft] = useState(range);
  const [shown, setShown] = useState(range);
  const [problem, setProblem] = useState<ReturnType<typeof rangeProblem>>();
  // A range chosen elsewhere (a preset, the address) replaces what was typed.
  if (shown.from !== range.from || shown.to !== range.to) {
    setShown(range);
    setDraft(range);
    setProblem(undefined);
  }
  const chosen = matchingPreset(range, today);

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const found = rangeProblem(draft);
    setProblem(found);
    if (!found) onChange(draft);
  }

  return (
    <div role="search" aria-label="Choose the days" className="flex flex-col gap-3 rounded-lg border border-neutral-300 bg-white p-4">
      <div role="group" aria-label="Quick ranges" className="flex flex-wrap gap-2">
        {rangePresets.map((preset) => (
          <Button
            key={preset}
            variant="secondary"
            aria-pressed={chosen === preset}
            className={cn(chosen === preset && 'border-brand bg-brand-soft text-brand')}
            onClick={() => onChange(presetRange(preset, today))}
          >
            {rangePresetLabels[preset]}
          </Button>
        ))}
      </div>
      <form noValidate onSubmit={submit} className="flex flex-col gap-3 sm:flex-row sm:flex-wrap sm:items-start">
        <TextField
          label="From"
          type="date"
          value={draft.from}
          max={today}
          error={problem?.field === 'from' ? problem.message : undefined}
          onChange={(event) => setDraft((current) => ({ ...current, from: event.target.value }))}
        />
        <TextField
          label="To"
          type="date"
          value={draft.to}
          error={problem?.field === 'to' ? problem.message : undefined}
          onChange={(event) => setDraft((current) => ({ ...current, to: event.target.value }))}
        />
        <Button type="submit" className="sm:mt-8">
          Show these days
        </Button>
      </form>
    </div>
  );
}
