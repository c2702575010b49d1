import { Icon } from '@/components/ui/icon';

export function CribCaution() {
  return (
    <p className="flex items-center gap-4 text-kiosk-body text-balance">
      <Icon name="warning" className="size-9 shrink-0" />
      <span>Check a tool for damage before you use it; report anything wrong when you return it.</span>
    </p>
  );
}
