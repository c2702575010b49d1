import { useEffect, useRef, useState } from 'react';

/**
 * The member a form acts for, chosen from a search. Focus follows the choice: to the card of
 * the chosen member, so a screen reader hears who it is, and back to the search box when the
 * choice is cleared to pick someone else.
 */
export function useMemberChoice<M>(onChange: (member: M | null) => void) {
  const [member, setMember] = useState<M | null>(null);
  const chosenRef = useRef<HTMLDivElement>(null);
  const searchRef = useRef<HTMLInputElement>(null);
  const focusAfter = useRef<'chosen' | 'search' | null>(null);

  useEffect(() => {
    if (focusAfter.current === 'chosen') chosenRef.current?.focus();
    if (focusAfter.current === 'search') searchRef.current?.focus();
    focusAfter.current = null;
  }, [member]);

  function choose(next: M | null) {
    focusAfter.current = next === null ? 'search' : 'chosen';
    setMember(next);
    onChange(next);
  }

  /** Starts over after the form is done, leaving focus where the form put it (on its notice of what was done). */
  function forget() {
    setMember(null);
  }

  return { member, choose, forget, chosenRef, searchRef };
}
