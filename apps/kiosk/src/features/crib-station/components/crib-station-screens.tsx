import type { CribCheckout, CribStationOut } from '@chuckkey/core';
import { useCallback, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useLookupCribMember } from '../api/lookup-crib-member';
import type { BasketLine } from '../utils/basket';
import { cribMessage } from '../utils/crib-messages';
import { BasketScreen } from './basket-screen';
import { CribCaution } from './crib-caution';
import { CribHeader } from './crib-header';
import { ReceiptScreen } from './receipt-screen';
import { ReturnFlow } from './return-flow';
import type { CribScanners } from './scanners';

type Screen =
  | { name: 'idle' }
  | { name: 'basket'; member: { firstName: string; badge: string }; out: CribStationOut[] }
  | { name: 'receipt'; firstName: string; checkouts: CribCheckout[]; lines: BasketLine[] }
  | { name: 'return' };

const reasonWords = {
  unknown_badge: 'This badge is not known here. Try it again, or ask an admin for a new card.',
  member_inactive: 'This member’s account is not active. An admin can help at the desk.',
} as const;

/** A station paired to the crib: idle with the badge reader and "Return items", then the basket or a return. */
export function CribStationScreens({ timeZone, scanners }: { timeZone: string; scanners: CribScanners }) {
  const [screen, setScreen] = useState<Screen>({ name: 'idle' });
  const [message, setMessage] = useState<string | null>(null);
  const member = useLookupCribMember();
  const { BadgeReader, Camera } = scanners;

  const toIdle = useCallback(() => setScreen({ name: 'idle' }), []);

  const onBadge = (badge: string) => {
    setMessage(null);
    member.mutate(badge, {
      onSuccess: (answer) => {
        if (!answer.member) {
          setMessage(reasonWords[answer.reason]);
          return;
        }
        setScreen({ name: 'basket', member: { firstName: answer.member.firstName, badge }, out: answer.out });
      },
      onError: (error) => setMessage(cribMessage(error)),
    });
  };

  return (
    <>
      <CribHeader compact={screen.name !== 'idle'} />
      <main className="flex flex-1 flex-col items-center justify-center gap-6 px-6 py-6">
        {screen.name === 'idle' ? (
          <>
            <BadgeReader prompt="Hold your badge to the camera or scan it" onBadge={onBadge} busy={member.isPending} message={message} />
            <Button className="min-h-24 w-full max-w-xl text-kiosk-title" onClick={() => setScreen({ name: 'return' })}>
              <Icon name="back" className="size-12" />
              Return items
            </Button>
            <CribCaution />
          </>
        ) : null}
        {screen.name === 'basket' ? (
          <BasketScreen
            member={screen.member}
            out={screen.out}
            timeZone={timeZone}
            Camera={Camera}
            onCheckedOut={(checkouts, lines) => setScreen({ name: 'receipt', firstName: screen.member.firstName, checkouts, lines })}
            onCancel={toIdle}
          />
        ) : null}
        {screen.name === 'receipt' ? (
          <ReceiptScreen firstName={screen.firstName} checkouts={screen.checkouts} lines={screen.lines} timeZone={timeZone} onDone={toIdle} />
        ) : null}
        {screen.name === 'return' ? <ReturnFlow timeZone={timeZone} Camera={Camera} onDone={toIdle} /> : null}
      </main>
    </>
  );
}
