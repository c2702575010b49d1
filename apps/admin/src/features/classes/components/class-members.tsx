import type { ClassMember } from '@chuckkey/core';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { errorMessage } from '../../../lib/api-client';

interface ClassMembersProps {
  members: readonly ClassMember[];
  pending: boolean;
  error: unknown;
  onRemove: (memberId: string) => void;
}

/** Who is booked into the class; each can be taken off again. */
export function ClassMembers({ members, pending, error, onRemove }: ClassMembersProps) {
  const [removing, setRemoving] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-3">
      {error !== null && error !== undefined && <Alert tone="error" title="The members were not changed">{errorMessage(error)}</Alert>}
      {members.length === 0 ? (
        <EmptyState title="Nobody booked yet">Find members below and add them; they then see the class in their reservations.</EmptyState>
      ) : (
        <ul aria-label="Booked members" className="flex flex-col divide-y divide-neutral-200">
          {members.map((member) => {
            const name = `${member.firstName} ${member.lastName}`;
            return (
              <li key={member.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span className="font-bold text-neutral-900">{name}</span>
                <Button
                  variant="secondary"
                  aria-label={`Remove ${name} from the class`}
                  pending={pending && removing === member.id}
                  disabled={pending}
                  onClick={() => {
                    setRemoving(member.id);
                    onRemove(member.id);
                  }}
                >
                  Remove
                </Button>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
