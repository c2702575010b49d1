import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { DialogForm } from './dialog-form';

describe('the form of a confirming dialog', () => {
  it('shows its refusal above the fields, submits with the action and cancels without submitting', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn((event: { preventDefault: () => void }) => event.preventDefault());
    const onCancel = vi.fn();
    render(
      <DialogForm onSubmit={onSubmit} formError="Someone recorded this return already." pending={false} onCancel={onCancel} submitLabel="Record return">
        <label>
          Note
          <textarea name="note" />
        </label>
      </DialogForm>,
    );

    const alert = screen.getByRole('alert');
    expect(alert.textContent).toContain('Someone recorded this return already.');
    // DOM order is reading order: the refusal comes before the field it concerns.
    expect(alert.compareDocumentPosition(screen.getByLabelText('Note')) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(onCancel).toHaveBeenCalledOnce();
    expect(onSubmit).not.toHaveBeenCalled();

    await user.click(screen.getByRole('button', { name: 'Record return' }));
    expect(onSubmit).toHaveBeenCalledOnce();
  });
});
