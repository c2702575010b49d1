import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { formatSize, MessageAttachments } from './message-attachments';

const MESSAGE_ID = '7b0c2f4e-1d3a-4c5b-9e8f-0a1b2c3d4e5f';

describe('MessageAttachments', () => {
  it('lists each attachment with a download link to its numbered route, its type and size', () => {
    render(
      <MessageAttachments
        messageId={MESSAGE_ID}
        attachments={[
          { filename: 'reservation.ics', contentType: 'text/calendar; charset=utf-8; method=REQUEST', size: 612 },
          { filename: null, contentType: 'text/plain', size: 2048 },
        ]}
      />,
    );

    expect(screen.getByRole('heading', { name: 'Attachments' })).toBeTruthy();
    const calendar = screen.getByRole('link', { name: 'Download reservation.ics' });
    expect(calendar.getAttribute('href')).toBe(`/api/outbox/${MESSAGE_ID}/attachments/0`);
    expect(calendar.getAttribute('download')).toBe('reservation.ics');
    const unnamed = screen.getByRole('link', { name: 'Download Attachment 2' });
    expect(unnamed.getAttribute('href')).toBe(`/api/outbox/${MESSAGE_ID}/attachments/1`);
    // RFC 2045 section 5.1: the media type comes before its parameters, which are left off here.
    expect(screen.getByText('text/calendar, 612 bytes')).toBeTruthy();
    expect(screen.getByText('text/plain, 2.0 KB')).toBeTruthy();
  });

  it('shows nothing for a message without attachments', () => {
    const { container } = render(<MessageAttachments messageId={MESSAGE_ID} attachments={[]} />);

    expect(container.innerHTML).toBe('');
  });
});

describe('formatSize', () => {
  // Common practice: 1 KB shown as 1024 bytes, the way file managers have long counted.
  it('counts bytes below a kilobyte and one decimal above', () => {
    expect(formatSize(1)).toBe('1 byte');
    expect(formatSize(1023)).toBe('1023 bytes');
    expect(formatSize(1536)).toBe('1.5 KB');
    expect(formatSize(3 * 1024 * 1024)).toBe('3.0 MB');
  });
});
