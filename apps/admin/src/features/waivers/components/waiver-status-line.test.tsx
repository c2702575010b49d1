import type { WaiverStatus } from '@chuckkey/core';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { WaiverOnFile } from './waiver-status-line';

type OnFileRecord = NonNullable<WaiverStatus['record']>;

const online: OnFileRecord = {
  id: '00000000-0000-4000-8000-000000000001',
  version: 3,
  method: 'accepted_online',
  typedName: 'Ada Lovelace',
  recordedAt: '2025-03-04T10:00:00Z',
};

describe('a waiver on file', () => {
  it('says which version was accepted online, when, and the name typed', () => {
    render(<WaiverOnFile record={online} timeZone="UTC" />);

    const line = screen.getByText('On file.').closest('p');
    expect(line?.textContent).toMatch(/^On file\. Version 3: accepted online on .*2025.*, signed “Ada Lovelace”\.$/);
  });

  it('says when a signed paper copy was scanned in instead', () => {
    render(<WaiverOnFile record={{ ...online, method: 'uploaded_scan', typedName: null }} timeZone="UTC" />);

    expect(screen.getByText('On file.').closest('p')?.textContent).toMatch(/^On file\. Version 3: a signed paper copy, scanned in on .*2025.*\.$/);
  });
});
