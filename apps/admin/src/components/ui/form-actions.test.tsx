import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { Button } from './button';
import { DialogActions, FormActions } from './form-actions';

describe('the actions at the end of a page form', () => {
  it('saves with the form’s own words, and Cancel leaves without saving', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn((event: { preventDefault: () => void }) => event.preventDefault());
    const onCancel = vi.fn();
    render(
      <form onSubmit={onSubmit}>
        <FormActions submitLabel="Save machine" pending={false} onCancel={onCancel} />
      </form>,
    );

    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(onCancel).toHaveBeenCalledOnce();
    expect(onSubmit).not.toHaveBeenCalled();

    await user.click(screen.getByRole('button', { name: 'Save machine' }));
    expect(onSubmit).toHaveBeenCalledOnce();
  });

  it('puts saving first for the keyboard', () => {
    render(<FormActions submitLabel="Create training" pending={false} onCancel={() => {}} />);

    expect(screen.getAllByRole('button').map((button) => button.textContent)).toEqual(['Create training', 'Cancel']);
  });

  it('while saving, keeps the button’s name and marks it busy, and Cancel still works', () => {
    render(<FormActions submitLabel="Save training" pending onCancel={() => {}} />);

    const save = screen.getByRole('button', { name: 'Save training' });
    expect(save.getAttribute('aria-busy')).toBe('true');
    expect((save as HTMLButtonElement).disabled).toBe(true);
    expect((screen.getByRole('button', { name: 'Cancel' }) as HTMLButtonElement).disabled).toBe(false);
  });
});

describe('the actions at the end of a dialog', () => {
  it('offers Cancel before the action', async () => {
    const user = userEvent.setup();
    const onCancel = vi.fn();
    render(
      <DialogActions pending={false} onCancel={onCancel}>
        <Button variant="danger">Revoke sign-off</Button>
      </DialogActions>,
    );

    expect(screen.getAllByRole('button').map((button) => button.textContent)).toEqual(['Cancel', 'Revoke sign-off']);
    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(onCancel).toHaveBeenCalledOnce();
  });

  it('does not let Cancel close the dialog while the action runs', () => {
    render(
      <DialogActions pending onCancel={() => {}}>
        <Button pending>Add station</Button>
      </DialogActions>,
    );

    expect((screen.getByRole('button', { name: 'Cancel' }) as HTMLButtonElement).disabled).toBe(true);
  });
});
