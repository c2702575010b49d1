import { useEffect, useRef } from 'react';
import { useLocation } from 'react-router-dom';
import { Alert } from '../../components/ui/alert';

export interface SavedState {
  saved?: string;
}

/**
 * After a form saves and the page goes back to its list, says what was saved there, and moves
 * focus to the message so that keyboard and screen-reader users hear it and carry on from it.
 */
export function SavedNotice() {
  const location = useLocation();
  const saved = (location.state as SavedState | null)?.saved;
  const ref = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (saved) ref.current?.focus();
  }, [saved, location.key]);

  if (!saved) return null;
  return (
    <Alert ref={ref} tabIndex={-1} tone="success">
      {saved}
    </Alert>
  );
}
