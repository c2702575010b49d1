import { useEffect, useRef, useState } from 'react';
import { TextField } from '../../../components/ui/text-field';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';

interface MemberSearchProps {
  value: string;
  onSearch: (search: string) => void;
}

/** Asks the server only once typing pauses, not on every key. */
export function MemberSearch({ value, onSearch }: MemberSearchProps) {
  const [text, setText] = useState(value);
  const debounced = useDebouncedValue(text, 300);
  const sent = useRef(value);
  const [shown, setShown] = useState(value);

  // The back button can change the search in the URL; the box follows unless it is what was typed.
  if (value !== shown) {
    setShown(value);
    if (value !== debounced.trim()) setText(value);
  }

  useEffect(() => {
    const search = debounced.trim();
    if (search === sent.current) return;
    sent.current = search;
    if (search !== value) onSearch(search);
  }, [debounced, onSearch, value]);

  return (
    <TextField
      label="Search people"
      hint="Part of a name or an e-mail address."
      type="search"
      autoComplete="off"
      spellCheck={false}
      value={text}
      onChange={(event) => setText(event.target.value)}
      containerClassName="flex flex-1 flex-col gap-1.5"
    />
  );
}
