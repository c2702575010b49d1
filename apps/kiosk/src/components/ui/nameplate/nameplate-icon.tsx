import type { ReactNode } from 'react';
import type { NameplateIconName } from './nameplate-looks';

const shapes: Record<NameplateIconName, ReactNode> = {
  check: (
    <>
      <circle cx="12" cy="12" r="9" />
      <path d="M7.5 12.5l3 3 6-6.5" />
    </>
  ),
  // A three-jaw chuck seen from the tailstock: the spindle is turning.
  chuck: (
    <>
      <circle cx="12" cy="12" r="9" />
      <circle cx="12" cy="12" r="2.5" />
      <path d="M12 3v5.5M19.8 16.5l-4.8-2.8M4.2 16.5l4.8-2.8" />
    </>
  ),
  hourglass: <path d="M6 3h12M6 21h12M8 3c0 5 8 5 8 9s-8 4-8 9M16 3c0 5-8 5-8 9s8 4 8 9" />,
  padlock: (
    <>
      <rect x="5" y="11" width="14" height="10" rx="1.5" />
      <path d="M8 11V8a4 4 0 0 1 8 0v3M12 15v2.5" />
    </>
  ),
  unplugged: <path d="M9 2.5v4M15 2.5v4M7 6.5h10v4a5 5 0 0 1-10 0zM12 15.5V21M3 3l18 18" />,
};

export function NameplateIcon({ name, className }: { name: NameplateIconName; className?: string }) {
  return (
    <svg
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2.25}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
      className={`shrink-0 ${className ?? ''}`}
    >
      {shapes[name]}
    </svg>
  );
}
