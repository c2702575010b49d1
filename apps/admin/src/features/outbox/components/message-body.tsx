import { useMemo } from 'react';
import { linkParts } from '../utils/link-parts';

export function MessageBody({ text }: { text: string }) {
  const parts = useMemo(() => linkParts(text), [text]);
  return (
    <div className="rounded-md border border-neutral-300 bg-neutral-50 p-4 font-sans whitespace-pre-wrap break-words text-neutral-900">
      {parts.map((part, index) =>
        part.kind === 'link' ? (
          <a key={index} href={part.href} className="font-bold break-all text-brand underline underline-offset-4">
            {part.href}
          </a>
        ) : (
          <span key={index}>{part.text}</span>
        ),
      )}
    </div>
  );
}
