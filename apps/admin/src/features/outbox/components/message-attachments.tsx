import type { OutboxAttachment } from '@chuckkey/core';
import { DownloadIcon } from '../../../components/ui/icons';
import { apiHref } from '../../../lib/api-client';

/** Sizes as people read them: whole bytes below a kilobyte, then one decimal. */
export function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} ${bytes === 1 ? 'byte' : 'bytes'}`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** The bare type without its parameters: `text/calendar; method=REQUEST` reads as `text/calendar`. */
function bareType(contentType: string): string {
  return contentType.split(';')[0]?.trim() ?? contentType;
}

export function MessageAttachments({ messageId, attachments }: { messageId: string; attachments: OutboxAttachment[] }) {
  if (attachments.length === 0) return null;
  return (
    <section aria-labelledby="outbox-attachments-heading" className="flex flex-col gap-2">
      <h3 id="outbox-attachments-heading" className="font-bold text-neutral-900">
        Attachments
      </h3>
      <ul className="flex flex-col gap-2">
        {attachments.map((attachment, index) => {
          const name = attachment.filename ?? `Attachment ${index + 1}`;
          return (
            <li key={index} className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <a
                href={apiHref(`/outbox/${messageId}/attachments/${index}`)}
                download={attachment.filename ?? true}
                className="inline-flex min-h-11 items-center gap-2 font-bold break-all text-brand underline underline-offset-4"
              >
                <DownloadIcon className="size-5 shrink-0" />
                <span>{`Download ${name}`}</span>
              </a>
              <span className="text-sm text-neutral-700">
                {bareType(attachment.contentType)}, {formatSize(attachment.size)}
              </span>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
