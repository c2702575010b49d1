import type { WaiverStatus } from '@chuckkey/core';
import { CheckIcon } from '../../../components/ui/icons';
import { formatDate } from '../../../lib/format';

type OnFileRecord = NonNullable<WaiverStatus['record']>;

/** How a waiver record reads: which version, when, and whether typed online or signed on paper. */
function WaiverRecordText({ record, timeZone }: { record: OnFileRecord; timeZone: string | undefined }) {
  const when = formatDate(record.recordedAt, timeZone);
  if (record.method === 'uploaded_scan') return <>Version {record.version}: a signed paper copy, scanned in on {when}.</>;
  return (
    <>
      Version {record.version}: accepted online on {when}
      {record.typedName ? <>, signed “{record.typedName}”</> : null}.
    </>
  );
}

/** Says that the member's waiver is on file, and how it got there. */
export function WaiverOnFile({ record, timeZone }: { record: OnFileRecord; timeZone: string | undefined }) {
  return (
    <p className="flex items-start gap-2 text-neutral-900">
      <CheckIcon className="mt-0.5 size-5 shrink-0 text-success" />
      <span>
        <strong>On file.</strong> <WaiverRecordText record={record} timeZone={timeZone} />
      </span>
    </p>
  );
}
