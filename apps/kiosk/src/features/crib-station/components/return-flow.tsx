import { CRIB_DAMAGE_NOTE_HINT, type CribCondition, type CribStationItem } from '@chuckkey/core';
import { useId, useState, type FormEvent, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { FormActions } from '@/components/ui/form-actions';
import { Icon, type IconName } from '@/components/ui/icon';
import { useFocusOnMount } from '@/hooks/use-focus-on-mount';
import { useLookupCribTag } from '../api/lookup-crib-tag';
import { useReturnCribTool } from '../api/return-crib-tool';
import { cribMessage, NOT_CHECKED_OUT } from '../utils/crib-messages';
import { outToLine } from '../utils/due-text';
import { IdleTimer } from './idle-timer';
import type { CribScanners } from './scanners';
import { TagReader } from './tag-reader';

// As long as a machine's safety check: a member checks the tool over before choosing its condition.
export const RETURN_IDLE_MS = 90_000;

const conditions: { value: CribCondition; label: string; detail: string; icon: IconName }[] = [
  { value: 'good', label: 'Good', detail: 'Clean, complete and working', icon: 'check' },
  { value: 'needs_attention', label: 'Needs attention', detail: 'Dull, dirty, out of calibration or missing a part', icon: 'wrench' },
  { value: 'damaged', label: 'Damaged', detail: 'Bent, cracked or broken', icon: 'warning' },
];

type Step =
  | { name: 'scan' }
  | { name: 'condition'; item: CribStationItem & { openCheckout: NonNullable<CribStationItem['openCheckout']> } }
  | { name: 'returned'; itemName: string; condition: CribCondition };

/** Return items: no badge needed. Scan a tag, say how the tool is, return it; then the next tag. */
export function ReturnFlow({ timeZone, Camera, onDone }: { timeZone: string; Camera: CribScanners['Camera']; onDone: () => void }) {
  const [step, setStep] = useState<Step>({ name: 'scan' });
  const [message, setMessage] = useState<string | null>(null);
  const [scans, setScans] = useState(0);
  const lookup = useLookupCribTag();

  const onTag = (tag: string) => {
    setScans((count) => count + 1);
    setMessage(null);
    lookup.mutate(tag, {
      onSuccess: ({ item }) => {
        const open = item.openCheckout;
        if (!open) {
          setMessage(`${item.name}: ${NOT_CHECKED_OUT}`);
          return;
        }
        setStep({ name: 'condition', item: { ...item, openCheckout: open } });
      },
      onError: (error) => setMessage(cribMessage(error)),
    });
  };

  const scanner = (prompt: string) => (
    <>
      <TagReader prompt={prompt} onTag={onTag} busy={lookup.isPending} Camera={Camera} />
      <p role="status" aria-live="polite" className="min-h-touch text-center text-kiosk-body font-bold text-link-down">
        {message ?? ''}
      </p>
    </>
  );

  return (
    <div className="flex w-full max-w-4xl flex-col items-center gap-6">
      <IdleTimer key={scans} ms={RETURN_IDLE_MS} onIdle={onDone} />
      {step.name === 'scan' ? (
        <>
          <ScreenHeading>Return items</ScreenHeading>
          {scanner('Scan the tag of the tool you bring back')}
          <Button variant="quiet" onClick={onDone}>
            Done
          </Button>
        </>
      ) : null}
      {step.name === 'condition' ? (
        <ConditionStep
          item={step.item}
          timeZone={timeZone}
          onReturned={(condition) => setStep({ name: 'returned', itemName: step.item.name, condition })}
          onCancel={() => setStep({ name: 'scan' })}
        />
      ) : null}
      {step.name === 'returned' ? (
        <>
          <div role="status" className="flex flex-col items-center gap-3 text-center">
            <Icon name="check" className="size-20 text-link-up" />
            <ScreenHeading>{step.itemName} is back. Thank you.</ScreenHeading>
            {step.condition === 'good' ? (
              <p className="text-kiosk-lead">Put it back in its bin.</p>
            ) : (
              <p className="text-kiosk-lead text-balance">It stays off the shelf until an admin has looked at it. Leave it on the crib counter.</p>
            )}
          </div>
          {scanner('Scan the next tool’s tag')}
          <Button onClick={onDone}>Done</Button>
        </>
      ) : null}
    </div>
  );
}

/** Each step's heading takes the focus as the step appears. */
function ScreenHeading({ children }: { children: ReactNode }) {
  const ref = useFocusOnMount<HTMLHeadingElement>();
  return (
    <h1 ref={ref} tabIndex={-1} className="text-kiosk-title font-bold focus:outline-none">
      {children}
    </h1>
  );
}

function ConditionStep({
  item,
  timeZone,
  onReturned,
  onCancel,
}: {
  item: CribStationItem & { openCheckout: NonNullable<CribStationItem['openCheckout']> };
  timeZone: string;
  onReturned: (condition: CribCondition) => void;
  onCancel: () => void;
}) {
  const id = useId();
  const [condition, setCondition] = useState<CribCondition | null>(null);
  const [note, setNote] = useState('');
  const returning = useReturnCribTool();
  const noteNeeded = condition === 'damaged' && note.trim() === '';

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!condition || noteNeeded) return;
    returning.mutate({ tag: item.assetTag, condition, note: note.trim() || null }, { onSuccess: () => onReturned(condition) });
  };

  return (
    <form onSubmit={submit} className="flex w-full flex-col gap-6" noValidate>
      <div className="flex flex-col gap-1">
        <ScreenHeading>{item.name}</ScreenHeading>
        <p className="text-kiosk-lead">
          {item.assetTag} · {outToLine(item.openCheckout.memberFirstName, item.openCheckout.dueAt, new Date(), timeZone)}
        </p>
      </div>
      <fieldset className="flex flex-col gap-4">
        <legend className="mb-4 text-kiosk-lead font-bold">How is it?</legend>
        <div className="grid gap-4 md:grid-cols-3">
          {conditions.map((choice) => (
            <label
              key={choice.value}
              className={`flex min-h-32 cursor-pointer flex-col items-center justify-center gap-2 rounded-xl border-4 px-5 py-4 text-center has-[:focus-visible]:outline-4 has-[:focus-visible]:outline-offset-4 has-[:focus-visible]:outline-ink ${
                condition === choice.value ? 'border-ink bg-brand text-white' : 'border-ink-muted'
              }`}
            >
              <input type="radio" name={`${id}-condition`} value={choice.value} checked={condition === choice.value} onChange={() => setCondition(choice.value)} className="sr-only" />
              <Icon name={choice.icon} className="size-12" />
              <span className="text-kiosk-lead font-bold">{choice.label}</span>
              <span className="text-kiosk-body">{choice.detail}</span>
            </label>
          ))}
        </div>
      </fieldset>
      <div className="flex flex-col gap-2">
        <label htmlFor={`${id}-note`} className="text-kiosk-body font-bold">
          Note{condition === 'damaged' ? ' (required)' : ''}
        </label>
        <p id={`${id}-hint`} className="text-kiosk-body text-ink-muted">
          {condition === 'damaged' ? CRIB_DAMAGE_NOTE_HINT : 'Anything an admin or the next person should know.'}
        </p>
        <textarea
          id={`${id}-note`}
          value={note}
          onChange={(event) => setNote(event.target.value)}
          rows={3}
          maxLength={1000}
          aria-describedby={`${id}-hint`}
          aria-required={condition === 'damaged' ? true : undefined}
          className="w-full rounded-lg border-4 border-ink-muted bg-surface-raised px-5 py-3 text-kiosk-body text-ink focus:border-ink focus:outline-none"
        />
      </div>
      {returning.error ? (
        <p role="alert" className="flex items-center gap-4 text-kiosk-body font-bold text-link-down">
          <Icon name="warning" className="size-9" />
          {cribMessage(returning.error)}
        </p>
      ) : null}
      <FormActions submit={returning.isPending ? 'Returning…' : 'Return'} cancel="Cancel" onCancel={onCancel} disabled={!condition || noteNeeded || returning.isPending} />
    </form>
  );
}
