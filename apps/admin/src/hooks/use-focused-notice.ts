import { useEffect, useRef, useState } from 'react';

/**
 * What a form just did, for the notice that says so. The notice takes focus when it appears,
 * so keyboard and screen reader users land on the result instead of a form that went blank.
 */
export function useFocusedNotice<T>(initial: T) {
  const [notice, setNotice] = useState<T>(initial);
  const noticeRef = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (notice) noticeRef.current?.focus();
  }, [notice]);

  return [notice, setNotice, noticeRef] as const;
}
