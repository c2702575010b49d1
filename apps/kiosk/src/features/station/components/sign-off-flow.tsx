import type { SignOff, SignOffLevel, Training } from '@chuckkey/core';
import { useEffect, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { isApiError } from '@/lib/api-client';
import { useCreateSignOff } from '../api/create-sign-off';
import { useLookupMember } from '../api/lookup-member';
import { useVerifyInstructor } from '../api/verify-instructor';
import { useIdleReturn } from '@/hooks/use-idle-return';
import { stationMessage } from '../utils/messages';
import { BadgeReader } from './badge-reader';
import { PinPad } from './pin-pad';
import { ChecklistStep, ConfirmStep, DoneStep, LevelStep, StepHeading, TrainingStep } from './sign-off-steps';

export interface ScannedInstructor {
  badge: string;
  id: string;
  firstName: string;
}

interface ScannedMember {
  badge: string;
  firstName: string;
}

type Step = 'pin' | 'member' | 'training' | 'checklist' | 'level' | 'confirm' | 'done';

// The flow holds the instructor's PIN in memory, so a station left mid-way forgets it soon.
const FLOW_IDLE_MS = 120_000;
const DONE_SHOWN_MS = 15_000;

const previous: Partial<Record<Step, Step>> = {
  member: 'pin',
  training: 'member',
  checklist: 'training',
  level: 'checklist',
  confirm: 'level',
};

/**
 * The instructor's badge was scanned; their PIN, the member's badge and the practical checklist
 * follow, and the server checks the badge and PIN again when the sign-off is saved.
 */
export function SignOffFlow({
  instructor,
  machineId,
  timeZone,
  onExit,
}: {
  instructor: ScannedInstructor;
  machineId: string | null;
  timeZone: string;
  onExit: () => void;
}) {
  const [step, setStep] = useState<Step>('pin');
  const [pin, setPin] = useState('');
  const [trainings, setTrainings] = useState<Training[]>([]);
  const [member, setMember] = useState<ScannedMember | null>(null);
  const [training, setTraining] = useState<Training | null>(null);
  const [seen, setSeen] = useState<ReadonlySet<string>>(new Set());
  const [level, setLevel] = useState<SignOffLevel | null>(null);
  const [note, setNote] = useState('');
  const [signOff, setSignOff] = useState<SignOff | null>(null);
  const [message, setMessage] = useState<string | null>(null);

  const verify = useVerifyInstructor();
  const lookup = useLookupMember();
  const create = useCreateSignOff();

  useIdleReturn(FLOW_IDLE_MS, onExit);
  useEffect(() => {
    if (step !== 'done') return;
    const timer = setTimeout(onExit, DONE_SHOWN_MS);
    return () => clearTimeout(timer);
  }, [step, onExit]);

  const go = (next: Step) => {
    setMessage(null);
    setStep(next);
  };

  const submitPin = (typed: string) => {
    setMessage(null);
    verify.mutate(
      { badge: instructor.badge, pin: typed },
      {
        onSuccess: (answer) => {
          setPin(typed);
          setTrainings(answer.trainings);
          go('member');
        },
        onError: (error) => setMessage(stationMessage(error)),
      },
    );
  };

  const scanMember = (badge: string) => {
    setMessage(null);
    lookup.mutate(badge, {
      onSuccess: (answer) => {
        if (!answer.member) {
          setMessage(
            answer.reason === 'member_inactive'
              ? 'This member’s account is not active, so they cannot be signed off. An admin can help.'
              : 'This badge is not known here. Scan it again, or ask an admin for a new card.',
          );
          return;
        }
        if (answer.member.id === instructor.id) {
          setMessage('That is your own badge: nobody signs themselves off. Scan the member’s badge.');
          return;
        }
        setMember({ badge, firstName: answer.member.firstName });
        go('training');
      },
      onError: (error) => setMessage(stationMessage(error)),
    });
  };

  const chooseTraining = (chosen: Training) => {
    setTraining(chosen);
    setSeen(new Set());
    setLevel(null);
    go('checklist');
  };

  const toggle = (itemId: string) =>
    setSeen((current) => {
      const next = new Set(current);
      if (next.has(itemId)) next.delete(itemId);
      else next.add(itemId);
      return next;
    });

  const confirm = () => {
    if (!member || !training || !level) return;
    setMessage(null);
    create.mutate(
      {
        instructorBadge: instructor.badge,
        pin,
        memberBadge: member.badge,
        trainingId: training.id,
        level,
        checklist: [...seen],
        note,
      },
      {
        onSuccess: (saved) => {
          setPin('');
          setSignOff(saved);
          go('done');
        },
        onError: (error) => {
          // A PIN changed or locked since it was typed: start again from the PIN pad.
          if (isApiError(error, 401) || isApiError(error, 429)) {
            setPin('');
            setStep('pin');
          }
          setMessage(stationMessage(error));
        },
      },
    );
  };

  const back = previous[step];
  const headings: Record<Exclude<Step, 'done'>, { title: string; kicker?: string | undefined }> = {
    pin: { kicker: 'Sign off a member', title: `${instructor.firstName}, enter your PIN` },
    member: { kicker: 'Sign off a member', title: 'Scan the member’s badge' },
    training: { kicker: member ? `Signing off ${member.firstName}` : undefined, title: 'Choose the training' },
    checklist: { kicker: training?.name, title: 'Tick each item you saw' },
    level: { kicker: member && training ? `${member.firstName} · ${training.name}` : undefined, title: 'Choose the level' },
    confirm: { title: 'Confirm the sign-off' },
  };

  if (step === 'done') {
    return signOff && member ? <DoneStep signOff={signOff} memberName={member.firstName} timeZone={timeZone} onDone={onExit} /> : null;
  }

  return (
    <div className="flex w-full max-w-5xl flex-col items-center gap-6">
      <div className="flex w-full items-start gap-4">
        <div className="w-40 shrink-0">
          {back ? (
            <Button variant="quiet" onClick={() => go(back)}>
              <Icon name="back" className="size-8" />
              Back
            </Button>
          ) : null}
        </div>
        <StepHeading step={headings[step].kicker}>{headings[step].title}</StepHeading>
        <div className="flex w-40 shrink-0 justify-end">
          <Button variant="quiet" onClick={onExit}>
            <Icon name="cross" className="size-8" />
            Cancel
          </Button>
        </div>
      </div>

      {step === 'pin' ? (
        <PinPad
          label="Your PIN"
          onSubmit={submitPin}
          disabled={verify.isPending}
          aside={
            <>
              <p className="text-kiosk-lead text-balance text-center">Your PIN confirms that the sign-off is yours.</p>
              {message ? <ErrorLine>{message}</ErrorLine> : null}
            </>
          }
        />
      ) : null}

      {step === 'member' ? (
        <BadgeReader prompt="Hold the member’s badge to the camera or scan it" onBadge={scanMember} busy={lookup.isPending} message={message} />
      ) : null}

      {step === 'training' ? <TrainingStep trainings={trainings} machineId={machineId} onChoose={chooseTraining} /> : null}

      {step === 'checklist' && training ? (
        <ChecklistStep training={training} seen={seen} onToggle={toggle} onContinue={() => go('level')} />
      ) : null}

      {step === 'level' ? <LevelStep level={level} onChoose={setLevel} onContinue={() => go('confirm')} /> : null}

      {step === 'confirm' && member && training && level ? (
        <ConfirmStep
          memberName={member.firstName}
          training={training}
          level={level}
          note={note}
          onNote={setNote}
          onConfirm={confirm}
          busy={create.isPending}
          error={message}
        />
      ) : null}
    </div>
  );
}

function ErrorLine({ children }: { children: string }) {
  return (
    <p role="alert" className="flex items-center gap-4 text-kiosk-body font-bold text-link-down">
      <Icon name="warning" className="size-9" />
      {children}
    </p>
  );
}
