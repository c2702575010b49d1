import type { TeachMember } from '@chuckkey/core';
import { useState, type ReactNode, type Ref } from 'react';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TextField } from '../../../components/ui/text-field';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';
import { CANDIDATE_SEARCH_MIN, useCandidateSearch } from '../api/search-candidates';

interface CandidateSearchProps {
  label: string;
  /** What each found member offers: choose them for a sign-off, open their record. */
  renderResult: (member: TeachMember) => ReactNode;
  error?: string | undefined;
  inputRef?: Ref<HTMLInputElement>;
}

/** A search box and the members it finds as a plain list: every result reachable by Tab. */
export function CandidateSearch({ label, renderResult, error, inputRef }: CandidateSearchProps) {
  const [text, setText] = useState('');
  const search = useDebouncedValue(text.trim(), 300);
  const found = useCandidateSearch(search);
  const searching = search.length >= CANDIDATE_SEARCH_MIN;

  let results: ReactNode = null;
  if (searching) {
    if (found.isPending) results = <Spinner label="Searching…" />;
    else if (found.isError)
      results = <QueryError error={found.error} what="the members" onRetry={() => void found.refetch()} retrying={found.isFetching} />;
    else
      results = (
        <>
          <p role="status" className="text-sm text-neutral-700">
            {found.data.length === 0
              ? `Nobody matches “${search}”. Try part of the first or last name, or the e-mail address.`
              : found.data.length === 1
                ? '1 member found.'
                : `${found.data.length} members found.`}
          </p>
          {found.data.length > 0 && (
            <ul aria-label={`Members matching ${search}`} className="flex flex-col divide-y divide-neutral-200 rounded-lg border border-neutral-300 bg-white">
              {found.data.map((member) => (
                <li key={member.id}>{renderResult(member)}</li>
              ))}
            </ul>
          )}
        </>
      );
  }

  return (
    <div className="flex flex-col gap-3">
      <TextField
        ref={inputRef}
        label={label}
        hint={`Type at least ${CANDIDATE_SEARCH_MIN} letters of their name or e-mail address.`}
        type="search"
        autoComplete="off"
        spellCheck={false}
        value={text}
        error={error}
        onChange={(event) => setText(event.target.value)}
      />
      {results}
    </div>
  );
}
