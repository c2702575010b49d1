import type { SignOff, SignOffLevel, Training } from '@chuckkey/core';
import { useId } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';

export function StepHeading({ children, step }: { children: string; step?: string | undefined }) {
  return (
    <div className="flex min-w-0 flex-1 flex-col items-center gap-1 text-center">
      {step ? <p className="text-kiosk-body text-ink-muted">{step}</p> : null}
      <h1 className="text-kiosk-title font-bold text-balance">{children}</h1>
    </div>
  );
}

export function TrainingStep({
  trainings,
  machineId,
  onChoose,
}: {
  trainings: Training[];
  machineId: string | null;
  onChoose: (training: Training) => void;
}) {
  if (trainings.length === 0) {
    return (
      <p role="status" className="text-kiosk-lead text-center">
        There are no active trainings yet. An admin adds them in the web app.
      </p>
    );
  }
  return (
    <ul className="flex w-full max-w-4xl flex-col gap-4">
        {trainings.map((training) => (
          <li key={training.id}>
            <button
              type="button"
              onClick={() => onChoose(training)}
              className="flex min-h-20 w-full items-center justify-between gap-6 rounded-xl border-4 border-ink-muted bg-surface-raised px-6 py-4 text-left hover:border-ink focus-visible:outline-4 focus-visible:outline-offset-4 focus-visible:outline-ink"
            >
              <span className="text-kiosk-lead font-bold">{training.name}</span>
              {machineId && training.machineIds.includes(machineId) ? (
                <span className="shrink-0 text-kiosk-body text-ink-muted">For this machine</span>
              ) : null}
            </button>
          </li>
        ))}
    </ul>
  );
}

export function ChecklistStep({
  training,
  seen,
  onToggle,
  onContinue,
}: {
  training: Training;
  seen: ReadonlySet<string>;
  onToggle: (itemId: string) => void;
  onContinue: () => void;
}) {
  const all = training.checklist.every((item) => seen.has(item.id));
  return (
    <div className="flex w-full max-w-4xl flex-col gap-5">
      <ul className="flex flex-col gap-3">
        {training.checklist.map((item) => {
          const on = seen.has(item.id);
          return (
            <li key={item.id}>
              <label
                className={`flex min-h-18 cursor-pointer items-center gap-6 rounded-xl border-4 px-6 py-3 ${on ? 'border-state-available bg-state-available/25' : 'border-ink-muted bg-surface-raised'}`}
              >
                <input type="checkbox" checked={on} onChange={() => onToggle(item.id)} className="size-10 shrink-0 accent-state-available" />
                <span className="flex-1 text-kiosk-body">{item.label}</span>
                <span className="flex shrink-0 items-center gap-2 text-kiosk-body font-bold" aria-hidden="true">
                  <Icon name={on ? 'check' : 'cross'} className="size-8" />
                  {on ? 'Seen' : 'Not yet'}
                </span>
              </label>
            </li>
          );
        })}
      </ul>
      <div className="flex flex-wrap items-center gap-6">
        <Button onClick={onContinue} disabled={!all}>
          Continue
        </Button>
        <p className="text-kiosk-body text-ink-muted">
          {all ? 'All items seen.' : `${training.checklist.filter((item) => !seen.has(item.id)).length} of ${training.checklist.length} still to tick.`}
        </p>
      </div>
    </div>
  );
}

const levels: { level: SignOffLevel; title: string; detail: string }[] = [
  { level: 'supervised', title: 'Supervised', detail: 'May use the machine only while a supervisor is on duty.' },
  { level: 'independent', title: 'Independent', detail: 'May use the machine on their own, within the shop’s rules.' },
];

export function LevelStep({
  level,
  onChoose,
  onContinue,
}: {
  level: SignOffLevel | null;
  onChoose: (level: SignOffLevel) => void;
  onContinue: () => void;
}) {
  const name = useId();
  return (
    <fieldset className="flex w-full max-w-4xl flex-col gap-5">
      <legend className="sr-only">Level</legend>
      {levels.map((option) => (
        <label
          key={option.level}
          className={`flex min-h-20 cursor-pointer items-center gap-6 rounded-xl border-4 px-6 py-4 ${level === option.level ? 'border-ink bg-brand' : 'border-ink-muted bg-surface-raised'}`}
        >
          <input
            type="radio"
            name={name}
            value={option.level}
            checked={level === option.level}
            onChange={() => onChoose(option.level)}
            className="size-10 shrink-0 accent-ink"
          />
          <span className="flex flex-col">
            <span className="text-kiosk-lead font-bold">{option.title}</span>
            <span className="text-kiosk-body">{option.detail}</span>
          </span>
        </label>
      ))}
      <Button onClick={onContinue} disabled={!level} className="self-start">
        Continue
      </Button>
    </fieldset>
  );
}

export function ConfirmStep({
  memberName,
  training,
  level,
  note,
  onNote,
  onConfirm,
  busy,
  error,
}: {
  memberName: string;
  training: Training;
  level: SignOffLevel;
  note: string;
  onNote: (note: string) => void;
  onConfirm: () => void;
  busy: boolean;
  error: string | null;
}) {
  const noteId = useId();
  return (
    <div className="flex w-full max-w-4xl flex-col gap-5">
      <div className="grid gap-6 landscape:grid-cols-2">
        <dl className="grid grid-cols-[auto_1fr] gap-x-8 gap-y-3 text-kiosk-body">
          <dt className="text-ink-muted">Member</dt>
          <dd className="font-bold">{memberName}</dd>
          <dt className="text-ink-muted">Training</dt>
          <dd className="font-bold">{training.name}</dd>
          <dt className="text-ink-muted">Level</dt>
          <dd className="font-bold">{levels.find((option) => option.level === level)?.title}</dd>
          <dt className="text-ink-muted">Checklist</dt>
          <dd className="font-bold">All {training.checklist.length} items seen</dd>
        </dl>
        <div className="flex flex-col gap-2">
          <label htmlFor={noteId} className="text-kiosk-body font-bold">
            Note (optional)
          </label>
          <textarea
            id={noteId}
            value={note}
            maxLength={1000}
            rows={3}
            onChange={(event) => onNote(event.target.value)}
            className="rounded-lg border-4 border-ink-muted bg-surface-raised px-5 py-3 text-kiosk-body text-ink focus:border-ink focus:outline-none"
          />
        </div>
      </div>
      {error ? (
        <p role="alert" className="flex items-center gap-4 text-kiosk-body font-bold text-link-down">
          <Icon name="warning" className="size-9" />
          {error}
        </p>
      ) : null}
      <Button onClick={onConfirm} disabled={busy} className="self-start">
        <Icon name="check" className="size-10" />
        {busy ? 'Signing off…' : 'Sign off'}
      </Button>
    </div>
  );
}

export function DoneStep({ signOff, memberName, timeZone, onDone }: { signOff: SignOff; memberName: string; timeZone: string; onDone: () => void }) {
  const expiry = signOff.expiresAt
    ? `Valid until ${new Intl.DateTimeFormat('en', { dateStyle: 'long', timeZone }).format(new Date(signOff.expiresAt))}.`
    : 'This training does not lapse.';
  return (
    <div role="status" className="flex max-w-4xl flex-col items-center gap-6 text-center">
      <Icon name="check" className="size-24 text-link-up" />
      <h1 className="text-kiosk-title font-bold text-balance">{memberName} is signed off</h1>
      <p className="text-kiosk-lead text-balance">
        {signOff.trainingName}, {signOff.level === 'independent' ? 'independent' : 'supervised'}. {expiry}
      </p>
      <Button onClick={onDone}>Done</Button>
    </div>
  );
}
