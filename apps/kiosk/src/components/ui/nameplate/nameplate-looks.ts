export const nameplateStates = ['available', 'in_use', 'reserved_next', 'tagged_out', 'offline'] as const;
export type NameplateState = (typeof nameplateStates)[number];

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
  reserved_next: {
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

export const nameplateSizes = ['sm', 'md', 'lg'] as const;
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
    name: 'text-plate-name-sm',
    body: 'px-3 py-2 gap-1',
    state: 'text-plate-state-sm gap-2',
    icon: 'size-6',
    detail: 'text-plate-detail-sm',
    rivet: 'size-1.5',
  },
  md: {
    plate: 'border-4 rounded-md',
    band: 'px-3 py-1 gap-3',
    name: 'text-plate-name-md',
    body: 'px-4 py-3 gap-1.5',
    state: 'text-plate-state-md gap-3',
    icon: 'size-9',
    detail: 'text-plate-detail-md',
    rivet: 'size-2',
  },
  lg: {
    plate: 'border-4 rounded-lg',
    band: 'px-4 py-1.5 gap-4',
    name: 'text-plate-name-lg',
    body: 'px-6 py-4 gap-2',
    state: 'text-plate-state-lg gap-4',
    icon: 'size-14',
    detail: 'text-plate-detail-lg',
    rivet: 'size-2.5',
  },
};

export function nameplateSize(size: NameplateSize): SizeClasses {
  return sizes[size];
}
