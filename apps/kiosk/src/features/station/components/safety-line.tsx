import { Icon } from '@/components/ui/icon';

export function SafetyLine() {
  return (
    <p className="flex items-center gap-5 rounded-lg border-2 border-ink-muted px-6 py-4 text-kiosk-body">
      <Icon name="warning" />
      <span>The shop’s own rules, local codes and your in-person training always come first.</span>
    </p>
  );
}
