import type { Member } from '@chuckkey/core';
import type { ReactNode } from 'react';

/**
 * What other parts of the app add to each member in the list (printing their badge card,
 * choosing them for a badge sheet); the page that shows the list supplies them.
 */
export interface MemberExtras {
  selected?: ReadonlySet<string>;
  onSelect?: (members: Member[], selected: boolean) => void;
  rowActions?: (member: Member) => ReactNode;
}
