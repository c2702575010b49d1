import { Button, buttonClasses } from '../../../components/ui/button';
import { PrinterIcon } from '../../../components/ui/icons';
import { badgeCardHref, badgeSheetHref } from '../utils/badge-links';

interface PrintCardLinkProps {
  memberId: string;
  name: string;
  /** In a row of a table only the printer shows; the link's name for screen readers stays whole. */
  compact?: boolean;
}

/** Opens the member's card as a PDF in a new tab, where the browser's own print dialog takes over. */
export function PrintCardLink({ memberId, name, compact = false }: PrintCardLinkProps) {
  const label = `Print badge card for ${name}`;
  return (
    <a
      href={badgeCardHref(memberId)}
      target="_blank"
      rel="noreferrer"
      title={compact ? label : undefined}
      className={buttonClasses('secondary', compact ? 'min-w-11 px-2' : 'px-3 whitespace-nowrap')}
    >
      <PrinterIcon />
      {compact ? (
        <span className="sr-only">{label}</span>
      ) : (
        <span>
          Print badge card<span className="sr-only"> for {name}</span>
        </span>
      )}
    </a>
  );
}

// The most members the server prints on one request (badgeSheetQuerySchema in @chuckkey/core).
const SHEET_MAX = 200;

interface BadgeSheetBarProps {
  chosen: { id: string; name: string }[];
  onClear: () => void;
}

export function BadgeSheetBar({ chosen, onClear }: BadgeSheetBarProps) {
  const count = chosen.length;
  const tooMany = count > SHEET_MAX;
  return (
    <section aria-label="Badge sheet" className="flex flex-col gap-3 rounded-lg border border-neutral-300 bg-white p-4 sm:flex-row sm:items-center sm:justify-between">
      <div className="flex flex-col gap-1" aria-live="polite">
        {count === 0 ? (
          <p className="text-neutral-800">Tick members in the list to print their badge cards together on one sheet.</p>
        ) : (
          <>
            <p className="font-bold text-neutral-900">
              {count === 1 ? '1 member chosen' : `${count} members chosen`} for a badge sheet
            </p>
            <p className="text-sm text-neutral-700">{chosen.map((member) => member.name).join(', ')}</p>
            {tooMany && <p className="text-sm font-bold text-danger">One sheet holds at most {SHEET_MAX} members. Untick some.</p>}
          </>
        )}
      </div>
      {count > 0 && (
        <div className="flex shrink-0 flex-wrap gap-2">
          {!tooMany && (
            <a
              href={badgeSheetHref(chosen.map((member) => member.id))}
              target="_blank"
              rel="noreferrer"
              className={buttonClasses('primary', 'whitespace-nowrap')}
            >
              <PrinterIcon />
              Print badge sheet
            </a>
          )}
          <Button variant="secondary" onClick={onClear} className="whitespace-nowrap">
            Clear the choice
          </Button>
        </div>
      )}
    </section>
  );
}
