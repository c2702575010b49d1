import type { TeachMember } from '@chuckkey/core';
import type { Ref } from 'react';
import { CandidateSearch } from './candidate-search';

interface CandidateChoiceProps {
  label: string;
  onChoose: (member: TeachMember) => void;
  /** Why a found member cannot be chosen here, shown in place of the button; null when they can. */
  whyNot: (member: TeachMember) => string | null;
  error?: string | undefined;
  inputRef?: Ref<HTMLInputElement>;
}

/** The member search of a form that acts for one member: each match is a button, or says why it is not. */
export function CandidateChoice({ label, onChoose, whyNot, error, inputRef }: CandidateChoiceProps) {
  return (
    <CandidateSearch
      label={label}
      inputRef={inputRef}
      error={error}
      renderResult={(candidate) => {
        const why = whyNot(candidate);
        if (why) {
          return (
            <div className="flex flex-col px-4 py-3">
              <span className="font-bold text-neutral-900">{candidate.name}</span>
              <span className="break-all text-neutral-800">{candidate.email}</span>
              <span className="text-sm text-neutral-700">{why}</span>
            </div>
          );
        }
        return (
          <button type="button" onClick={() => onChoose(candidate)} className="flex min-h-11 w-full flex-col items-start px-4 py-3 text-left hover:bg-brand-soft">
            <span className="font-bold text-brand underline underline-offset-4">Choose {candidate.name}</span>
            <span className="break-all text-neutral-800">{candidate.email}</span>
          </button>
        );
      }}
    />
  );
}
