import type { ComponentType, ReactNode } from 'react';

/**
 * The station's own badge reader and camera, handed in by the route: the crib reads badges
 * exactly as a machine's station does, and its camera reads tool tags the same way.
 */
export interface CribScanners {
  BadgeReader: ComponentType<{ prompt: string; onBadge: (code: string) => void; busy?: boolean; message?: ReactNode }>;
  Camera: ComponentType<{ onCode: (code: string) => void; unavailableText?: string }>;
}
