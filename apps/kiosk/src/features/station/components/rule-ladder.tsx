import type { ClearanceRung } from '@chuckkey/core';
import { Icon } from '@/components/ui/icon';
import { orderRungs } from '../utils/ladder';

/** Every rule the shop applies, failing rungs first with their next step; tick or cross and a word, never colour alone. */
export function RuleLadder({ rungs }: { rungs: ClearanceRung[] }) {
  return (
    <ol aria-label="The shop’s rules" className="grid w-full gap-3 landscape:grid-cols-2">
      {orderRungs(rungs).map((rung) => (
        <li
          key={rung.rule}
          className={`flex gap-4 rounded-xl border-4 px-5 py-3 ${rung.passed ? 'border-ink-muted/40' : 'border-link-down landscape:col-span-2'}`}
        >
          <Icon name={rung.passed ? 'check' : 'cross'} className={`size-10 ${rung.passed ? '' : 'text-link-down'}`} />
          <div className="flex min-w-0 flex-col gap-1">
            <p className="text-kiosk-body font-bold">
              <span className="sr-only">{rung.passed ? 'Met: ' : 'Not met: '}</span>
              {rung.title}
              <span aria-hidden="true" className="ml-3 text-ink-muted">
                {rung.passed ? '· Met' : '· Not met'}
              </span>
            </p>
            {rung.reasons.map((reason) => (
              <div key={reason.code + reason.message} className="text-kiosk-body">
                <p>{reason.message}</p>
                <p className="font-bold">Next: {reason.nextStep}</p>
              </div>
            ))}
          </div>
        </li>
      ))}
    </ol>
  );
}
