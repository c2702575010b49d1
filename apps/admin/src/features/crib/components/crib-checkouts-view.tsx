import type { CribCheckout } from '@chuckkey/core';
import { useState, type ComponentType } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { TextLink } from '../../../components/ui/text-link';
import { paths } from '../../../config/paths';
import { useFocusedNotice } from '../../../hooks/use-focused-notice';
import { CribCheckoutsForm, type CheckoutMemberSearchProps } from './crib-checkouts-form';
import { CribCheckoutsReturnDialog, conditionLabels } from './crib-checkouts-return-dialog';
import { CribCheckoutsTable } from './crib-checkouts-table';

interface CribCheckoutsViewProps {
  timeZone: string | undefined;
  MemberSearch: ComponentType<CheckoutMemberSearchProps>;
}

/** Lending at the counter, the tools out now with their returns, and the recent history. */
export function CribCheckoutsView({ timeZone, MemberSearch }: CribCheckoutsViewProps) {
  const [returning, setReturning] = useState<CribCheckout | null>(null);
  const [returned, setReturned, returnedRef] = useFocusedNotice<CribCheckout | null>(null);
  const [history, setHistory] = useState(false);

  const outOfCirculation = returned?.returnCondition && returned.returnCondition !== 'good';

  return (
    <div className="flex flex-col gap-6">
      <Panel title="Check out" description="Lend a tool or hand out a consumable to a member at the counter. Consumables are added to the member’s charges.">
        <CribCheckoutsForm timeZone={timeZone} MemberSearch={MemberSearch} />
      </Panel>

      <Panel title="Tools out now" description="Soonest due first. Choose Return when a tool comes back, and say what state it is in.">
        <div className="flex flex-col gap-4">
          {returned && (
            <Alert ref={returnedRef} tabIndex={-1} tone={outOfCirculation ? 'warning' : 'success'} title="Return recorded">
              <p>
                {returned.itemName} is back from {returned.memberName}
                {returned.returnCondition ? `, ${conditionLabels[returned.returnCondition].toLowerCase()}` : ''}.
              </p>
              {outOfCirculation ? (
                <p>
                  It is out of circulation until an admin puts it back.{' '}
                  <TextLink to={paths.cribAttention.getHref()}>See what needs attention</TextLink>
                </p>
              ) : (
                <p>It is back on the shelf, ready to lend.</p>
              )}
            </Alert>
          )}
          <CribCheckoutsTable
            open
            timeZone={timeZone}
            onReturn={(checkout) => {
              setReturned(null);
              setReturning(checkout);
            }}
          />
        </div>
      </Panel>

      <Panel title="Recent history" description="The latest 500 checkouts and takes, returned or not, newest first.">
        <div className="flex flex-col gap-4">
          <div>
            <Button variant="secondary" aria-expanded={history} onClick={() => setHistory((shown) => !shown)}>
              {history ? 'Hide the history' : 'Show the history'}
            </Button>
          </div>
          {history && <CribCheckoutsTable open={false} timeZone={timeZone} />}
        </div>
      </Panel>

      <CribCheckoutsReturnDialog
        checkout={returning}
        onClose={() => setReturning(null)}
        onReturned={(checkout) => {
          setReturning(null);
          setReturned(checkout);
        }}
      />
    </div>
  );
}
