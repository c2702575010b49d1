import { useState } from 'react';
import { cn } from './ui/cn';
import { PersonIcon } from './ui/icons';
import { apiHref } from '../lib/api-client';

interface MemberPhotoProps {
  memberId: string;
  name: string;
  /** Changes after an upload, so the browser fetches the new picture instead of its cached one. */
  version?: string | number;
  className?: string;
}

/**
 * The member's badge photo, so an instructor can see who stands in front of them. A member
 * without a photo (the server answers 404) gets an outline instead of a broken image.
 */
export function MemberPhoto({ memberId, name, version, className }: MemberPhotoProps) {
  const src = apiHref(`/members/${encodeURIComponent(memberId)}/photo`, { v: version });
  const [failedSrc, setFailedSrc] = useState<string | null>(null);
  const box = cn('aspect-[4/5] w-20 shrink-0 overflow-hidden rounded-md border border-neutral-400 bg-neutral-100', className);

  if (failedSrc === src) {
    return (
      <div className={cn(box, 'flex flex-col items-center justify-center gap-1 p-1 text-center text-xs text-neutral-700')}>
        <PersonIcon className="size-8 text-neutral-500" />
        <span>No photo</span>
      </div>
    );
  }
  return (
    <div className={box}>
      <img src={src} alt={`Photo of ${name}`} onError={() => setFailedSrc(src)} className="size-full object-cover" />
    </div>
  );
}
