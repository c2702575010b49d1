import { daysUntilExpiry, type SignOff } from '@chuckkey/core';
import { Button } from '../../../components/ui/button';
import { formatDate } from '../../../lib/format';
import { validUntilDate } from '../utils/sign-off-dates';
import { SignOffStateBadge } from './sign-off-state-badge';

export function signOffHeadingId(signOff: Pick<SignOff, 'id'>): string {
  return `sign-off-${signOff.id}`;
}

const levelWords: Record<SignOff['level'], string> = {
  supervised: 'Supervised: may use the machines only while a supervisor is on duty',
  independent: 'Independent',
};

function Validity({ signOff, timeZone, now }: { signOff: SignOff; timeZone: string | undefined; now: Date }) {
  if (signOff.state === 'revoked') return null;
  if (!signOff.expiresAt) {
    return (
      <>
        <dt className="text-neutral-700">Valid until</dt>
        <dd>Never lapses</dd>
      </>
    );
  }
  const date = validUntilDate(signOff.expiresAt, timeZone);
  const days = timeZone ? daysUntilExpiry(new Date(signOff.expiresAt), now, timeZone) : null;
  return (
    <>
      <dt className="text-neutral-700">{signOff.state === 'expired' ? 'Lapsed after' : 'Valid until'}</dt>
      <dd className="font-bold">
        {date}
        {signOff.state === 'expiring' && days !== null && (
          <span className="font-normal text-neutral-800"> · {days === 1 ? '1 day left' : `${days} days left`}</span>
        )}
      </dd>
    </>
  );
}

interface SignOffCardProps {
  signOff: SignOff;
  timeZone: string | undefined;
  now: Date;
  onRevoke?: (signOff: SignOff) => void;
}

export function SignOffCard({ signOff, timeZone, now, onRevoke }: SignOffCardProps) {
  const headingId = signOffHeadingId(signOff);
  const seen = signOff.checklist.filter((item) => item.seen).length;
  return (
    <article aria-labelledby={headingId} className="flex flex-col gap-3 rounded-lg border border-neutral-300 bg-white p-4">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <h3 id={headingId} tabIndex={-1} className="text-lg font-bold text-neutral-900">
          {signOff.trainingName}
        </h3>
        <SignOffStateBadge state={signOff.state} />
      </div>
      <dl className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
        <Validity signOff={signOff} timeZone={timeZone} now={now} />
        {signOff.state === 'revoked' && signOff.revokedAt && (
          <>
            <dt className="text-neutral-700">Revoked</dt>
            <dd>
              {formatDate(signOff.revokedAt, timeZone)}
              {signOff.revokeReason && <>: {signOff.revokeReason}</>}
            </dd>
          </>
        )}
        <dt className="text-neutral-700">Level</dt>
        <dd>{levelWords[signOff.level]}</dd>
        <dt className="text-neutral-700">Signed off by</dt>
        <dd>
          {signOff.signedBy.name}, {formatDate(signOff.signedAt, timeZone)}, {signOff.signedVia === 'station' ? 'at a station' : 'in the web app'}
        </dd>
        <dt className="text-neutral-700">Opens</dt>
        <dd>{signOff.machines.length > 0 ? signOff.machines.map((machine) => machine.name).join(', ') : 'No machine asks for it yet'}</dd>
        {signOff.note && (
          <>
            <dt className="text-neutral-700">Note</dt>
            <dd className="whitespace-pre-wrap">{signOff.note}</dd>
          </>
        )}
      </dl>
      {signOff.checklist.length > 0 && (
        <details className="rounded-md border border-neutral-200 bg-neutral-50 px-3">
          <summary className="flex min-h-11 cursor-pointer items-center font-bold text-neutral-900">
            Checklist seen: {seen} of {signOff.checklist.length}
          </summary>
          <ul className="flex flex-col gap-1 pb-3">
            {signOff.checklist.map((item) => (
              <li key={item.id}>
                {item.seen ? 'Seen' : 'Not seen'}: {item.label}
              </li>
            ))}
          </ul>
        </details>
      )}
      {onRevoke && signOff.state !== 'revoked' && (
        <div>
          <Button variant="secondary" onClick={() => onRevoke(signOff)}>
            Revoke sign-off<span className="sr-only"> for {signOff.trainingName}</span>
          </Button>
        </div>
      )}
    </article>
  );
}
