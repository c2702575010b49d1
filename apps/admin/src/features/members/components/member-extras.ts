import type { Member } from '@chuckkey/core';
import type { ReactNode } from 'react';

/**
 * What other parts of the app add to each member in the list (printing their badge card,
 * choosing them for a badge sheet); the page that shows the list supplies them.
 */
export interface MemberExtras {
  selected?: ReadonlySet<string>;
  onSelect?: (members: Member[], selected: boolean) => void;
  /** A table row has room for little; a card on a phone has room for words. */
  rowActions?: (member: Member, place: 'row' | 'card') => ReactNode;
}
