import { useEffect, useRef, useState } from 'react';
import { TextField } from '../../../components/ui/text-field';
import { useDebouncedValue } from '../hooks/use-debounced-value';

interface MemberSearchProps {
  value: string;
  onSearch: (search: string) => void;
}

/** Asks the server only once typing pauses, not on every key. */
export function MemberSearch({ value, onSearch }: MemberSearchProps) {
  const [text, setText] = useState(value);
  const debounced = useDebouncedValue(text, 300);
  const sent = useRef(value);

  useEffect(() => {
    const search = debounced.trim();
    if (search === sent.current) return;
    sent.current = search;
    onSearch(search);
  }, [debounced, onSearch]);

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
