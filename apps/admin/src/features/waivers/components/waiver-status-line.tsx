import type { WaiverStatus } from '@chuckkey/core';
import { formatDate } from '../../../lib/format';

type OnFileRecord = NonNullable<WaiverStatus['record']>;

/** How a waiver record reads: which version, when, and whether typed online or signed on paper. */
export function WaiverRecordText({ record, timeZone }: { record: OnFileRecord; timeZone: string | undefined }) {
  const when = formatDate(record.recordedAt, timeZone);
  if (record.method === 'uploaded_scan') return <>Version {record.version}: a signed paper copy, scanned in on {when}.</>;
  return (
    <>
      Version {record.version}: accepted online on {when}
      {record.typedName ? <>, signed “{record.typedName}”</> : null}.
    </>
  );
}
