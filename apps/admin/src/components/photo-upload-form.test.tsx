import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../lib/api-client';
import { photoRules } from '../lib/upload-file';
import { PhotoUploadForm } from './photo-upload-form';

function picture(name: string, type: string, bytes = 2000): File {
  return new File([new Uint8Array(bytes).fill(7)], name, { type });
}

function renderForm(send: (photo: File, onProgress: (fraction: number) => void) => Promise<unknown>) {
  const onSaved = vi.fn();
  const onStart = vi.fn();
  render(
    <PhotoUploadForm
      current={(version) => <p>Photo on file, version {version}</p>}
      previewClassName="aspect-square"
      hint="JPEG or PNG."
      send={send}
      pending={false}
      onStart={onStart}
      onSaved={onSaved}
    />,
  );
  // applyAccept off: the picker's filter is the browser's; the form's own check is what is tried here.
  return { user: userEvent.setup({ applyAccept: false }), onSaved, onStart };
}

describe('PhotoUploadForm', () => {
  it('shows the chosen photo beside the one on file, sends it, and then asks the browser for the new one', async () => {
    const send = vi.fn(async (_photo: File, onProgress: (fraction: number) => void) => onProgress(1));
    const { user, onSaved, onStart } = renderForm(send);
    const photo = picture('lathe.jpg', 'image/jpeg');

    await user.upload(screen.getByLabelText('Choose a photo'), photo);
    await screen.findByRole('img', { name: 'The photo you chose, before it is uploaded' });
    expect(onStart).toHaveBeenCalled();

    await user.click(screen.getByRole('button', { name: 'Upload photo' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalledOnce());
    expect(send.mock.calls[0]?.[0]).toBe(photo);
    screen.getByText('Photo on file, version 1');
    expect(screen.queryByRole('img', { name: 'The photo you chose, before it is uploaded' })).toBeNull();
  });

  it('refuses a file that is not a JPEG or PNG before anything is sent', async () => {
    const send = vi.fn(async () => undefined);
    const { user } = renderForm(send);

    await user.upload(screen.getByLabelText('Choose a photo'), picture('waiver.pdf', 'application/pdf'));
    await user.click(screen.getByRole('button', { name: 'Upload photo' }));

    await screen.findByText(photoRules.wrongType);
    expect(send).not.toHaveBeenCalled();
  });

  it('says the size limit under the field when the server answers 413', async () => {
    // RFC 9110 section 15.5.14: 413 Content Too Large, which a proxy may send without a problem body.
    const send = vi.fn(async () => {
      throw new ApiError({ status: 413, code: 'http_413', title: 'Content Too Large' });
    });
    const { user, onSaved } = renderForm(send);

    await user.upload(screen.getByLabelText('Choose a photo'), picture('lathe.png', 'image/png'));
    await user.click(screen.getByRole('button', { name: 'Upload photo' }));

    const message = await screen.findByText(photoRules.tooLarge);
    const describedBy = screen.getByLabelText('Choose a photo').getAttribute('aria-describedby') ?? '';
    expect(describedBy.split(' ')).toContain(message.closest('[id]')?.id);
    expect(onSaved).not.toHaveBeenCalled();
  });
});
