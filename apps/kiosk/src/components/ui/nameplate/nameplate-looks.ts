import { BOARD_STATES, type BoardState } from '@chuckkey/core';

/** A plate shows the machine states of the board (GET /api/board, `machine:update`). */
export const nameplateStates = BOARD_STATES;
export type NameplateState = BoardState;

export type NameplateIconName = 'check' | 'chuck' | 'hourglass' | 'padlock' | 'unplugged';

export interface NameplateLook {
  label: string;
  icon: NameplateIconName;
  plate: string;
  band: string;
}

// Colour alone never carries the state: people with colour-blindness and anyone across the
// room read the word, and the icon tells the states apart at a glance.
const looks: Record<NameplateState, NameplateLook> = {
  available: {
    label: 'Available',
    icon: 'check',
    plate: 'bg-state-available border-state-available text-white',
    band: 'bg-black/30',
  },
  in_use: {
    label: 'In use',
    icon: 'chuck',
    plate: 'bg-state-in-use border-state-in-use text-white',
    band: 'bg-black/30',
  },
  reserved: {
    label: 'Reserved next',
    icon: 'hourglass',
    plate: 'bg-state-reserved border-state-reserved text-white',
    band: 'bg-black/30',
  },
  tagged_out: {
    label: 'Tagged out',
    icon: 'padlock',
    plate: 'stripes-tagged-out border-state-tagged-out text-white',
    band: 'bg-state-tagged-out',
  },
  offline: {
    label: 'Offline',
    icon: 'unplugged',
    plate: 'bg-transparent border-dashed border-state-offline text-ink',
    band: 'border-b-2 border-dashed border-state-offline',
  },
};

export function nameplateLook(state: NameplateState): NameplateLook {
  return looks[state];
}

/**
 * Three fixed sizes, and `fit`: every measure in em of the plate's own font size, so that the
 * board sets one font size per plate and the whole plate scales with it.
 */
export const nameplateSizes = ['sm', 'md', 'lg', 'fit'] as const;
export type NameplateSize = (typeof nameplateSizes)[number];

interface SizeClasses {
  plate: string;
  band: string;
  name: string;
  body: string;
  state: string;
  icon: string;
  detail: string;
  rivet: string;
}

const sizes: Record<NameplateSize, SizeClasses> = {
  sm: {
    plate: 'border-2 rounded',
    band: 'px-2 py-0.5 gap-2',
    name: 'text-plate-name-sm tracking-[0.12em]',
    body: 'px-3 py-2 gap-1',
    state: 'text-plate-state-sm leading-tight gap-2',
    icon: 'size-6',
    detail: 'text-plate-detail-sm',
    rivet: 'size-1.5',
  },
  md: {
    plate: 'border-4 rounded-md',
    band: 'px-3 py-1 gap-3',
    name: 'text-plate-name-md tracking-[0.12em]',
    body: 'px-4 py-3 gap-1.5',
    state: 'text-plate-state-md leading-tight gap-3',
    icon: 'size-9',
    detail: 'text-plate-detail-md',
    rivet: 'size-2',
  },
  lg: {
    plate: 'border-4 rounded-lg',
    band: 'px-4 py-1.5 gap-4',
    name: 'text-plate-name-lg tracking-[0.12em]',
    body: 'px-6 py-4 gap-2',
    state: 'text-plate-state-lg leading-tight gap-4',
    icon: 'size-14',
    detail: 'text-plate-detail-lg',
    rivet: 'size-2.5',
  },
  // The heights here add up to just under PLATE_HEIGHT_EM of the board's layout: keep the two in step.
  fit: {
    plate: 'border-[0.12em] rounded-[0.3em]',
    band: 'px-[0.45em] py-[0.1em] gap-[0.3em]',
    // A touch smaller than the rest, so that more of a long name fits the band.
    name: 'text-[0.92em] leading-[1.3] tracking-[0.06em]',
    body: 'px-[0.55em] py-[0.2em] gap-[0.1em]',
    state: 'text-[1.4em] leading-[1.15] gap-[0.3em]',
    icon: 'size-[1.05em]',
    detail: 'text-[0.9em] leading-[1.2]',
    rivet: 'size-[0.35em]',
  },
};

export function nameplateSize(size: NameplateSize): SizeClasses {
  return sizes[size];
}

/**
 * On a `fit` plate, names up to this many characters take the band's full size; a longer one is set
 * smaller in proportion (down to FIT_NAME_MIN_SCALE), so that a wall board shows it whole.
 */
const FIT_NAME_CHARACTERS = 13;
const FIT_NAME_MIN_SCALE = 0.6;

export function fitNameScale(name: string): number {
  return Math.max(FIT_NAME_MIN_SCALE, Math.min(1, FIT_NAME_CHARACTERS / Math.max(1, name.length)));
}
