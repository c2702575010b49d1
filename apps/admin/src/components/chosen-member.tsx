import type { ReactNode, Ref } from 'react';
import { Button } from './ui/button';
import { FieldError } from './ui/field';

interface ChosenMemberProps {
  member: { name: string; email: string };
  /** What the form does for them: "Signing off", "Checking out to". */
  caption: string;
  /** Takes focus once the member is chosen, so a screen reader hears who it is. */
  cardRef: Ref<HTMLDivElement>;
  error: string | undefined;
  errorId: string;
  onChange: () => void;
  /** Shown beside the words, such as the member's photo. */
  picture?: ReactNode;
  /** A line under the e-mail address. */
  note?: string;
}

/** The member a form acts for, once chosen, with the way to choose someone else. */
export function ChosenMember({ member, caption, cardRef, error, errorId, onChange, picture, note }: ChosenMemberProps) {
  return (
    <div className="flex flex-col gap-2">
      <div ref={cardRef} tabIndex={-1} className="flex items-start gap-3 rounded-lg border-2 border-brand bg-brand-soft p-3">
        {picture}
        <div className="flex min-w-0 flex-1 flex-col gap-1">
          <p className="text-sm text-neutral-700">{caption}</p>
          <p className="text-lg font-bold break-words text-neutral-900">{member.name}</p>
          <p className="break-all text-neutral-800">{member.email}</p>
          {note && <p className="text-sm text-neutral-700">{note}</p>}
        </div>
      </div>
      {error && <FieldError id={errorId}>{error}</FieldError>}
      <div>
        <Button variant="secondary" onClick={onChange}>
          Change member
        </Button>
      </div>
    </div>
  );
}
