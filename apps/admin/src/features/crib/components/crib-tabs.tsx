import { SectionNav } from '../../../components/ui/section-nav';
import { paths } from '../../../config/paths';

const items = [
  { label: 'Inventory', to: paths.crib.getHref(), end: true },
  { label: 'Checkouts', to: paths.cribCheckouts.getHref() },
  { label: 'Needs attention', to: paths.cribAttention.getHref() },
  { label: 'Overdue', to: paths.cribOverdue.getHref() },
];

/** The parts of the crib, each at its own address; every crib page shows them at its top. */
export function CribTabs() {
  return <SectionNav label="Crib" items={items} />;
}
