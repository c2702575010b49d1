import type { ChecklistItem, SessionStarted } from '@chuckkey/core';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { isApiError } from '@/lib/api-client';
import { useStartSession } from '../api/start-session';
import { useIdleReturn } from '@/hooks/use-idle-return';
import { machineCautions, machineKind } from '../utils/cautions';
import { isUnreachable } from '../utils/end-queue';
import { stationMessage } from '../utils/messages';
import { PinPad } from './pin-pad';

// The member's badge (and PIN) are held in memory here: a station left mid-way forgets them.
const SAFETY_IDLE_MS = 90_000;

function startMessage(error: unknown): string {
  // Fail closed: without the server's answer there is no session, and the screen says so.
  if (isUnreachable(error)) return 'Could not reach the server; the session did not start.';
  if (isApiError(error, 409) && error.code === 'machine_in_use') return 'Someone else started on this machine a moment ago; the session did not start.';
  return stationMessage(error);
}

export function SafetyCheck({
  badge,
  firstName,
  category,
  checklist,
  requiresPin,
  onStarted,
  onRefused,
  onCancel,
}: {
  badge: string;
  firstName: string;
  category: string;
  checklist: ChecklistItem[];
  requiresPin: boolean;
  onStarted: (session: SessionStarted) => void;
  /** The server no longer clears the member (a tag-out, the shop closing, a supervisor leaving). */
  onRefused: () => void;
  onCancel: () => void;
}) {
  useIdleReturn(SAFETY_IDLE_MS, onCancel);
  const [pin, setPin] = useState<string | null>(requiresPin ? null : '');
  const [on, setOn] = useState<ReadonlySet<string>>(new Set());
  const [message, setMessage] = useState<string | null>(null);
  const start = useStartSession();
  const all = checklist.every((item) => on.has(item.id));

  const toggle = (id: string) =>
    setOn((current) => {
      const next = new Set(current);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  const submit = () => {
    setMessage(null);
    start.mutate(
      { badge, checklist: checklist.map((item) => item.id), ...(pin ? { pin } : {}) },
      {
        onSuccess: onStarted,
        onError: (error) => {
          if (isApiError(error, 409) && error.code === 'not_cleared') {
            onRefused();
            return;
          }
          if (isApiError(error, 401) && error.code === 'wrong_pin') setPin(null);
          setMessage(startMessage(error));
        },
      },
    );
  };

  const header = (
    <div className="flex w-full items-start justify-between gap-4">
      <div className="flex flex-col gap-1">
        <p className="text-kiosk-body text-ink-muted">{firstName}</p>
        <h1 className="text-kiosk-title font-bold">{pin === null ? 'Enter your PIN' : 'Safety check'}</h1>
      </div>
      <Button variant="quiet" onClick={onCancel}>
        <Icon name="cross" className="size-8" />
        Cancel
      </Button>
    </div>
  );

  const error = message ? (
    <p role="alert" className="flex items-center gap-4 text-kiosk-body font-bold text-link-down">
      <Icon name="warning" className="size-9" />
      {message}
    </p>
  ) : null;

  if (pin === null) {
    return (
      <div className="flex w-full max-w-5xl flex-col items-center gap-6">
        {header}
        <PinPad
          label="Your PIN"
          onSubmit={(typed) => {
            setMessage(null);
            setPin(typed);
          }}
          aside={
            <>
              <p className="text-kiosk-lead text-balance text-center">This machine asks for your PIN before it starts.</p>
              {error}
            </>
          }
        />
      </div>
    );
  }

  return (
    <div className="flex w-full max-w-6xl flex-col gap-5">
      {header}
      <div className="grid gap-5 landscape:grid-cols-[3fr_2fr]">
        <ul className="flex flex-col gap-3" aria-label="This machine’s safety checklist">
          {checklist.map((item) => {
            const checked = on.has(item.id);
            return (
              <li key={item.id}>
                <button
                  type="button"
                  role="switch"
                  aria-checked={checked}
                  onClick={() => toggle(item.id)}
                  className={`flex min-h-20 w-full items-center gap-5 rounded-xl border-4 px-5 py-3 text-left focus-visible:outline-4 focus-visible:outline-offset-4 focus-visible:outline-ink ${checked ? 'border-state-available bg-state-available/25' : 'border-ink-muted bg-surface-raised'}`}
                >
                  <span className="flex-1 text-kiosk-body">{item.label}</span>
                  <span className="flex shrink-0 items-center gap-2 text-kiosk-body font-bold" aria-hidden="true">
                    <Icon name={checked ? 'check' : 'cross'} className="size-9" />
                    {checked ? 'On' : 'Off'}
                  </span>
                </button>
              </li>
            );
          })}
        </ul>
        <section aria-labelledby="cautions-heading" className="flex flex-col gap-3 rounded-xl border-4 border-link-down px-5 py-4">
          <h2 id="cautions-heading" className="flex items-center gap-3 text-kiosk-body font-bold">
            <Icon name="warning" className="size-9 text-link-down" />
            {machineKind(category) === 'welding' ? 'Before you weld' : 'Before you start the machine'}
          </h2>
          <ul className="flex list-disc flex-col gap-2 pl-8 text-kiosk-body">
            {machineCautions(category).map((caution) => (
              <li key={caution}>{caution}</li>
            ))}
          </ul>
          <p className="text-kiosk-body font-bold">These are the usual cautions only: the shop’s rules and local codes come first.</p>
        </section>
      </div>
      <div className="flex flex-col items-center gap-3">
        {error}
        {!all ? <p className="text-kiosk-body">Turn on every item to start.</p> : null}
        <Button onClick={submit} disabled={!all || start.isPending} className="min-h-24 px-16">
          {start.isPending ? 'Starting…' : 'Start session'}
        </Button>
      </div>
    </div>
  );
}
