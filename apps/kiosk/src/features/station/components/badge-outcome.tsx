import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useIdleReturn } from '../hooks/use-idle-return';

// screens.md: the answer to a badge returns to idle by itself after 20 seconds without a touch.
export const OUTCOME_IDLE_MS = 20_000;

export type BadgeOutcomeProps =
  | { kind: 'member'; firstName: string; onDone: () => void }
  | { kind: 'unknown_badge' | 'member_inactive'; onDone: () => void };

/** The answer to a member's badge at idle, until clearance checks arrive with station check-in. */
export function BadgeOutcome(props: BadgeOutcomeProps) {
  useIdleReturn(OUTCOME_IDLE_MS, props.onDone);

  return (
    <div role="status" className="flex max-w-4xl flex-col items-center gap-8 text-center">
      {props.kind === 'member' ? (
        <>
          <Icon name="person" className="size-20" />
          <h1 className="text-kiosk-title font-bold">Hello, {props.firstName}</h1>
          <p className="text-kiosk-lead text-balance">
            This station does not check clearance yet: that arrives with station check-in. Until then, ask the
            supervisor before you start, and follow the shop’s sign-in rules.
          </p>
        </>
      ) : (
        <>
          <Icon name="cross" className="size-20" />
          <h1 className="text-kiosk-title font-bold">
            {props.kind === 'unknown_badge' ? 'This badge is not known here' : 'This account is not active'}
          </h1>
          <p className="text-kiosk-lead text-balance">
            {props.kind === 'unknown_badge'
              ? 'Try it again. A lost or reissued card no longer works: an admin can print a new one.'
              : 'An admin can help at the desk.'}
          </p>
        </>
      )}
      <Button onClick={props.onDone}>Done</Button>
    </div>
  );
}
