import { boardStateIcons, lineIconSvg } from '@chuckkey/core';
import type { ReactNode } from 'react';

export type IconName =
  | 'badge'
  | 'keyboard'
  | 'camera-off'
  | 'check'
  | 'cross'
  | 'warning'
  | 'person'
  | 'wrench'
  | 'back'
  | 'link'
  | 'hourglass'
  | 'chuck'
  | 'padlock'
  | 'unplugged';

const shapes: Record<IconName, ReactNode> = {
  badge: (
    <>
      <rect x="3" y="5" width="18" height="14" rx="2" />
      <path d="M7 9h4M7 12.5h3M14 9h3v3h-3z" />
    </>
  ),
  keyboard: (
    <>
      <rect x="2.5" y="6" width="19" height="12" rx="2" />
      <path d="M6 10h.01M9.5 10h.01M13 10h.01M16.5 10h.01M7.5 14h9" />
    </>
  ),
  'camera-off': <path d="M3 3l18 18M9.5 5.5h4l1.5 2h3.5a1.5 1.5 0 0 1 1.5 1.5v8M17.5 19.5h-13A1.5 1.5 0 0 1 3 18V9a1.5 1.5 0 0 1 1.5-1.5h2M10 10.5a3 3 0 0 0 4 4" />,
  check: <path d={boardStateIcons.available} />,
  cross: (
    <>
      <circle cx="12" cy="12" r="9" />
      <path d="M9 9l6 6M15 9l-6 6" />
    </>
  ),
  warning: <path d="M12 3l9.5 17h-19zM12 10v4.5M12 17.5v.01" />,
  person: (
    <>
      <circle cx="12" cy="8" r="4" />
      <path d="M4.5 21a7.5 7.5 0 0 1 15 0" />
    </>
  ),
  // An adjustable wrench: the instructor's tools.
  wrench: <path d="M14.5 4.5a4.5 4.5 0 0 0-5.3 5.8L3.5 16a2 2 0 0 0 2.8 2.8l5.7-5.7a4.5 4.5 0 0 0 5.8-5.3l-2.6 2.6-2.3-.5-.5-2.3z" />,
  back: <path d="M15 5l-7 7 7 7" />,
  link: <path d="M10 14a4 4 0 0 0 5.7 0l3-3a4 4 0 0 0-5.7-5.7l-1 1M14 10a4 4 0 0 0-5.7 0l-3 3a4 4 0 0 0 5.7 5.7l1-1" />,
  hourglass: <path d={boardStateIcons.reserved} />,
  chuck: <path d={boardStateIcons.in_use} />,
  padlock: <path d={boardStateIcons.tagged_out} />,
  unplugged: <path d={boardStateIcons.offline} />,
};

/** Line icons beside the words of a state, never instead of them. */
export function Icon({ name, className }: { name: IconName; className?: string }) {
  return (
    <svg {...lineIconSvg} className={`shrink-0 ${className ?? 'size-10'}`}>
      {shapes[name]}
    </svg>
  );
}
